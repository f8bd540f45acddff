package dev.morse.image;

import dev.morse.io.InputException;
import dev.morse.io.InputFiles;
import java.io.BufferedInputStream;
import java.io.IOException;
import java.io.InputStream;
import java.nio.file.AccessDeniedException;
import java.nio.file.DirectoryStream;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import java.util.Set;

/**
 * Turns image files into a {@link LoadedImage}: one 2D image; several 2D images of one size, or a
 * directory of them, as the slices of a volume (slice i at z = i, files of a directory in natural
 * order of their names, so {@code s2} comes before {@code s10}); or a raw volume of unsigned
 * bytes, x varying fastest, then y, then z, with its extents given. Formats are told by their
 * first bytes (Netpbm magic numbers, PNG, GIF, BMP and JPEG signatures), never by the name alone.
 *
 * <p>The foreground is the samples at or above the threshold, or below it when inverted. The
 * default threshold of an image is half its sample range rounded up ({@link GreyImage#defaultThreshold()});
 * that of a raw volume is 1, so that every nonzero byte is foreground, as binary masks are
 * usually stored.
 */
public final class ImageInput {
    /** Name endings of the image files taken from a directory. */
    public static final Set<String> SLICE_ENDINGS = Set.of("pbm", "pgm", "ppm", "pnm", "png", "gif", "bmp", "jpg",
            "jpeg");
    private static final int HEAD = 8;
    private static final int RAW_DEFAULT_THRESHOLD = 1;

    private ImageInput() {
    }

    /**
     * Whether {@code file} starts like an image this class reads. A missing or unreadable file is
     * not an image; its reader reports the problem.
     */
    public static boolean isImageFile(Path file) {
        if (!Files.isRegularFile(file)) {
            return false;
        }
        try {
            byte[] head = head(file);
            return NetpbmReader.hasMagic(head) || StandardImageReader.hasSignature(head);
        } catch (IOException e) {
            return false;
        }
    }

    /**
     * Reads the inputs: with a raw size, exactly one raw volume; else one image file, or one
     * directory of slices, or several slice files.
     *
     * @throws InputException for any problem with the files or their agreement, naming the file
     */
    public static LoadedImage load(List<Path> inputs, ImageOptions options) throws IOException {
        if (inputs.isEmpty()) {
            throw new IllegalArgumentException("no input");
        }
        if (options.rawSize().isPresent()) {
            if (inputs.size() != 1) {
                throw new InputException(inputs.get(1).toString(), InputException.NO_LINE,
                        "a raw volume is one file; give its sizes with the dimensions option");
            }
            return raw(inputs.get(0), options.rawSize().get(), options);
        }
        if (inputs.size() == 1 && !Files.isDirectory(inputs.get(0))) {
            Path file = inputs.get(0);
            GreyImage image = readImage(file);
            int threshold = threshold(file, image, options);
            VoxelSet.Builder voxels = VoxelSet.builder(image.width(), image.height());
            addSlice(voxels, image, 0, threshold, options.invert());
            return new LoadedImage(voxels.build(), 1, threshold, options.invert());
        }
        List<Path> slices = inputs.size() == 1 ? slicesIn(inputs.get(0)) : inputs;
        return stack(slices, options);
    }

    private static LoadedImage stack(List<Path> slices, ImageOptions options) throws IOException {
        VoxelSet.Builder voxels = null;
        int width = 0;
        int height = 0;
        int firstThreshold = 0;
        for (int z = 0; z < slices.size(); z++) {
            Path file = slices.get(z);
            GreyImage image = readImage(file);
            int threshold = threshold(file, image, options);
            if (voxels == null) {
                width = image.width();
                height = image.height();
                firstThreshold = threshold;
                try {
                    voxels = VoxelSet.builder(width, height, slices.size());
                } catch (IllegalArgumentException e) {
                    throw new InputException(file.toString(), InputException.NO_LINE, e.getMessage());
                }
            } else if (image.width() != width || image.height() != height) {
                throw new InputException(file.toString(), InputException.NO_LINE, "this slice is " + image.width()
                        + " x " + image.height() + " pixels, but the first slice, " + slices.get(0) + ", is "
                        + width + " x " + height);
            }
            addSlice(voxels, image, z, threshold, options.invert());
        }
        return new LoadedImage(voxels.build(), slices.size(), firstThreshold, options.invert());
    }

    private static void addSlice(VoxelSet.Builder voxels, GreyImage image, int z, int threshold, boolean invert) {
        int[] samples = image.samples();
        int base = z * samples.length;
        for (int i = 0; i < samples.length; i++) {
            if ((samples[i] >= threshold) != invert) {
                voxels.add(base + i);
            }
        }
    }

    private static int threshold(Path file, GreyImage image, ImageOptions options) {
        if (options.threshold().isEmpty()) {
            return image.defaultThreshold();
        }
        int threshold = options.threshold().getAsInt();
        if (threshold > image.maxSample()) {
            throw new InputException(file.toString(), InputException.NO_LINE, "the threshold " + threshold
                    + " is above the largest sample value " + image.maxSample() + " of this image");
        }
        return threshold;
    }

