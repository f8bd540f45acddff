package dev.morse.report;

import com.fasterxml.jackson.core.JsonGenerator;
import dev.morse.inspect.PosetSummary;
import dev.morse.inspect.ChainComplexSummary;
import dev.morse.inspect.ImageSummary;
import dev.morse.inspect.Inspections;
import dev.morse.inspect.SimplicialSummary;
import dev.morse.input.Input;
import java.io.IOException;

/**
 * Writes an inspection as one JSON object. For a poset: {@code input}, {@code format}
 * ({@code "poset"}), {@code elements}, {@code covers}, {@code minimal}, {@code maximal},
 * {@code rank_sizes} (elements per height), {@code graded}, {@code thin} ({@code {"thin": bool}} with
 * a {@code reason} when not), {@code cw_check} ({@code {"cw_poset": bool}} with a {@code reason}
 * when not), {@code chains} (chains per dimension of the order complex, exact integers, or
 * {@code null} with {@code chains_skipped} saying why), {@code euler_characteristic},
 * {@code reduced_euler_characteristic} and {@code mobius} (μ(0̂, 1̂) with bounds adjoined). For a
 * simplicial complex: {@code input}, {@code format} ({@code "simplicial"}), {@code vertices},
 * {@code listed_faces}, {@code dimension}, {@code f_vector}, {@code facets} (per dimension),
 * {@code pure} and {@code euler_characteristic}.
 */
public final class InspectionJsonWriter {
    private InspectionJsonWriter() {
    }

    /** The summary of poset file {@code input} as indented JSON ending with a newline. */
    public static String toJson(String input, PosetSummary s) {
        return JsonStyle.inputObject(input, "poset", json -> {
            json.writeNumberField("elements", s.elements());
            json.writeNumberField("covers", s.covers());
            json.writeNumberField("minimal", s.minimal());
            json.writeNumberField("maximal", s.maximal());
            JsonStyle.intArray(json, "rank_sizes", s.rankSizes());
            json.writeBooleanField("graded", s.graded());
            verdict(json, "thin", "thin", s.thin(), s.thinFailure());
            verdict(json, "cw_check", "cw_poset", s.cwCheck().isCwPoset(), s.cwCheck().reason());
            if (s.chainsCounted()) {
                JsonStyle.intArray(json, "chains", s.chains());
                json.writeFieldName("euler_characteristic");
                json.writeNumber(s.eulerCharacteristic());
                json.writeFieldName("reduced_euler_characteristic");
                json.writeNumber(s.reducedEulerCharacteristic());
                json.writeFieldName("mobius");
                json.writeNumber(s.mobius());
            } else {
                json.writeNullField("chains");
                json.writeStringField("chains_skipped", s.chainsSkipped());
            }
        });
    }

    /** The summary of simplicial file {@code input} as indented JSON ending with a newline. */
    public static String toJson(String input, SimplicialSummary s) {
        return JsonStyle.inputObject(input, "simplicial", json -> {
            json.writeNumberField("vertices", s.vertices());
            json.writeNumberField("listed_faces", s.listedFaces());
            json.writeNumberField("dimension", s.dimension());
            JsonStyle.intArray(json, "f_vector", s.faces());
            JsonStyle.intArray(json, "facets", s.facets());
            json.writeBooleanField("pure", s.pure());
            json.writeNumberField("euler_characteristic", s.eulerCharacteristic());
        });
    }

    /** The summary of image or volume {@code input} as indented JSON ending with a newline. */
    public static String toJson(String input, ImageSummary s) {
        return JsonStyle.inputObject(input, s.isVolume() ? "volume" : "image", json -> {
            JsonStyle.intArray(json, "size", s.size());
            json.writeNumberField("slices", s.slices());
            json.writeNumberField("foreground", s.foreground());
            json.writeNumberField("threshold", s.threshold());
            json.writeBooleanField("inverted", s.inverted());
            JsonStyle.intArray(json, "cells", s.cells());
            json.writeNumberField("euler_characteristic", s.eulerCharacteristic());
        });
    }

    /** The summary of any input as indented JSON ending with a newline. */
    public static String toJson(Input input) {
        return Inspections.show(input, InspectionJsonWriter::toJson, InspectionJsonWriter::toJson,
                InspectionJsonWriter::toJson, InspectionJsonWriter::toJson);
    }

    /** The summary of a chain complex given by its boundary matrices as indented JSON ending with a newline. */
    public static String toJson(String input, ChainComplexSummary s) {
        return JsonStyle.toText(json -> {
            json.writeStartObject();
            json.writeStringField("input", input);
            json.writeStringField("format", "matrices");
            JsonStyle.intArray(json, "cells", s.cells());
            JsonStyle.intArray(json, "entries", s.entries());
            json.writeBooleanField("unit_entries", s.unitEntries());
            json.writeNumberField("euler_characteristic", s.eulerCharacteristic());
            json.writeEndObject();
        });
    }

    private static void verdict(JsonGenerator json, String field, String flag, boolean holds, String reason)
            throws IOException {
        json.writeObjectFieldStart(field);
        json.writeBooleanField(flag, holds);
        if (!holds) {
            json.writeStringField("reason", reason);
        }
        json.writeEndObject();
    }
}
