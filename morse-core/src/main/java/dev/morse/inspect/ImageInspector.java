package dev.morse.inspect;

import dev.morse.image.CubicalComplex;
import dev.morse.image.LoadedImage;
import java.util.ArrayList;
import java.util.List;

/** Gathers an {@link ImageSummary}: the image's size and foreground, and the cells of its cubical complex. */
public final class ImageInspector {
    private ImageInspector() {
    }

    /**
     * Inspects {@code image}.
     *
     * @throws IllegalStateException if its cubical complex has more cells than one complex can hold
     */
    public static ImageSummary inspect(LoadedImage image) {
        CubicalComplex complex = CubicalComplex.of(image.voxels());
        List<Long> cells = new ArrayList<>();
        for (int d = 0; d <= complex.dimension(); d++) {
            cells.add((long) complex.cellCount(d));
        }
        List<Integer> size = new ArrayList<>();
        for (int extent : image.voxels().sizes()) {
            size.add(extent);
        }
        return new ImageSummary(size, image.slices(), image.voxels().count(), image.threshold(), image.inverted(), cells);
    }
}
