package dev.morse.report;

import dev.morse.complex.ComplexKind;
import dev.morse.cycles.Cycle;
import dev.morse.engine.Computation;
import dev.morse.engine.ImageFacts;
import dev.morse.engine.PhaseTiming;
import dev.morse.homology.Coefficients;
import dev.morse.implicit.ImplicitHomology;
import dev.morse.homology.HomologyGroup;
import dev.morse.io.InputFormat;
import java.math.BigInteger;
import dev.morse.matching.TrialCount;
import dev.morse.morsecomplex.ReductionRound;
import dev.morse.posetreduction.ReductionStats;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import java.util.StringJoiner;

/**
 * Writes a {@link Computation} for people: a short two-column table saying which complex was
 * built and, for a poset, why; its cells, the matching and its critical cells against the Morse lower
 * bound, the cells left after each algebraic round, one line per homology group such as
 * {@code H_1 = Z^2 + Z/2}, and the time each phase took.
 */
public final class TextReportWriter {
    private static final String ROW = "  %-10s%s\n";
    private static final int CYCLE_TERMS_SHOWN = 8;

    private TextReportWriter() {
    }

    /** The report as lines of text, each ending with a newline. */
    public static String toText(Computation report) {
        return toText(report, List.of());
    }

    /** The report followed by its representative cycles, each on one line with long sums elided. */
    public static String toText(Computation report, List<Cycle> cycles) {
        String text = table(report);
        if (cycles.isEmpty()) {
            return text;
        }
        StringBuilder more = new StringBuilder(text);
        row(more, "cycles", cycles.size() + (cycles.size() == 1 ? " generator" : " generators")
                + ", each a cycle of the " + report.complexKind().reportName() + " complex, checked");
        String prefix = report.reduced() ? "~H_" : "H_";
        for (Cycle c : cycles) {
            more.append(String.format(Locale.ROOT, "    %s%d %s: %s\n", prefix, c.dimension(),
                    c.order().signum() == 0 ? "free" : "order " + c.order(), cycleSum(report.complexKind(), c)));
        }
        more.append(String.format(Locale.ROOT, "    %,d terms in all, %,d before shortening by boundaries\n",
                cycles.stream().mapToLong(c -> c.terms().size()).sum(),
                cycles.stream().mapToLong(Cycle::liftedTerms).sum()));
        return more.toString();
    }

    /** The first terms of a cycle as a signed sum, and how many more there are. */
    private static String cycleSum(ComplexKind kind, Cycle c) {
        StringBuilder sum = new StringBuilder();
        int shown = Math.min(CYCLE_TERMS_SHOWN, c.terms().size());
        for (int i = 0; i < shown; i++) {
            Cycle.Term t = c.terms().get(i);
            BigInteger a = t.coefficient();
            sum.append(i == 0 ? (a.signum() < 0 ? "-" : "") : (a.signum() < 0 ? " - " : " + "));
            if (!a.abs().equals(BigInteger.ONE)) {
                sum.append(a.abs()).append(' ');
            }
            sum.append(cellText(kind, t.label()));
        }
        if (c.terms().size() > shown) {
            sum.append(" + ... (").append(c.terms().size()).append(" terms in all)");
        }
        return sum.toString();
    }

    /** A cell as the complex names its cells: {@code {a b c}}, {@code a<b<c}, a label, or {@code [2,3]x[5,5]}. */
    private static String cellText(ComplexKind kind, List<Object> label) {
        StringJoiner parts = switch (kind) {
            case SIMPLICIAL -> new StringJoiner(" ", "{", "}");
            case ORDER -> new StringJoiner("<");
            case CUBICAL -> new StringJoiner("x");
            case CELLULAR, GIVEN -> new StringJoiner("");
        };
        for (Object part : label) {
            parts.add(part instanceof List<?> pair ? "[" + pair.get(0) + "," + pair.get(1) + "]" : part.toString());
        }
        return parts.toString();
    }

