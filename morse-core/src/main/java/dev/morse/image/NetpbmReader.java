package dev.morse.image;

import dev.morse.io.InputException;
import java.io.BufferedInputStream;
import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;

/**
 * Reads the six Netpbm formats: bitmaps P1 (text) and P4 (packed bits), grey maps P2 (text) and P5
 * (bytes), colour maps P3 (text) and P6 (bytes), as described in the Netpbm format pages
 * (common practice). A header of whitespace-separated numbers follows the magic number, with
 * {@code #} comments to the end of a line; binary samples are one byte each, or two bytes most
 * significant first when the largest value exceeds 255. In a bitmap, 1 is black. Colour is read
 * as the luminance {@code (299 R + 587 G + 114 B) / 1000}, rounded (ITU-R BT.601 weights, common
 * practice). Only the first image of a file is read.
 */
public final class NetpbmReader {
    private static final int LARGEST_SAMPLE = 65535;

    private final InputStream in;
    private final String source;
    private int line = 1;
    private int pushedBack = -2;

    private NetpbmReader(InputStream in, String source) {
        this.in = in;
        this.source = source;
    }

    /** Whether the first bytes are a Netpbm magic number: {@code P1} to {@code P6} and white space. */
    public static boolean hasMagic(byte[] head) {
        return head.length >= 3 && head[0] == 'P' && head[1] >= '1' && head[1] <= '6' && isSpace(head[2]);
    }

    /**
     * Reads the first image of a Netpbm file.
     *
     * @throws InputException {@code FILE: ...} or {@code FILE:LINE: ...} for a malformed file
     */
    public static GreyImage read(Path file) throws IOException {
        try (InputStream in = new BufferedInputStream(Files.newInputStream(file), 1 << 16)) {
            return read(in, file.toString());
        }
    }

    /** Reads the first image from {@code in}; {@code source} names it in error messages. */
    public static GreyImage read(InputStream in, String source) throws IOException {
        return new NetpbmReader(in, source).image();
    }

    private GreyImage image() throws IOException {
        int p = in.read();
        int digit = in.read();
        if (p != 'P' || digit < '1' || digit > '6') {
            throw new InputException(source, InputException.NO_LINE, "not a Netpbm image: it does not start with P1 to P6");
        }
        int kind = digit - '0';
        int width = headerNumber("width");
        int height = headerNumber("height");
        boolean bitmap = kind == 1 || kind == 4;
        int max = bitmap ? 1 : headerNumber("largest sample value");
        if (width < 1 || height < 1) {
            throw error("the width and height must be positive, not " + width + " x " + height);
        }
        if (max < 1 || max > LARGEST_SAMPLE) {
            throw error("the largest sample value must be in 1.." + LARGEST_SAMPLE + ", not " + max);
        }
        if ((long) width * height > Integer.MAX_VALUE - 8) {
            throw new InputException(source, InputException.NO_LINE, "an image of " + width + " x " + height
                    + " pixels is too large to read");
        }
        int[] samples = new int[width * height];
        if (kind <= 3) {
            int channels = kind == 3 ? 3 : 1;
            int[] rgb = new int[3];
            for (int i = 0; i < samples.length; i++) {
                for (int ch = 0; ch < channels; ch++) {
                    rgb[ch] = kind == 1 ? bit(i, samples.length) : sample(i, samples.length, max);
                }
                samples[i] = channels == 3 ? luminance(rgb) : rgb[0];
            }
        } else {
            int separator = read();
            if (!isSpace(separator)) {
                throw error("expected one white space character after the header");
            }
            if (kind == 4) {
                readPackedBits(samples, width);
            } else {
                readBinarySamples(samples, kind == 6 ? 3 : 1, max);
            }
        }
        return new GreyImage(width, height, max, samples);
    }

    private void readPackedBits(int[] samples, int width) throws IOException {
        int bytesPerRow = (width + 7) / 8;
        int height = samples.length / width;
        for (int y = 0; y < height; y++) {
            for (int b = 0; b < bytesPerRow; b++) {
                int v = in.read();
                if (v < 0) {
                    throw truncated(y * width + Math.min(width, 8 * b), samples.length);
                }
                for (int bit = 0; bit < 8 && 8 * b + bit < width; bit++) {
                    samples[y * width + 8 * b + bit] = (v >> (7 - bit)) & 1;
                }
            }
        }
    }

