package dev.morse.report;

import dev.morse.cycles.Cycle;
import dev.morse.cycles.RepresentativeCycles;
import dev.morse.engine.Computation;
import dev.morse.image.VoxelSet;
import dev.morse.input.VoxelInput;
import dev.morse.io.InputException;
import java.util.List;

/**
 * An image with the representative cycle of each of its holes (H_1 of a 2D foreground) or tunnels
 * (H_1 of a volume) drawn over it in its own colour, as SVG. The foreground pixels are grey squares
 * (one {@code <path class="foreground">}); each cycle is one {@code <path class="cycle">} made of its
 * edges, one move and one line per edge of the cubical complex, with {@code data-generator} its place
 * (from 1) among the generators of H_1 and {@code data-terms} its number of edges. A volume is
 * drawn seen from above: the foreground as the columns that hold any voxel, each cycle's edges along
 * x and y at their place in the plane (edges along z would be points and are left out). The picture
 * is as many screen pixels as needed for 4 to 40 per image pixel, about 640 across.
 */
public final class ImageCycleOverlay {
    /** Colours of the cycles, taken in turn; ten that stay apart from each other and from grey. */
    static final List<String> COLOURS = List.of("#d62728", "#1f77b4", "#2ca02c", "#ff7f0e", "#9467bd", "#8c564b",
            "#e377c2", "#17becf", "#bcbd22", "#393b79");
    private static final double MARGIN = 20;
    private static final double HEADER = 40;

    private ImageCycleOverlay() {
    }

    /**
     * The picture and what it shows.
     *
     * @param svg the SVG document
     * @param caption one line saying what is drawn
     */
    public record Overlay(String svg, String caption) {
    }

    /**
     * The picture of {@code run}, an image or volume, with the H_1 cycles that
     * {@link RepresentativeCycles#of} finds.
     *
     * @throws InputException when the input is not an image, or the cycles cannot be found on this run
     */
    public static Overlay of(Computation run) {
        if (!(run.input() instanceof VoxelInput image)) {
            throw new InputException(run.source(), InputException.NO_LINE, "only an image or volume is drawn with its"
                    + " cycles over it");
        }
        List<Cycle> loops = RepresentativeCycles.of(run).stream().filter(c -> c.dimension() == 1).toList();
        return draw(run.source(), image.image().voxels(), loops);
    }

    /** The picture of {@code voxels} with each of {@code loops}, 1-cycles in pixel units, in its own colour. */
    static Overlay draw(String source, VoxelSet voxels, List<Cycle> loops) {
        int width = voxels.size(0);
        int height = voxels.axes() > 1 ? voxels.size(1) : 1;
        int depth = voxels.axes() > 2 ? voxels.size(2) : 1;
        double scale = Math.max(4, Math.min(40, 640.0 / Math.max(width, height)));
        String caption = source + ": " + Counted.of(loops.size(), voxels.axes() > 2 ? "tunnel" : "hole")
                + ", each with a representative cycle in its own colour" + (depth > 1 ? " (seen from above)" : "");
        double legendHeight = 16.0 * loops.size();
        double svgWidth = Math.max(2 * MARGIN + width * scale, MARGIN + caption.length() * 7.0);
        double top = HEADER + legendHeight;
        Svg svg = new Svg(svgWidth, top + height * scale + MARGIN);
        svg.text("title", caption);
        svg.text("text", caption, "x", Svg.number(MARGIN), "y", "22", "font-size", "13");
        StringBuilder ground = new StringBuilder();
        for (int y = 0; y < height; y++) {
            int x = 0;
            while (x < width) {
                if (!columnHolds(voxels, x, y, depth)) {
                    x++;
                    continue;
                }
                int start = x;
                while (x < width && columnHolds(voxels, x, y, depth)) {
                    x++;
                }
                ground.append('M').append(Svg.number(MARGIN + start * scale)).append(' ')
                        .append(Svg.number(top + y * scale)).append('h').append(Svg.number((x - start) * scale))
                        .append('v').append(Svg.number(scale)).append('h').append(Svg.number(-(x - start) * scale))
                        .append('z');
            }
        }
        svg.empty("rect", "class", "frame", "x", Svg.number(MARGIN), "y", Svg.number(top),
                "width", Svg.number(width * scale), "height", Svg.number(height * scale), "fill", "#fff",
                "stroke", "#ccc");
        svg.empty("path", "class", "foreground", "d", ground.toString(), "fill", "#bbb");
        for (int k = 0; k < loops.size(); k++) {
            Cycle loop = loops.get(k);
            String colour = COLOURS.get(k % COLOURS.size());
            StringBuilder d = new StringBuilder();
            int edges = 0;
            for (Cycle.Term t : loop.terms()) {
                double[] from = new double[2];
                double[] to = new double[2];
                boolean flat = true;
                for (int a = 0; a < t.label().size(); a++) {
                    List<?> interval = (List<?>) t.label().get(a);
                    int lo = ((Number) interval.get(0)).intValue();
                    int hi = ((Number) interval.get(1)).intValue();
                    if (a < 2) {
                        from[a] = lo;
                        to[a] = hi;
                    } else {
                        flat &= lo == hi;
                    }
                }
                if (!flat) {
                    continue;
                }
                edges++;
                d.append('M').append(Svg.number(MARGIN + from[0] * scale)).append(' ')
                        .append(Svg.number(top + from[1] * scale)).append('L')
                        .append(Svg.number(MARGIN + to[0] * scale)).append(' ').append(Svg.number(top + to[1] * scale));
            }
            svg.titled("path", "cycle " + (k + 1) + ": " + Counted.of(loop.terms().size(), "edge"), "class", "cycle",
                    "data-generator", Integer.toString(k + 1), "data-terms", Integer.toString(loop.terms().size()),
                    "d", d.toString(), "fill", "none", "stroke", colour,
                    "stroke-width", Svg.number(Math.max(2, scale / 4)), "stroke-linecap", "round");
            double ly = HEADER + 16.0 * k;
            svg.empty("rect", "class", "key", "x", Svg.number(MARGIN), "y", Svg.number(ly - 8), "width", "18",
                    "height", "5", "fill", colour);
            svg.text("text", (voxels.axes() > 2 ? "tunnel " : "hole ") + (k + 1) + ": a cycle of "
                    + Counted.of(loop.terms().size(), "edge") + (edges < loop.terms().size() ? " (" + edges
                    + " seen from above)" : ""), "x", Svg.number(MARGIN + 24), "y", Svg.number(ly), "font-size", "11");
        }
        return new Overlay(svg.finish(), caption);
    }

    private static boolean columnHolds(VoxelSet voxels, int x, int y, int depth) {
        for (int z = 0; z < depth; z++) {
            boolean in = switch (voxels.axes()) {
                case 1 -> voxels.contains(x);
                case 2 -> voxels.contains(x, y);
                default -> voxels.contains(x, y, z);
            };
            if (in) {
                return true;
            }
        }
        return false;
    }
}
