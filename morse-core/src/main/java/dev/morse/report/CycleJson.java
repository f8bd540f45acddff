package dev.morse.report;

import com.fasterxml.jackson.core.JsonGenerator;
import dev.morse.cycles.Cycle;
import java.io.IOException;
import java.util.List;

/**
 * The {@code "cycles"} field of a homology report, in the contract of the design: per cycle its
 * {@code dimension}, {@code order} (0 when free) and {@code terms}, each a {@code coefficient} and
 * the {@code cell} in the input's labels (a list of labels, or of {@code [low, high]} pairs for a cube),
 * and {@code terms_before_shortening}, the number of terms the cycle had when first lifted.
 */
final class CycleJson {
    private CycleJson() {
    }

    static void write(JsonGenerator json, List<Cycle> cycles) throws IOException {
        json.writeArrayFieldStart("cycles");
        for (Cycle c : cycles) {
            json.writeStartObject();
            json.writeNumberField("dimension", c.dimension());
            json.writeNumberField("order", c.order());
            json.writeArrayFieldStart("terms");
            for (Cycle.Term t : c.terms()) {
                json.writeStartObject();
                json.writeNumberField("coefficient", t.coefficient());
                json.writeFieldName("cell");
                writeLabel(json, t.label());
                json.writeEndObject();
            }
            json.writeEndArray();
            json.writeNumberField("terms_before_shortening", c.liftedTerms());
            json.writeEndObject();
        }
        json.writeEndArray();
    }

    private static void writeLabel(JsonGenerator json, List<?> label) throws IOException {
        json.writeStartArray();
        for (Object part : label) {
            if (part instanceof List<?> inner) {
                writeLabel(json, inner);
            } else if (part instanceof Integer n) {
                json.writeNumber(n);
            } else {
                json.writeString(part.toString());
            }
        }
        json.writeEndArray();
    }
}