    private void readBinarySamples(int[] samples, int channels, int max) throws IOException {
        boolean wide = max > 255;
        int[] rgb = new int[3];
        for (int i = 0; i < samples.length; i++) {
            for (int ch = 0; ch < channels; ch++) {
                int v = in.read();
                if (wide && v >= 0) {
                    int low = in.read();
                    v = low < 0 ? -1 : (v << 8) | low;
                }
                if (v < 0) {
                    throw truncated(i, samples.length);
                }
                if (v > max) {
                    throw new InputException(source, InputException.NO_LINE, "pixel " + (i + 1) + " has the sample "
                            + v + ", more than the largest value " + max);
                }
                rgb[ch] = v;
            }
            samples[i] = channels == 3 ? luminance(rgb) : rgb[0];
        }
    }

    static int luminance(int[] rgb) {
        return (int) ((299L * rgb[0] + 587L * rgb[1] + 114L * rgb[2] + 500) / 1000);
    }

    /** A plain bitmap digit; the digits need not be separated. */
    private int bit(int pixel, int total) throws IOException {
        int c = skipSpaceAndComments();
        if (c < 0) {
            throw truncated(pixel, total);
        }
        if (c != '0' && c != '1') {
            throw error("expected 0 or 1 for pixel " + (pixel + 1) + ", found '" + (char) c + "'");
        }
        return c - '0';
    }

    private int sample(int pixel, int total, int max) throws IOException {
        int c = skipSpaceAndComments();
        if (c < 0) {
            throw truncated(pixel, total);
        }
        long value = digits(c, "sample of pixel " + (pixel + 1));
        if (value > max) {
            throw error("the sample " + value + " of pixel " + (pixel + 1) + " is more than the largest value " + max);
        }
        return (int) value;
    }

    private int headerNumber(String what) throws IOException {
        int c = skipSpaceAndComments();
        if (c < 0) {
            throw new InputException(source, InputException.NO_LINE, "the header ends before the " + what);
        }
        long value = digits(c, what);
        return (int) Math.min(value, Integer.MAX_VALUE);
    }

    /** A run of decimal digits starting with {@code first}, ended by white space, a comment or the end. */
    private long digits(int first, String what) throws IOException {
        if (first < '0' || first > '9') {
            throw error("expected a number for the " + what + ", found '" + (char) first + "'");
        }
        long value = 0;
        int c = first;
        while (c >= '0' && c <= '9') {
            value = Math.min(value * 10 + (c - '0'), (long) Integer.MAX_VALUE + 1);
            c = read();
        }
        if (c >= 0 && !isSpace(c) && c != '#') {
            throw error("expected a number for the " + what + ", found '" + (char) c + "' in it");
        }
        unread(c);
        return value;
    }

    private int skipSpaceAndComments() throws IOException {
        while (true) {
            int c = read();
            if (c == '#') {
                while (c >= 0 && c != '\n' && c != '\r') {
                    c = read();
                }
            }
            if (c < 0 || !isSpace(c)) {
                return c;
            }
        }
    }

    private int read() throws IOException {
        int c;
        if (pushedBack != -2) {
            c = pushedBack;
            pushedBack = -2;
        } else {
            c = in.read();
        }
        if (c == '\n') {
            line++;
        }
        return c;
    }

    private void unread(int c) {
        if (c == '\n') {
            line--;
        }
        pushedBack = c;
    }

    private static boolean isSpace(int c) {
        return c == ' ' || c == '\t' || c == '\n' || c == '\r' || c == '\f' || c == 0x0b;
    }

    private InputException error(String problem) {
        return new InputException(source, line, problem);
    }

    private InputException truncated(int pixel, int total) {
        return new InputException(source, InputException.NO_LINE, "the image ends after " + pixel + " of its "
                + total + " pixels");
    }
}
