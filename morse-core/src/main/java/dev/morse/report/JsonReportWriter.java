package dev.morse.report;

import dev.morse.io.TextOutput;
import com.fasterxml.jackson.core.JsonFactory;
import com.fasterxml.jackson.core.JsonGenerator;
import com.fasterxml.jackson.core.util.DefaultPrettyPrinter;
import dev.morse.cw.CwPosetVerdict;
import dev.morse.cycles.Cycle;
import dev.morse.engine.Computation;
import dev.morse.engine.ImageFacts;
import dev.morse.engine.PhaseTiming;
import dev.morse.implicit.ImplicitHomology;
import dev.morse.homology.HomologyGroup;
import java.io.IOException;
import java.io.Writer;
import java.math.BigDecimal;
import java.math.BigInteger;
import java.math.RoundingMode;
import dev.morse.matching.TrialCount;
import dev.morse.morsecomplex.ReductionRound;
import dev.morse.io.InputFormat;
import dev.morse.posetreduction.ReductionStats;
import java.util.List;
import java.util.Optional;

/**
 * Writes a {@link Computation} as one JSON object with the fields fixed by the design
 * ({@code complex, cells, matching, critical, coefficients, homology}) and these of ours:
 * {@code input}, {@code format} ({@code poset} or {@code simplicial}), {@code reduced},
 * {@code cw_check} ({@code {"cw_poset": bool}}, with {@code "reason": text} when the check gave
 * one, or {@code null} when no check was made), {@code morse_lower_bound} (over the ring
 * {@code morse_lower_bound_over}, written as {@code coefficients} is: over a field it counts that field's Betti numbers and
 * misses integral torsion) and {@code excess} (critical
 * cells beyond it), {@code rounds} (cells left after each algebraic reduction round), {@code trials}
 * (critical vectors and how often each occurred, when several seeded runs were asked for),
 * {@code engine} (whether the cells were stored, {@code explicit}, or, for an order complex,
 * generated on demand, {@code implicit}), {@code engine_reason} when the choice was automatic and,
 * for the implicit engine, {@code implicit} (its element order and what its walk over maximal chains
 * did),
 * {@code poset_reduction} (for a poset: what the reduction before the order complex removed, or
 * {@code null} when none ran), {@code image} (for an image or volume: its size, threshold,
 * foreground, and components, tunnels and cavities) and {@code timings_ms} (phase name to
 * milliseconds). Torsion factors are JSON integers of
 * any size. Streams through Jackson's {@link JsonGenerator}; holds nothing.
 */
public final class JsonReportWriter {
    private static final JsonFactory FACTORY = JsonFactory.builder().build();
    private static final int TIMING_DECIMALS = 3;

    private JsonReportWriter() {
    }

    /** The report as indented JSON text ending with a newline. */
    public static String toJson(Computation report) {
        return toJson(report, List.of());
    }

    /** The report with its representative cycles ({@code "cycles"}, when any are given) as indented JSON. */
    public static String toJson(Computation report, List<Cycle> cycles) {
        return TextOutput.render(w -> write(report, cycles, w));
    }

    /** Writes the report as indented JSON and a final newline to {@code out}; does not close it. */
    public static void write(Computation report, Writer out) throws IOException {
        write(report, List.of(), out);
    }

    /** Writes the report and its representative cycles as indented JSON and a final newline; does not close {@code out}. */
    public static void write(Computation report, List<Cycle> cycles, Writer out) throws IOException {
        try (JsonGenerator json = FACTORY.createGenerator(out)) {
            json.disable(JsonGenerator.Feature.AUTO_CLOSE_TARGET);
            json.setPrettyPrinter(prettyPrinter());
            writeObject(report, json, extra -> {
                if (!cycles.isEmpty()) {
                    CycleJson.write(extra, cycles);
                }
            });
        }
        out.write('\n');
        out.flush();
    }

    /** Writes the report's object to {@code json}, with {@code extra} fields last, in the generator's layout. */
    static void writeObject(Computation report, JsonGenerator json, JsonStyle.Body extra) throws IOException {
        json.writeStartObject();
        json.writeStringField("input", report.source());
        json.writeStringField("format", report.format().name().toLowerCase(java.util.Locale.ROOT));
        json.writeStringField("complex", report.complexKind().reportName());
        json.writeStringField("engine", report.engineName());
        JsonStyle.intArray(json, "cells", report.cells());
        json.writeStringField("matching", report.matchingName());
        JsonStyle.intArray(json, "critical", report.critical());
        json.writeStringField("coefficients", report.coefficients().toString());
        json.writeBooleanField("reduced", report.reduced());
        writeHomology(json, report.homology().groups());
        json.writeNumberField("morse_lower_bound", report.morseLowerBound());
        json.writeStringField("morse_lower_bound_over", report.coefficients().toString());
        json.writeNumberField("excess", report.excess());
        writeRounds(json, report.rounds());
        if (!report.trials().isEmpty()) {
            writeTrials(json, report.trials());
        }
        writeCwCheck(json, report.cwCheck());
        writeEngine(json, report);
        if (report.format() == InputFormat.POSET) {
            writePosetReduction(json, report.posetReduction());
        }
        if (report.image().isPresent()) {
            writeImage(json, report.image().get());
        }
        writeTimings(json, report.timings());
        extra.write(json);
        json.writeEndObject();
    }

