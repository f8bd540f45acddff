package dev.morse.generate;

import com.fasterxml.jackson.core.JsonEncoding;
import com.fasterxml.jackson.core.JsonFactory;
import com.fasterxml.jackson.core.JsonGenerator;
import com.fasterxml.jackson.core.JsonParser;
import com.fasterxml.jackson.core.JsonToken;
import com.fasterxml.jackson.core.util.DefaultIndenter;
import com.fasterxml.jackson.core.util.DefaultPrettyPrinter;
import dev.morse.homology.HomologyGroup;
import java.io.IOException;
import java.io.InputStream;
import java.io.OutputStream;
import java.math.BigInteger;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;

/**
 * The corpus manifest {@value #FILE_NAME}: a JSON object {@code {"cases": [...]}}, one object per
 * case with the fields of {@link CorpusCase} ({@code expected} in the shape of the homology report:
 * {@code {"dimension": d, "betti": b, "torsion": [...]}}), plus {@code size} and {@code summary}
 * for human readers. Unknown fields are skipped when reading.
 */
public final class CorpusManifest {
    /** The manifest's file name inside the corpus directory. */
    public static final String FILE_NAME = "manifest.json";

    private static final JsonFactory JSON = new JsonFactory();

    private CorpusManifest() {
    }

    /** Reads {@value #FILE_NAME} in {@code corpusDirectory}. */
    public static List<CorpusCase> readDirectory(Path corpusDirectory) throws IOException {
        return read(corpusDirectory.resolve(FILE_NAME));
    }

    /** Reads a manifest file. */
    public static List<CorpusCase> read(Path manifest) throws IOException {
        try (InputStream in = Files.newInputStream(manifest); JsonParser p = JSON.createParser(in)) {
            List<CorpusCase> cases = new ArrayList<>();
            expect(p, p.nextToken(), JsonToken.START_OBJECT);
            while (p.nextToken() == JsonToken.FIELD_NAME) {
                String field = p.currentName();
                JsonToken value = p.nextToken();
                if (field.equals("cases")) {
                    expect(p, value, JsonToken.START_ARRAY);
                    while (p.nextToken() == JsonToken.START_OBJECT) {
                        cases.add(readCase(p));
                    }
                } else {
                    p.skipChildren();
                }
            }
            return List.copyOf(cases);
        }
    }

    private static CorpusCase readCase(JsonParser p) throws IOException {
        String name = null;
        String file = null;
        String format = null;
        String description = "";
        String source = "";
        boolean cwPoset = false;
        boolean heavy = false;
        List<HomologyGroup> expected = null;
        List<Long> cells = new ArrayList<>();
        while (p.nextToken() == JsonToken.FIELD_NAME) {
            String field = p.currentName();
            JsonToken value = p.nextToken();
            switch (field) {
                case "name" -> name = p.getValueAsString();
                case "file" -> file = p.getValueAsString();
                case "format" -> format = p.getValueAsString();
                case "description" -> description = p.getValueAsString();
                case "source" -> source = p.getValueAsString();
                case "cwPoset" -> cwPoset = p.getValueAsBoolean();
                case "heavy" -> heavy = p.getValueAsBoolean();
                case "expected" -> expected = readGroups(p, value);
                case "cells" -> {
                    expect(p, value, JsonToken.START_ARRAY);
                    while (p.nextToken() != JsonToken.END_ARRAY) {
                        cells.add(p.getLongValue());
                    }
                }
                default -> p.skipChildren();
            }
        }
        if (name == null || file == null || format == null || expected == null) {
            throw new IOException("a manifest case lacks one of name, file, format, expected (case " + name + ")");
        }
        return new CorpusCase(name, file, format, expected, cwPoset, description, source, heavy, cells);
    }

    private static List<HomologyGroup> readGroups(JsonParser p, JsonToken value) throws IOException {
        expect(p, value, JsonToken.START_ARRAY);
        List<HomologyGroup> groups = new ArrayList<>();
        while (p.nextToken() == JsonToken.START_OBJECT) {
            int dimension = -1;
            int betti = -1;
            List<BigInteger> torsion = new ArrayList<>();
            while (p.nextToken() == JsonToken.FIELD_NAME) {
                String field = p.currentName();
                JsonToken v = p.nextToken();
                switch (field) {
                    case "dimension" -> dimension = p.getIntValue();
                    case "betti" -> betti = p.getIntValue();
                    case "torsion" -> {
                        expect(p, v, JsonToken.START_ARRAY);
                        while (p.nextToken() != JsonToken.END_ARRAY) {
                            torsion.add(p.getBigIntegerValue());
                        }
                    }
                    default -> p.skipChildren();
                }
            }
            if (dimension < 0 || betti < 0) {
                throw new IOException("a homology group lacks its dimension or Betti number");
            }
            groups.add(new HomologyGroup(dimension, betti, torsion));
        }
        return groups;
    }

    private static void expect(JsonParser p, JsonToken found, JsonToken wanted) throws IOException {
        if (found != wanted) {
            throw new IOException("manifest: expected " + wanted + " but found " + found + " at " + p.currentLocation());
        }
    }

    /**
     * Writes a manifest. {@code sizes} holds, per case, the size fields for human readers (like
     * {@code elements} and {@code covers}). Output is deterministic: fixed field order, two-space
     * indentation, {@code \n} line ends, arrays on one line.
     */
    static void write(List<CorpusCase> cases, List<Map<String, Long>> sizes, OutputStream out) throws IOException {
        DefaultPrettyPrinter printer = new DefaultPrettyPrinter()
                .withObjectIndenter(new DefaultIndenter("  ", "\n"));
        try (JsonGenerator g = JSON.createGenerator(out, JsonEncoding.UTF8)) {
            g.setPrettyPrinter(printer);
            g.writeStartObject();
            g.writeFieldName("cases");
            g.writeStartArray();
            for (int i = 0; i < cases.size(); i++) {
                writeCase(g, cases.get(i), sizes.get(i));
            }
            g.writeEndArray();
            g.writeEndObject();
            g.writeRaw('\n');
        }
    }

    private static void writeCase(JsonGenerator g, CorpusCase c, Map<String, Long> size) throws IOException {
        g.writeStartObject();
        g.writeStringField("name", c.name());
        g.writeStringField("file", c.file());
        g.writeStringField("format", c.format());
        g.writeStringField("description", c.description());
        g.writeStringField("summary", Expected.summary(c.expected()));
        g.writeStringField("source", c.source());
        if (c.isPoset()) {
            g.writeBooleanField("cwPoset", c.cwPoset());
        }
        g.writeBooleanField("heavy", c.heavy());
        g.writeFieldName("size");
        g.writeStartObject();
        for (Map.Entry<String, Long> field : size.entrySet()) {
            g.writeNumberField(field.getKey(), field.getValue());
        }
        g.writeEndObject();
        g.writeFieldName("cells");
        g.writeStartArray();
        for (long n : c.cells()) {
            g.writeNumber(n);
        }
        g.writeEndArray();
        g.writeFieldName("expected");
        g.writeStartArray();
        for (HomologyGroup h : c.expected()) {
            g.writeStartObject();
            g.writeNumberField("dimension", h.dimension());
            g.writeNumberField("betti", h.betti());
            g.writeFieldName("torsion");
            g.writeStartArray();
            for (BigInteger t : h.torsion()) {
                g.writeNumber(t);
            }
            g.writeEndArray();
            g.writeEndObject();
        }
        g.writeEndArray();
        g.writeEndObject();
    }
}
