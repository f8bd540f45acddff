package dev.morse.report;

import com.fasterxml.jackson.core.JsonFactory;
import com.fasterxml.jackson.core.JsonParser;
import com.fasterxml.jackson.core.JsonToken;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * Reads JSON text into plain Java values for assertions: objects become ordered maps, arrays lists,
 * integers BigInteger, other numbers BigDecimal. Rejects trailing content.
 */
public final class JsonValues {
    private static final JsonFactory FACTORY = new JsonFactory();

    private JsonValues() {
    }

    /** The single JSON value in {@code text}. */
    public static Object parse(String text) {
        try (JsonParser parser = FACTORY.createParser(text)) {
            Object value = read(parser, parser.nextToken());
            if (parser.nextToken() != null) {
                throw new IllegalArgumentException("more than one JSON value");
            }
            return value;
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    private static Object read(JsonParser parser, JsonToken token) throws IOException {
        return switch (token) {
            case START_OBJECT -> {
                Map<String, Object> object = new LinkedHashMap<>();
                for (JsonToken t = parser.nextToken(); t != JsonToken.END_OBJECT; t = parser.nextToken()) {
                    String name = parser.currentName();
                    object.put(name, read(parser, parser.nextToken()));
                }
                yield object;
            }
            case START_ARRAY -> {
                List<Object> array = new ArrayList<>();
                for (JsonToken t = parser.nextToken(); t != JsonToken.END_ARRAY; t = parser.nextToken()) {
                    array.add(read(parser, t));
                }
                yield array;
            }
            case VALUE_STRING -> parser.getText();
            case VALUE_NUMBER_INT -> parser.getBigIntegerValue();
            case VALUE_NUMBER_FLOAT -> parser.getDecimalValue();
            case VALUE_TRUE -> Boolean.TRUE;
            case VALUE_FALSE -> Boolean.FALSE;
            case VALUE_NULL -> null;
            default -> throw new IllegalArgumentException("unexpected " + token);
        };
    }
}
