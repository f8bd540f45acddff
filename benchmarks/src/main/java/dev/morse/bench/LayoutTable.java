package dev.morse.bench;

import dev.morse.generate.Families;
import dev.morse.generate.Generated;
import dev.morse.poset.Poset;
import dev.morse.report.HasseDrawing;
import dev.morse.report.HasseLayout;
import java.util.Locale;

/**
 * Edge crossings and size of the Hasse diagram pictures in the first layout (one row per rank, six
 * barycentre sweeps) and in the layered one (weighted median and transposition, priority
 * placement, wide ranks wrapped), on the partition and Boolean lattices. Prints one Markdown row
 * per poset; the milliseconds are those of the layered layout alone, best of three.
 *
 * <p>Arguments: {@code pi:N} or {@code b:N} for the proper part of Π_N or B_N, with a suffix
 * {@code +} for the whole lattice (for example {@code pi:5 b:5+}).
 */
public final class LayoutTable {
    private LayoutTable() {
    }

    /** Prints the table for the posets named by the arguments. */
    public static void main(String[] args) {
        System.out.println("| poset | elements | covers | crossings, first layout | crossings, layered |"
                + " diagram px, first layout | diagram px, layered | layered ms |");
        System.out.println("|---|---|---|---|---|---|---|---|");
        for (String arg : args) {
            boolean whole = arg.endsWith("+");
            String[] parts = arg.replace("+", "").split(":");
            int n = Integer.parseInt(parts[1]);
            Generated g = parts[0].equals("pi") ? Families.partitionLattice(n, !whole)
                    : Families.booleanLattice(n, !whole);
            Poset poset = ((Generated.OfPoset) g).poset();
            HasseDrawing drawing = HasseDrawing.ofPoset(poset, g.description(), "");
            HasseLayout before = HasseLayout.evenRows(drawing);
            long best = Long.MAX_VALUE;
            HasseLayout after = null;
            for (int repeat = 0; repeat < 3; repeat++) {
                long start = System.nanoTime();
                after = HasseLayout.layered(drawing);
                best = Math.min(best, System.nanoTime() - start);
            }
            System.out.println(String.format(Locale.ROOT, "| %s %s | %d | %d | %d | %d | %.0f x %.0f | %.0f x %.0f | %.1f |",
                    parts[0].equals("pi") ? "Π_" + n : "B_" + n, whole ? "whole" : "proper part", poset.size(),
                    drawing.coverCount(), before.crossings(), after.crossings(), before.width(), before.height(),
                    after.width(), after.height(), best / 1e6));
        }
    }
}
