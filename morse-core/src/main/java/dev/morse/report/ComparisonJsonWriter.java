package dev.morse.report;

import dev.morse.engine.ComparisonReport;
import dev.morse.engine.MatchingRun;
import dev.morse.matching.OptimalMatching;
import dev.morse.engine.PhaseTiming;
import dev.morse.engine.TrialSpectrum;

import com.fasterxml.jackson.core.JsonGenerator;
import java.io.IOException;
import java.util.Locale;

/**
 * Writes a {@link ComparisonReport} as one JSON object: {@code input}, {@code format},
 * {@code complex}, {@code cells}, {@code cw_check} (as in homology reports), {@code coefficients}
 * (those asked for), {@code reduced}, {@code homology}, {@code reference_matching} (whose run gave it),
 * {@code optimum} (when sought: the best matching's {@code critical} and {@code total}, whether it is
 * {@code proven} optimal, the {@code lower_bound} proven, {@code ms}),
 * {@code morse_lower_bound}, {@code lower_bound_by_dimension}, {@code seed}, {@code timings_ms}
 * ({@code read}, {@code complex}) and {@code matchings}: one object per heuristic with
 * {@code matching}, {@code critical}, {@code total}, {@code excess}, {@code gap} (beyond the optimum, when
 * sought), {@code timings_ms},
 * {@code peak_heap_bytes} (approximate; -1 when unknown) and, for randomized heuristics run several
 * times, {@code trials} (each critical vector with its {@code count}) and {@code trial_spectrum}: the
 * number of {@code trials}, {@code min_total}, {@code median_total} (the lower median) and
 * {@code max_total} of their critical cells, how many were {@code at_morse_lower_bound}, and when the
 * optimum was sought, {@code optimum_total}, how many trials were {@code at_optimum}, and
 * {@code min_gap}, {@code median_gap}, {@code max_gap} beyond it.
 */
public final class ComparisonJsonWriter {
    private ComparisonJsonWriter() {
    }

    /** The report as indented JSON text ending with a newline. */
    public static String toJson(ComparisonReport report) {
        return JsonStyle.inputObject(report.input(), report.format().name().toLowerCase(Locale.ROOT), json -> {
            json.writeStringField("complex", report.complex().reportName());
            JsonStyle.intArray(json, "cells", report.cells());
            JsonReportWriter.writeCwCheck(json, report.cwCheck());
            json.writeStringField("coefficients", report.homology().coefficients().toString());
            json.writeBooleanField("reduced", report.reducedShown());
            JsonReportWriter.writeHomology(json, report.shownHomology().groups());
            json.writeStringField("reference_matching", report.referenceMatching());
            if (report.optimum().isPresent()) {
                writeOptimum(json, report.optimum().get());
            }
            json.writeNumberField("morse_lower_bound", report.morseLowerBound());
            json.writeStringField("morse_lower_bound_over", report.homology().coefficients().toString());
            JsonStyle.intArray(json, "lower_bound_by_dimension", report.boundByDimension());
            json.writeNumberField("seed", report.seed());
            json.writeObjectFieldStart("timings_ms");
            for (PhaseTiming t : report.setup()) {
                JsonStyle.millis(json, t.phase(), t.milliseconds());
            }
            json.writeEndObject();
            json.writeArrayFieldStart("matchings");
            for (MatchingRun run : report.runs()) {
                writeRun(json, report, run);
            }
            json.writeEndArray();
        });
    }

    private static void writeOptimum(JsonGenerator json, OptimalMatching o) throws IOException {
        json.writeObjectFieldStart("optimum");
        JsonStyle.intArray(json, "critical", java.util.Arrays.stream(o.critical()).boxed().toList());
        json.writeNumberField("total", o.criticalTotal());
        json.writeBooleanField("proven", o.proven());
        json.writeNumberField("lower_bound", o.lowerBound());
        json.writeNumberField("ms", o.elapsed().toMillis());
        json.writeEndObject();
    }

    private static void writeSpectrum(JsonGenerator json, TrialSpectrum s) throws IOException {
        json.writeObjectFieldStart("trial_spectrum");
        json.writeNumberField("trials", s.trials());
        json.writeNumberField("min_total", s.minTotal());
        json.writeNumberField("median_total", s.medianTotal());
        json.writeNumberField("max_total", s.maxTotal());
        json.writeNumberField("at_morse_lower_bound", s.atBound());
        if (s.optimum().isPresent()) {
            long o = s.optimum().get();
            json.writeNumberField("optimum_total", o);
            json.writeNumberField("at_optimum", s.atOptimum());
            json.writeNumberField("min_gap", s.minTotal() - o);
            json.writeNumberField("median_gap", s.medianTotal() - o);
            json.writeNumberField("max_gap", s.maxTotal() - o);
        }
        json.writeEndObject();
    }

    private static void writeRun(JsonGenerator json, ComparisonReport report, MatchingRun run) throws IOException {
        json.writeStartObject();
        json.writeStringField("matching", run.matching());
        JsonStyle.intArray(json, "critical", run.critical());
        json.writeNumberField("total", run.totalCritical());
        json.writeNumberField("excess", report.excess(run));
        if (report.gap(run).isPresent()) {
            json.writeNumberField("gap", report.gap(run).get());
        }
        json.writeObjectFieldStart("timings_ms");
        for (PhaseTiming t : run.timings()) {
            JsonStyle.millis(json, t.phase(), t.milliseconds());
        }
        json.writeEndObject();
        json.writeNumberField("peak_heap_bytes", run.peakHeapBytes());
        if (!run.trials().isEmpty()) {
            JsonReportWriter.writeTrials(json, run.trials());
        }
        if (report.spectrum(run).isPresent()) {
            writeSpectrum(json, report.spectrum(run).get());
        }
        json.writeEndObject();
    }
}
