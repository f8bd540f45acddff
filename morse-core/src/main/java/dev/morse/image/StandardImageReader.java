package dev.morse.image;

import dev.morse.io.InputException;
import java.awt.color.ColorSpace;
import java.awt.image.BufferedImage;
import java.awt.image.ColorModel;
import java.awt.image.IndexColorModel;
import java.awt.image.Raster;
import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import javax.imageio.ImageIO;

/**
 * Reads the image formats that {@link ImageIO} knows (PNG, GIF, BMP, JPEG, ...). A grey image keeps
 * its samples and their range (16-bit PNG: 0..65535); any other image is read as the luminance of
 * its colours, 0..255, with the BT.601 weights of {@link NetpbmReader}. Transparency is ignored.
 */
public final class StandardImageReader {
    private StandardImageReader() {
    }

    /** Whether the first bytes are the signature of PNG, GIF, BMP or JPEG. */
    public static boolean hasSignature(byte[] head) {
        return startsWith(head, 0x89, 'P', 'N', 'G') || startsWith(head, 'G', 'I', 'F', '8')
                || startsWith(head, 'B', 'M') || startsWith(head, 0xFF, 0xD8, 0xFF);
    }

    private static boolean startsWith(byte[] head, int... signature) {
        if (head.length < signature.length) {
            return false;
        }
        for (int i = 0; i < signature.length; i++) {
            if ((head[i] & 0xFF) != signature[i]) {
                return false;
            }
        }
        return true;
    }

    /**
     * Reads one image.
     *
     * @throws InputException when javax.imageio cannot decode the file
     */
    public static GreyImage read(Path file) throws IOException {
        BufferedImage image;
        try (InputStream in = Files.newInputStream(file)) {
            image = ImageIO.read(in);
        } catch (IOException | RuntimeException e) {
            throw new InputException(file.toString(), InputException.NO_LINE, "cannot decode the image: "
                    + (e.getMessage() == null ? e.getClass().getSimpleName() : e.getMessage()));
        }
        if (image == null) {
            throw new InputException(file.toString(), InputException.NO_LINE, "not an image format that can be read");
        }
        return grey(image);
    }

    /** The grey samples of a decoded image. */
    static GreyImage grey(BufferedImage image) {
        int width = image.getWidth();
        int height = image.getHeight();
        ColorModel model = image.getColorModel();
        Raster raster = image.getRaster();
        if (model.getColorSpace().getType() == ColorSpace.TYPE_GRAY && !(model instanceof IndexColorModel)) {
            int bits = model.getComponentSize(0);
            int[] samples = raster.getSamples(0, 0, width, height, 0, (int[]) null);
            return new GreyImage(width, height, (1 << Math.min(bits, 16)) - 1, samples);
        }
        int[] samples = new int[width * height];
        int[] rgb = new int[3];
        for (int y = 0; y < height; y++) {
            for (int x = 0; x < width; x++) {
                int argb = image.getRGB(x, y);
                rgb[0] = (argb >> 16) & 0xFF;
                rgb[1] = (argb >> 8) & 0xFF;
                rgb[2] = argb & 0xFF;
                samples[x + width * y] = NetpbmReader.luminance(rgb);
            }
        }
        return new GreyImage(width, height, 255, samples);
    }
}
