/**
 * The command line: one picocli class per subcommand, option converters, and the one place where
 * failures become a message and an exit code. No mathematics here; all of it is in morse-core.
 */
package dev.morse.cli;
