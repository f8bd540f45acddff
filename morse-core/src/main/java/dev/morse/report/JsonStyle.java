package dev.morse.report;

import dev.morse.homology.Coefficients;
import dev.morse.io.TextOutput;
import com.fasterxml.jackson.core.JsonFactory;
import com.fasterxml.jackson.core.JsonGenerator;
import com.fasterxml.jackson.core.util.DefaultIndenter;
import com.fasterxml.jackson.core.util.DefaultPrettyPrinter;
import com.fasterxml.jackson.core.util.Separators;
import java.io.IOException;
import java.io.Writer;
import java.math.BigDecimal;
import java.math.BigInteger;
import java.math.RoundingMode;
import java.util.List;
import java.util.Optional;

/** The one JSON layout of every writer here: objects a field per line, arrays of numbers on one line. */
final class JsonStyle {
    private static final JsonFactory FACTORY = JsonFactory.builder().build();
    private static final int TIMING_DECIMALS = 3;

    private JsonStyle() {
    }

    /** What a writer puts between the generator's start and end. */
    @FunctionalInterface
    interface Body {
        void write(JsonGenerator json) throws IOException;
    }

    /** Writes the fields of one value inside its object. */
    @FunctionalInterface
    interface Fields<T> {
        void write(JsonGenerator json, T value) throws IOException;
    }

    /** Field {@code name}: null when {@code value} is empty, else an object of its {@code fields}. */
    static <T> void optionalObject(JsonGenerator json, String name, Optional<T> value, Fields<T> fields)
            throws IOException {
        json.writeFieldName(name);
        if (value.isEmpty()) {
            json.writeNull();
            return;
        }
        json.writeStartObject();
        fields.write(json, value.get());
        json.writeEndObject();
    }

    /**
     * Indented JSON text of one object that starts with the {@code input} and its {@code format}
     * and goes on with {@code fields}, ending with a newline.
     */
    static String inputObject(String input, String format, Body fields) {
        return toText(json -> {
            json.writeStartObject();
            json.writeStringField("input", input);
            json.writeStringField("format", format);
            fields.write(json);
            json.writeEndObject();
        });
    }

    /** Indented JSON text from {@code body}, ending with a newline. */
    static String toText(Body body) {
        return TextOutput.render(w -> write(w, body));
    }

    /** Writes {@code body} as indented JSON and a final newline to {@code out}; does not close it. */
    static void write(Writer out, Body body) throws IOException {
        try (JsonGenerator json = FACTORY.createGenerator(out)) {
            json.disable(JsonGenerator.Feature.AUTO_CLOSE_TARGET);
            json.setPrettyPrinter(prettyPrinter());
            body.write(json);
        }
        out.write('\n');
        out.flush();
    }

    static DefaultPrettyPrinter prettyPrinter() {
        Separators separators = Separators.createDefaultInstance()
                .withObjectFieldValueSpacing(Separators.Spacing.AFTER)
                .withArrayEmptySeparator("")
                .withObjectEmptySeparator("");
        DefaultPrettyPrinter printer = new DefaultPrettyPrinter(separators);
        // objects one field per line; arrays stay on one line, where cell counts read best
        printer.indentObjectsWith(new DefaultIndenter("  ", "\n"));
        printer.indentArraysWith(DefaultPrettyPrinter.FixedSpaceIndenter.instance);
        return printer;
    }

    static void intArray(JsonGenerator json, String field, List<? extends Number> values) throws IOException {
        json.writeArrayFieldStart(field);
        for (Number v : values) {
            if (v instanceof BigInteger big) {
                json.writeNumber(big);
            } else {
                json.writeNumber(v.longValue());
            }
        }
        json.writeEndArray();
    }

    /** The ring as text reports name it: {@code Z}, {@code Q} or {@code F_p}. */
    static String ringLabel(Coefficients coefficients) {
        return switch (coefficients.ring()) {
            case INTEGERS -> "Z";
            case RATIONALS -> "Q";
            case PRIME_FIELD -> "F_" + coefficients.prime();
        };
    }

    /**
     * A name shown to people (a phase such as "poset reduction") as a JSON key: lower case, words
     * joined by underscores, as every key of our JSON is.
     */
    static String key(String name) {
        return name.strip().toLowerCase(java.util.Locale.ROOT).replaceAll("[^a-z0-9]+", "_");
    }

    /** Milliseconds with three decimals, under the phase's name as a snake_case key. */
    static void millis(JsonGenerator json, String field, double milliseconds) throws IOException {
        json.writeFieldName(key(field));
        json.writeNumber(BigDecimal.valueOf(milliseconds).setScale(TIMING_DECIMALS, RoundingMode.HALF_UP));
    }
}
