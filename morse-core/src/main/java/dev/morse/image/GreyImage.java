package dev.morse.image;

/**
 * A 2D image as one grey sample per pixel, rows from the top, as read from a file: samples
 * {@code 0..maxSample}, pixel {@code (x, y)} at index {@code x + width y}. Colour images are
 * read as their luminance. Immutable by convention: readers hand over the array.
 *
 * <p>Memory: 4 bytes per pixel.
 *
 * @param width pixels per row, at least 1
 * @param height rows, at least 1
 * @param maxSample the largest sample value the format allows (1 for a bitmap, 255 for 8 bits)
 * @param samples {@code width × height} values in {@code 0..maxSample}
 */
public record GreyImage(int width, int height, int maxSample, int[] samples) {
    /** Validates the shape. */
    public GreyImage {
        if (width < 1 || height < 1 || (long) width * height != samples.length) {
            throw new IllegalArgumentException("a " + width + " x " + height + " image needs that many samples");
        }
        if (maxSample < 1) {
            throw new IllegalArgumentException("the largest sample must be at least 1");
        }
    }

    /** The sample at column {@code x}, row {@code y}. */
    public int sample(int x, int y) {
        return samples[x + width * y];
    }

    /**
     * The threshold used when none is given: half the sample range, rounded up, so that in a
     * bitmap (where 1 is black) the black pixels are the foreground, and in an 8-bit image the
     * samples 128 to 255.
     */
    public int defaultThreshold() {
        return (maxSample + 1) / 2;
    }
}