    private static GreyImage readImage(Path file) throws IOException {
        return InputFiles.readChecked(file, "an image file", () -> {
            byte[] head = head(file);
            if (NetpbmReader.hasMagic(head)) {
                return NetpbmReader.read(file);
            }
            if (StandardImageReader.hasSignature(head)) {
                return StandardImageReader.read(file);
            }
            throw new InputException(file.toString(), InputException.NO_LINE,
                    "not an image: expected a Netpbm (P1 to P6), PNG, GIF, BMP or JPEG file");
        });
    }

    private static LoadedImage raw(Path file, VolumeSize size, ImageOptions options) throws IOException {
        String source = file.toString();
        if (!Files.isRegularFile(file)) {
            // a device such as /dev/zero, or a pipe, would be read without end or block
            throw new InputException(source, InputException.NO_LINE, Files.isDirectory(file)
                    ? "is a directory, not a raw volume"
                    : Files.exists(file) ? "is not a regular file (a pipe or a device?); save the input to a file first"
                    : "no such file");
        }
        long bytes = Files.size(file);
        if (bytes != size.voxels()) {
            throw new InputException(source, InputException.NO_LINE, "has " + bytes + " bytes, but a raw volume of "
                    + VoxelSet.describe(size.extents()) + " voxels needs " + size.voxels());
        }
        int threshold = options.threshold().orElse(RAW_DEFAULT_THRESHOLD);
        if (threshold > 255) {
            throw new InputException(source, InputException.NO_LINE, "the threshold " + threshold
                    + " is above 255, the largest byte value");
        }
        int[] extents = size.extents();
        VoxelSet.Builder voxels = VoxelSet.builder(extents);
        boolean invert = options.invert();
        try (InputStream in = new BufferedInputStream(Files.newInputStream(file), 1 << 16)) {
            byte[] buffer = new byte[1 << 16];
            int index = 0;
            for (int n = in.read(buffer); n > 0; n = in.read(buffer)) {
                for (int i = 0; i < n; i++) {
                    if (((buffer[i] & 0xFF) >= threshold) != invert) {
                        voxels.add(index + i);
                    }
                }
                index += n;
            }
        } catch (AccessDeniedException e) {
            throw new InputException(source, InputException.NO_LINE, "cannot be read: permission denied");
        }
        return new LoadedImage(voxels.build(), 1, threshold, invert);
    }

    /** The image files of a directory in natural order of their names. */
    static List<Path> slicesIn(Path directory) throws IOException {
        List<Path> slices = new ArrayList<>();
        try (DirectoryStream<Path> entries = Files.newDirectoryStream(directory)) {
            for (Path entry : entries) {
                String name = entry.getFileName().toString();
                int dot = name.lastIndexOf('.');
                if (Files.isRegularFile(entry) && !name.startsWith(".") && dot > 0
                        && SLICE_ENDINGS.contains(name.substring(dot + 1).toLowerCase(Locale.ROOT))) {
                    slices.add(entry);
                }
            }
        } catch (NoSuchFileException e) {
            throw new InputException(directory.toString(), InputException.NO_LINE, "no such directory");
        }
        if (slices.isEmpty()) {
            throw new InputException(directory.toString(), InputException.NO_LINE,
                    "is a directory with no image files to read as the slices of a volume");
        }
        slices.sort(Comparator.comparing((Path p) -> p.getFileName().toString(), ImageInput::compareNatural));
        return slices;
    }

    /** Compares names with runs of digits compared as numbers: {@code s2 < s10}. */
    static int compareNatural(String a, String b) {
        int i = 0;
        int j = 0;
        while (i < a.length() && j < b.length()) {
            char ca = a.charAt(i);
            char cb = b.charAt(j);
            if (Character.isDigit(ca) && Character.isDigit(cb)) {
                int ei = i;
                while (ei < a.length() && Character.isDigit(a.charAt(ei))) {
                    ei++;
                }
                int ej = j;
                while (ej < b.length() && Character.isDigit(b.charAt(ej))) {
                    ej++;
                }
                String na = a.substring(i, ei).replaceFirst("^0+(?=.)", "");
                String nb = b.substring(j, ej).replaceFirst("^0+(?=.)", "");
                int byValue = na.length() != nb.length() ? Integer.compare(na.length(), nb.length()) : na.compareTo(nb);
                if (byValue != 0) {
                    return byValue;
                }
                i = ei;
                j = ej;
            } else {
                if (ca != cb) {
                    return Character.compare(ca, cb);
                }
                i++;
                j++;
            }
        }
        int byRest = Integer.compare(a.length() - i, b.length() - j);
        return byRest != 0 ? byRest : a.compareTo(b);
    }

    private static byte[] head(Path file) throws IOException {
        try (InputStream in = Files.newInputStream(file)) {
            return in.readNBytes(HEAD);
        }
    }
}