    private static DefaultPrettyPrinter prettyPrinter() {
        return JsonStyle.prettyPrinter();
    }

    static void writeHomology(JsonGenerator json, List<HomologyGroup> groups) throws IOException {
        json.writeArrayFieldStart("homology");
        for (HomologyGroup group : groups) {
            json.writeStartObject();
            json.writeNumberField("dimension", group.dimension());
            json.writeNumberField("betti", group.betti());
            json.writeArrayFieldStart("torsion");
            for (BigInteger factor : group.torsion()) {
                json.writeNumber(factor);
            }
            json.writeEndArray();
            json.writeEndObject();
        }
        json.writeEndArray();
    }

    private static void writeRounds(JsonGenerator json, List<ReductionRound> rounds) throws IOException {
        json.writeArrayFieldStart("rounds");
        for (ReductionRound round : rounds) {
            json.writeStartObject();
            json.writeNumberField("round", round.round());
            json.writeNumberField("pairs_removed", round.pairsRemoved());
            JsonStyle.intArray(json, "cells", java.util.Arrays.stream(round.cellCounts()).boxed().toList());
            json.writeEndObject();
        }
        json.writeEndArray();
    }

    static void writeTrials(JsonGenerator json, List<TrialCount> trials) throws IOException {
        json.writeArrayFieldStart("trials");
        for (TrialCount trial : trials) {
            json.writeStartObject();
            JsonStyle.intArray(json, "critical", trial.critical());
            json.writeNumberField("count", trial.count());
            json.writeEndObject();
        }
        json.writeEndArray();
    }

    /** {@code cw_check}: the verdict, with its reason when it gave one, or null when no check was made. */
    static void writeCwCheck(JsonGenerator json, Optional<CwPosetVerdict> check) throws IOException {
        JsonStyle.optionalObject(json, "cw_check", check, (j, verdict) -> {
            j.writeBooleanField("cw_poset", verdict.isCwPoset());
            if (!verdict.reason().isEmpty()) {
                j.writeStringField("reason", verdict.reason());
            }
        });
    }

    private static void writeEngine(JsonGenerator json, Computation report) throws IOException {
        if (!report.reason().isEmpty()) {
            json.writeStringField("engine_reason", report.reason());
        }
        if (report.implicitRun().isPresent()) {
            ImplicitHomology.Outcome run = report.implicitRun().get();
            json.writeObjectFieldStart("implicit");
            json.writeStringField("element_order", run.order().optionName());
            json.writeNumberField("chains_walked", run.search().nodes());
            json.writeNumberField("maximal_chains_reached", run.search().facets());
            json.writeNumberField("subtrees_skipped", run.search().skippedSubtrees());
            json.writeNumberField("defective_fibres", run.search().defectiveFacets());
            json.writeEndObject();
        }
    }

    private static void writePosetReduction(JsonGenerator json, Optional<ReductionStats> stats) throws IOException {
        JsonStyle.optionalObject(json, "poset_reduction", stats, (j, s) -> {
            j.writeNumberField("beat_points_removed", s.beatPointsRemoved());
            j.writeNumberField("acyclic_links_removed", s.acyclicLinksRemoved());
            j.writeNumberField("links_skipped", s.linksSkipped());
            j.writeNumberField("elements_before", s.elementsBefore());
            j.writeNumberField("elements_after", s.elementsAfter());
            j.writeFieldName("ms");
            j.writeNumber(BigDecimal.valueOf(s.milliseconds()).setScale(TIMING_DECIMALS, RoundingMode.HALF_UP));
        });
    }

    private static void writeImage(JsonGenerator json, ImageFacts image) throws IOException {
        json.writeObjectFieldStart("image");
        JsonStyle.intArray(json, "size", image.size());
        json.writeNumberField("slices", image.slices());
        json.writeNumberField("foreground", image.foreground());
        json.writeNumberField("threshold", image.threshold());
        json.writeBooleanField("inverted", image.inverted());
        json.writeNumberField("components", image.components());
        json.writeNumberField("tunnels", image.tunnels());
        json.writeNumberField("cavities", image.cavities());
        json.writeEndObject();
    }

    private static void writeTimings(JsonGenerator json, List<PhaseTiming> timings) throws IOException {
        json.writeObjectFieldStart("timings_ms");
        for (PhaseTiming timing : timings) {
            JsonStyle.millis(json, timing.phase(), timing.milliseconds());
        }
        json.writeEndObject();
    }
}
