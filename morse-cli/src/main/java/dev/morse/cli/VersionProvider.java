package dev.morse.cli;

import picocli.CommandLine.IVersionProvider;

/** The version every command prints for {@code --version}: the jar's, or a word saying it is a build from sources. */
final class VersionProvider implements IVersionProvider {
    @Override
    public String[] getVersion() {
        String version = VersionProvider.class.getPackage().getImplementationVersion();
        return new String[] {"morse " + (version == null ? "(built from sources)" : version)};
    }
}