    private static String table(Computation report) {
        StringBuilder text = new StringBuilder();
        text.append(String.format(Locale.ROOT, "%s (%s file)\n", report.source(),
                report.format().name().toLowerCase(Locale.ROOT)));
        row(text, "complex", complexLine(report));
        String choice = choiceLine(report);
        if (choice != null) {
            row(text, "why", choice);
        }
        report.image().ifPresent(image -> {
            row(text, "image", imageLine(image));
            row(text, "shape", shapeLine(image));
        });
        report.posetReduction().ifPresent(stats -> row(text, "reduction", reductionLine(stats)));
        row(text, "cells", countsLine(report.cells()));
        row(text, "matching", matchingLine(report));
        report.implicitRun().ifPresent(run -> row(text, "walk", walkLine(run)));
        row(text, "bound", boundOver(report.coefficients()) + " " + report.morseLowerBound() + ", excess "
                + report.excess() + boundCaveat(report.coefficients()));
        for (ReductionRound round : report.rounds()) {
            row(text, "round " + round.round(), round.pairsRemoved() + " pairs removed, left "
                    + countsLine(Arrays.stream(round.cellCounts()).boxed().toList()));
        }
        if (!report.trials().isEmpty()) {
            int runs = report.trials().stream().mapToInt(TrialCount::count).sum();
            row(text, "trials", runs + " runs of " + report.matchingName() + ", " + Counted.of(report.trials().size(),
                    "vector", "vectors") + " of critical cells by dimension; excess over the bound "
                    + report.morseLowerBound() + ":");
            text.append(TrialTable.toText(report.trials(), report.morseLowerBound(), "              "));
        }
        row(text, "homology", (report.reduced() ? "reduced, " : "") + "coefficients " + ringName(report.coefficients()));
        String prefix = report.reduced() ? "~H_" : "H_";
        List<HomologyGroup> groups = report.homology().groups();
        for (int i = 0; i < groups.size(); i++) {
            HomologyGroup group = groups.get(i);
            int end = i;
            while (end + 1 < groups.size() && group.isTrivial() && groups.get(end + 1).isTrivial()) {
                end++;
            }
            if (end - i + 1 >= Counted.RUN) {
                // a long run of zero groups (a long chain reduces to a point, listed up to its top dimension)
                text.append(String.format(Locale.ROOT, "    %s%d .. %s%d = 0\n", prefix, group.dimension(), prefix,
                        groups.get(end).dimension()));
                i = end;
                continue;
            }
            text.append(String.format(Locale.ROOT, "    %s%d = %s\n", prefix, group.dimension(),
                    groupText(group, report.coefficients())));
        }
        if (report.homology().groups().isEmpty()) {
            text.append("    (no cells, so no homology groups)").append("\n");
        }
        row(text, "time", timingLine(report.timings()));
        return text.toString();
    }

    /** The homology of a run on one line, such as {@code coefficients Z: H_0 = Z, H_1 = Z/2}. */
    public static String homologyLine(Computation report) {
        StringJoiner groups = new StringJoiner(", ");
        String prefix = report.reduced() ? "~H_" : "H_";
        for (HomologyGroup group : report.homology().groups()) {
            groups.add(prefix + group.dimension() + " = " + groupText(group, report.coefficients()));
        }
        return (report.reduced() ? "reduced, " : "") + "coefficients " + report.coefficients() + ": "
                + (groups.length() == 0 ? "no groups (no cells)" : groups.toString());
    }

    /**
     * A homology group over the given coefficients: over Z a finitely generated abelian group such
     * as {@code Z^2 + Z/2}; over a field a vector space, written as the field to the power of its
     * dimension, {@code Q^3} or {@code F_3^57} (F_p, the field of p elements, common practice), so
     * that it is never mistaken for torsion.
     */
    public static String groupText(HomologyGroup group, Coefficients coefficients) {
        String field = JsonStyle.ringLabel(coefficients);
        StringJoiner parts = new StringJoiner(" + ");
        if (group.betti() == 1) {
            parts.add(field);
        } else if (group.betti() > 1) {
            parts.add(field + "^" + group.betti());
        }
        for (BigInteger factor : group.torsion()) {
            parts.add("Z/" + factor);
        }
        return parts.length() == 0 ? "0" : parts.toString();
    }

    private static void row(StringBuilder text, String label, String value) {
        text.append(String.format(Locale.ROOT, ROW, label, value));
    }

    private static String complexLine(Computation report) {
        return switch (report.complexKind()) {
            case CELLULAR -> "cellular, one cell per element of the poset";
            case ORDER -> report.implicitRun().isPresent()
                    ? "order complex, one simplex per chain of the poset, chains generated on demand (implicit engine)"
                    : "order complex, one simplex per chain of the poset";
            case SIMPLICIAL -> "simplicial, all faces of the listed faces";
            case CUBICAL -> "cubical, one cell per elementary cube of the foreground";
            case GIVEN -> "given by its boundary matrices, one cell per basis element";
        };
    }

