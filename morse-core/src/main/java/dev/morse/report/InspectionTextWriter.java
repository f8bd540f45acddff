package dev.morse.report;

import dev.morse.inspect.PosetSummary;
import dev.morse.inspect.ChainComplexSummary;
import dev.morse.inspect.ImageSummary;
import dev.morse.inspect.Inspections;
import dev.morse.inspect.SimplicialSummary;
import dev.morse.input.Input;
import java.math.BigInteger;
import java.util.List;
import java.util.Locale;

/**
 * Writes an inspection for people: a two-column table of what a poset or a simplicial complex is,
 * one fact per row.
 */
public final class InspectionTextWriter {
    private static final String ROW = "  %-11s%s\n";

    private InspectionTextWriter() {
    }

    /** The summary of poset file {@code input}, as lines of text. */
    public static String toText(String input, PosetSummary s) {
        StringBuilder text = new StringBuilder();
        text.append(input).append(" (poset file)\n");
        row(text, "elements", s.elements() + ", of which " + s.minimal() + " minimal and " + s.maximal() + " maximal");
        row(text, "covers", Integer.toString(s.covers()));
        row(text, s.graded() ? "ranks" : "heights", levels(s));
        row(text, "graded", s.graded() ? "yes, every cover raises the rank by one" : "no, some cover skips a height");
        row(text, "thin", s.thin() ? "yes, every interval of length 2 has exactly two middle elements"
                : "no: " + s.thinFailure());
        row(text, "CW poset", s.cwCheck().isCwPoset()
                ? "yes, so its cellular complex has one cell per element"
                : "no: " + s.cwCheck().reason());
        if (!s.chainsCounted()) {
            row(text, "chains", s.chainsSkipped());
            return text.toString();
        }
        row(text, "chains", s.chains().isEmpty() ? "none, the poset is empty"
                : sum(s.chains()) + " = " + joined(s.chains(), " + ") + " in dimensions 0.." + (s.chains().size() - 1)
                        + " of the order complex");
        row(text, "euler", "Euler characteristic " + s.eulerCharacteristic() + ", reduced "
                + s.reducedEulerCharacteristic());
        row(text, "mobius", s.mobius() + " from bottom to top, once both are adjoined;"
                + " equal to the reduced Euler characteristic (Philip Hall)");
        return text.toString();
    }

    /** The summary of simplicial file {@code input}, as lines of text. */
    public static String toText(String input, SimplicialSummary s) {
        StringBuilder text = new StringBuilder();
        text.append(input).append(" (simplicial file)\n");
        row(text, "vertices", Integer.toString(s.vertices()));
        row(text, "dimension", Integer.toString(s.dimension()));
        row(text, "f-vector", s.faces().isEmpty() ? "none, no faces"
                : "(" + joined(s.faces(), ", ") + "), " + sum(s.faces()) + " faces in dimensions 0.." + s.dimension());
        row(text, "facets", s.facetCount() + " (" + s.listedFaces() + " faces listed), by dimension "
                + joined(s.facets(), " + ") + (s.pure() ? "; pure" : "; not pure"));
        row(text, "euler", "Euler characteristic " + s.eulerCharacteristic());
        return text.toString();
    }

    /** The summary of image or volume {@code input}, as lines of text. */
    public static String toText(String input, ImageSummary s) {
        StringBuilder text = new StringBuilder();
        text.append(input).append(s.isVolume() ? " (volume)\n" : " (image)\n");
        row(text, "size", joined(s.size(), " x ") + (s.isVolume() ? " voxels" : " pixels")
                + (s.slices() > 1 ? " from " + s.slices() + " slices" : ""));
        row(text, "foreground", s.foreground() + " (samples " + (s.inverted() ? "below " : "at or above ")
                + s.threshold() + ")");
        row(text, "cells", s.cells().isEmpty() ? "none, the foreground is empty"
                : "(" + joined(s.cells(), ", ") + "), " + sum(s.cells()) + " elementary cubes in dimensions 0.."
                        + (s.cells().size() - 1));
        row(text, "euler", "Euler characteristic " + s.eulerCharacteristic());
        return text.toString();
    }

    /** The summary of any input, as lines of text. */
    public static String toText(Input input) {
        return Inspections.show(input, InspectionTextWriter::toText, InspectionTextWriter::toText,
                InspectionTextWriter::toText, InspectionTextWriter::toText);
    }

    /** The summary of a chain complex given by its boundary matrices, as lines of text. */
    public static String toText(String input, ChainComplexSummary s) {
        StringBuilder text = new StringBuilder();
        text.append(input).append(" (boundary matrices)\n");
        row(text, "cells", s.cells().isEmpty() ? "none" : "(" + joined(s.cells(), ", ") + ") in dimensions 0.."
                + (s.cells().size() - 1));
        row(text, "entries", "nonzero entries of the boundary per dimension (" + joined(s.entries(), ", ") + ")"
                + (s.unitEntries() ? ", all of them 1 or -1" : ""));
        row(text, "euler", "Euler characteristic " + s.eulerCharacteristic());
        return text.toString();
    }

    private static String levels(PosetSummary s) {
        List<Integer> sizes = s.rankSizes();
        if (sizes.isEmpty()) {
            return "none, the poset is empty";
        }
        String word = s.graded() ? "rank" : "height";
        return sizes.size() == 1
                ? sizes.get(0) + " elements, all of " + word + " 0"
                : joined(sizes, " + ") + " elements of " + word + " 0.." + (sizes.size() - 1);
    }

    private static void row(StringBuilder text, String label, String value) {
        text.append(String.format(Locale.ROOT, ROW, label, value));
    }

    private static String joined(List<? extends Number> values, String separator) {
        return Counted.terms(values, separator);
    }

    private static BigInteger sum(List<? extends Number> values) {
        BigInteger total = BigInteger.ZERO;
        for (Number v : values) {
            total = total.add(new BigInteger(v.toString()));
        }
        return total;
    }
}
