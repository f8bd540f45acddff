package dev.morse.report;

import com.fasterxml.jackson.core.JsonFactory;
import com.fasterxml.jackson.core.JsonGenerator;
import dev.morse.homology.HomologyGroup;
import dev.morse.interval.IntervalResult;
import dev.morse.interval.IntervalTask;
import dev.morse.interval.SweepReport;
import dev.morse.io.TextOutput;
import java.io.IOException;
import java.io.Writer;
import java.math.BigInteger;
import java.util.List;
import java.util.Optional;

/**
 * Writes an interval sweep as JSON: one object with the fields fixed by the design ({@code input,
 * coefficients, intervals, pure, cohen_macaulay, witness, spherical}, {@code mobius} when asked for)
 * and these of ours: {@code elements} (of P), {@code rank} (of 1̂ in P̂, {@code null} unless pure),
 * {@code eulerian}, {@code gorenstein_star}, {@code swept} (intervals examined), {@code computed}
 * (by the homology engine), {@code skipped} and {@code skipped_by} ({@code graph}: order complexes of
 * dimension at most one, read off by Euler's formula; {@code cone}: intervals with a least or
 * greatest element), and {@code stopped_early} (a sweep with {@code --first-failure} that did not
 * reach the end). {@code spherical} is {@code null} when the sweep stopped before (0̂, 1̂).
 *
 * <p>A witness is {@code {"lower", "upper", "dimension", "reason", "homology"}}; {@code lower} and
 * {@code upper} are labels, {@code null} for 0̂ and 1̂; {@code reason} is {@code "not graded"} or
 * {@code "homology below the top dimension"}. Homology lists the reduced groups of the interval's order
 * complex by dimension; the empty interval of a cover lists only {@code {"dimension": -1, "betti": 1}}.
 * With {@link #toJsonLines} each swept interval is one line {@code {"lower", "upper", "dimension",
 * "homology"}}. The Möbius table lists {@code {"lower", "upper", "value"}} for every interval of P̂ in
 * sweep order. Numbers are exact JSON integers of any size.
 */
public final class IntervalJsonWriter {
    private static final JsonFactory FACTORY = JsonFactory.builder().build();

    private IntervalJsonWriter() {
    }

    /** The sweep as one indented JSON object, with the Möbius table when {@code mobius}. */
    public static String toJson(SweepReport report, boolean mobius) {
        return JsonStyle.toText(json -> {
            json.writeStartObject();
            json.writeStringField("input", report.source());
            json.writeStringField("coefficients", report.coefficients().toString());
            json.writeNumberField("elements", report.hat().size());
            json.writeNumberField("intervals", report.intervals());
            json.writeBooleanField("pure", report.pure());
            json.writeFieldName("rank");
            if (report.pure()) {
                json.writeNumber(report.rank());
            } else {
                json.writeNull();
            }
            json.writeBooleanField("cohen_macaulay", report.cohenMacaulay());
            writeWitness(json, report);
            json.writeFieldName("spherical");
            if (report.spherical().isPresent()) {
                json.writeBoolean(report.spherical().get());
            } else {
                json.writeNull();
            }
            json.writeBooleanField("eulerian", report.eulerian());
            json.writeBooleanField("gorenstein_star", report.gorensteinStar());
            json.writeNumberField("swept", report.swept());
            json.writeNumberField("computed", report.computed());
            json.writeNumberField("skipped", report.skipped());
            json.writeObjectFieldStart("skipped_by");
            json.writeNumberField("graph", report.count(IntervalResult.How.GRAPH));
            json.writeNumberField("cone", report.count(IntervalResult.How.CONE));
            json.writeEndObject();
            json.writeBooleanField("stopped_early", report.stoppedEarly());
            if (mobius) {
                writeMobius(json, report);
            }
            json.writeEndObject();
        });
    }

    /** One compact JSON line per swept interval, in sweep order. */
    public static String toJsonLines(SweepReport report) {
        return TextOutput.render(out -> writeLines(report, out));
    }

    /** Writes {@link #toJsonLines} to {@code out}. */
    public static void writeLines(SweepReport report, Writer out) throws IOException {
        for (IntervalResult r : report.results()) {
            try (JsonGenerator json = FACTORY.createGenerator(out)) {
                json.disable(JsonGenerator.Feature.AUTO_CLOSE_TARGET);
                json.writeStartObject();
                writeEnds(json, report, r.task());
                json.writeNumberField("dimension", r.dimension());
                writeGroups(json, r.homology().groups());
                json.writeEndObject();
            }
            out.write('\n');
        }
    }

    private static void writeWitness(JsonGenerator json, SweepReport report) throws IOException {
        json.writeFieldName("witness");
        Optional<IntervalResult> witness = report.witness();
        if (witness.isEmpty()) {
            json.writeNull();
            return;
        }
        IntervalResult w = witness.get();
        json.writeStartObject();
        writeEnds(json, report, w.task());
        json.writeNumberField("dimension", w.dimension());
        json.writeStringField("reason", w.graded() ? "homology below the top dimension" : "not graded");
        writeGroups(json, w.homology().groups());
        json.writeEndObject();
    }

    private static void writeMobius(JsonGenerator json, SweepReport report) throws IOException {
        json.writeArrayFieldStart("mobius");
        for (IntervalTask t : report.allIntervals()) {
            json.writeStartObject();
            writeEnds(json, report, t);
            BigInteger mu = report.mobius(t);
            json.writeFieldName("value");
            json.writeNumber(mu);
            json.writeEndObject();
        }
        json.writeEndArray();
    }

    private static void writeEnds(JsonGenerator json, SweepReport report, IntervalTask t) throws IOException {
        json.writeFieldName("lower");
        writeLabel(json, report.label(t.lower()));
        json.writeFieldName("upper");
        writeLabel(json, report.label(t.upper()));
    }

    private static void writeLabel(JsonGenerator json, String label) throws IOException {
        if (label == null) {
            json.writeNull();
        } else {
            json.writeString(label);
        }
    }

    private static void writeGroups(JsonGenerator json, List<HomologyGroup> groups) throws IOException {
        JsonReportWriter.writeHomology(json, groups);
    }
}