    /** Why this complex was built, when there was a choice. */
    private static String choiceLine(Computation report) {
        if (report.format() != InputFormat.POSET) {
            return null;
        }
        String cw = report.cwCheck()
                .map(v -> v.isCwPoset() ? "the poset is a CW poset" : "not a CW poset: " + v.reason())
                .orElse("chosen without checking for a CW poset");
        return report.reason().isEmpty() ? cw : cw + "; " + report.reason();
    }

    private static String imageLine(ImageFacts image) {
        StringJoiner size = new StringJoiner(" x ");
        image.size().forEach(n -> size.add(Integer.toString(n)));
        String unit = image.isVolume() ? "voxels" : "pixels";
        return String.format(Locale.ROOT, "%s %s%s, foreground %d (samples %s %d)", size, unit,
                image.slices() > 1 ? " from " + image.slices() + " slices" : "", image.foreground(),
                image.inverted() ? "below" : "at or above", image.threshold());
    }

    /** β_0, β_1 and β_2 in the words of imaging. */
    private static String shapeLine(ImageFacts image) {
        String shape = plural(image.components(), "component") + ", "
                + plural(image.tunnels(), image.isVolume() ? "tunnel" : "hole");
        return image.isVolume() ? shape + ", " + plural(image.cavities(), "cavity", "cavities") : shape;
    }

    private static String plural(int count, String one) {
        return plural(count, one, one + "s");
    }

    private static String plural(int count, String one, String many) {
        return count + " " + (count == 1 ? one : many);
    }

    private static String reductionLine(ReductionStats stats) {
        return String.format(Locale.ROOT, "%d -> %d elements before the order complex: %s, %s removed%s, %.2f ms",
                stats.elementsBefore(), stats.elementsAfter(), plural(stats.beatPointsRemoved(), "beat point"),
                plural(stats.acyclicLinksRemoved(), "acyclic link"),
                stats.linksSkipped() > 0 ? " (" + stats.linksSkipped() + " links too large to test)" : "",
                stats.milliseconds());
    }

    private static String countsLine(List<? extends Number> counts) {
        long total = counts.stream().mapToLong(Number::longValue).sum();
        if (counts.isEmpty()) {
            return "none";
        }
        return counts.size() == 1
                ? total + " in dimension 0"
                : total + " = " + Counted.terms(counts, " + ") + " in dimensions 0.." + (counts.size() - 1);
    }

    private static String matchingLine(Computation report) {
        if (report.critical().stream().map(Integer::longValue).toList().equals(report.cells())) {
            return report.matchingName() + ", every cell is critical";
        }
        return report.matchingName() + ", critical cells " + countsLine(report.critical());
    }

    private static String walkLine(ImplicitHomology.Outcome run) {
        return String.format(Locale.ROOT, "element order %s: %d chains from the bottom walked, %d maximal chains"
                + " reached, %d subtrees skipped, %d defective fibres", run.order().optionName(), run.search().nodes(),
                run.search().facets(), run.search().skippedSubtrees(), run.search().defectiveFacets());
    }

    /**
     * "Morse lower bound", with the field it was computed over unless that is Z. Over a field the
     * bound counts Betti numbers over that field; integral torsion, which a field does not see
     * (Z/2 is invisible over Q), can only raise it (Forman 1998: the bound over Z is
     * Σ β_d + t_d + t_(d−1)).
     */
    static String boundOver(Coefficients coefficients) {
        return coefficients.hasTorsion() ? "Morse lower bound" : "Morse lower bound over " + JsonStyle.ringLabel(coefficients);
    }

    /** Why a bound over a field may be lower than the matching can reach. */
    static String boundCaveat(Coefficients coefficients) {
        return coefficients.hasTorsion() ? "" : " (integral torsion, not seen over a field, may raise the bound)";
    }

    private static String ringName(Coefficients coefficients) {
        return switch (coefficients.ring()) {
            case INTEGERS -> "Z (integers)";
            case RATIONALS -> "Q (rationals)";
            case PRIME_FIELD -> "F_" + coefficients.prime() + " (the field Z/" + coefficients.prime() + " of "
                    + coefficients.prime() + " elements)";
        };
    }

    private static String timingLine(List<PhaseTiming> timings) {
        StringJoiner parts = new StringJoiner(", ");
        for (PhaseTiming t : timings) {
            parts.add(String.format(Locale.ROOT, "%s %.2f ms", t.phase(), t.milliseconds()));
        }
        return parts.length() == 0 ? "not measured" : parts.toString();
    }
}
