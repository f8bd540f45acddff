package dev.morse.input;

import dev.morse.image.ImageInput;
import dev.morse.image.LoadedImage;
import java.io.IOException;
import java.nio.file.Path;
import java.util.List;

/**
 * Images and volumes: one image file (told by its first bytes), a directory or list of slices, or a
 * raw byte volume when its sizes are given. Standing for the cubical complex of the foreground.
 */
final class ImageFileReader implements InputReader {
    @Override
    public boolean recognises(InputProbe probe) {
        return probe.options().rawSize().isPresent() || (probe.directory() && probe.header().isEmpty()) || probe.image();
    }

    @Override
    public Input read(List<Path> files, ReadOptions options) throws IOException {
        long start = System.nanoTime();
        LoadedImage image = ImageInput.load(files, options.image());
        StringBuilder source = new StringBuilder();
        for (Path file : files) {
            source.append(source.length() > 0 ? " " : "").append(file);
        }
        return new VoxelInput(source.toString(), image, InputReaders.millisSince(start));
    }

}
