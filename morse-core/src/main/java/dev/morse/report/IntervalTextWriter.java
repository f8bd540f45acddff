package dev.morse.report;

import dev.morse.homology.Coefficients;
import dev.morse.homology.HomologyGroup;
import dev.morse.interval.IntervalResult;
import dev.morse.interval.IntervalTask;
import dev.morse.interval.SweepReport;
import java.math.BigInteger;
import java.util.Locale;

/** Writes an interval sweep as a few lines of text for people: the counts, each verdict, the witness. */
public final class IntervalTextWriter {
    private IntervalTextWriter() {
    }

    /** The sweep as text, with the Möbius table when {@code mobius}. */
    public static String toText(SweepReport report, boolean mobius) {
        StringBuilder s = new StringBuilder();
        s.append("input:          ").append(report.source()).append('\n');
        s.append("coefficients:   ").append(report.coefficients()).append('\n');
        s.append(String.format(Locale.ROOT, "intervals:      %,d of P-hat (%,d elements in P); swept %,d: %,d computed,"
                + " %,d skipped (%,d graphs, %,d cones)%s%n", report.intervals(), report.hat().size(), report.swept(),
                report.computed(), report.skipped(), report.count(IntervalResult.How.GRAPH),
                report.count(IntervalResult.How.CONE), report.stoppedEarly() ? ", stopped at the first failure" : ""));
        s.append("pure:           ").append(yes(report.pure()))
                .append(report.pure() ? " (rank " + report.rank() + ")" : "").append('\n');
        s.append("Cohen-Macaulay: ").append(yes(report.cohenMacaulay())).append('\n');
        report.witness().ifPresent(w -> s.append("  witness:      ").append(interval(report, w.task()))
                .append(w.graded() ? ", dimension " + w.dimension() + ": " + homology(report.coefficients(), w)
                        : ": not graded").append('\n'));
        s.append("spherical:      ").append(report.spherical().map(IntervalTextWriter::yes).orElse("not known"))
                .append('\n');
        s.append("Eulerian:       ").append(yes(report.eulerian())).append('\n');
        s.append("Gorenstein*:    ").append(yes(report.gorensteinStar())).append('\n');
        if (mobius) {
            s.append("Mobius function:\n");
            for (IntervalTask t : report.allIntervals()) {
                BigInteger mu = report.mobius(t);
                s.append("  mu").append(interval(report, t)).append(" = ").append(mu).append('\n');
            }
        }
        return s.toString();
    }

    private static String yes(boolean b) {
        return b ? "yes" : "no";
    }

    private static String interval(SweepReport report, IntervalTask t) {
        return "(" + name(report.label(t.lower()), "0^") + ", " + name(report.label(t.upper()), "1^") + ")";
    }

    private static String name(String label, String bound) {
        return label == null ? bound : label;
    }

    private static String homology(Coefficients ring, IntervalResult r) {
        StringBuilder s = new StringBuilder();
        for (HomologyGroup g : r.homology().groups()) {
            if (g.isTrivial()) {
                continue;
            }
            s.append(s.length() > 0 ? ", " : "").append("H~").append(g.dimension()).append(" = ")
                    .append(ring.hasTorsion() ? g.toString() : field(ring, g.betti()));
        }
        return s.length() == 0 ? "acyclic" : s.toString();
    }

    private static String field(Coefficients ring, int betti) {
        String k = ring.ring() == Coefficients.Ring.RATIONALS ? "Q" : "Z/" + ring.prime();
        return betti == 1 ? k : k + "^" + betti;
    }
}
