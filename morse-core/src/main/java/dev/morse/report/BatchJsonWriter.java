package dev.morse.report;

import com.fasterxml.jackson.core.JsonFactory;
import com.fasterxml.jackson.core.JsonGenerator;
import dev.morse.batch.BatchOutcome;
import dev.morse.io.TextOutput;

/**
 * Writes one outcome of a batch as one compact JSON line: for a computed input the object
 * {@link JsonReportWriter} writes, with {@code "cohen_macaulay"} (true, false, or null for an image)
 * last when the verdict was asked for; for a failed input {@code {"input": ..., "error": ...}}.
 */
public final class BatchJsonWriter {
    private static final JsonFactory FACTORY = JsonFactory.builder().build();

    private BatchJsonWriter() {
    }

    /** The outcome as one line of JSON, ending with a newline. */
    public static String toJsonLine(BatchOutcome outcome, boolean cohenMacaulay) {
        return TextOutput.render(out -> {
            try (JsonGenerator json = FACTORY.createGenerator(out)) {
                json.disable(JsonGenerator.Feature.AUTO_CLOSE_TARGET);
                if (outcome instanceof BatchOutcome.Done done) {
                    JsonReportWriter.writeObject(done.computation(), json, extra -> {
                        if (cohenMacaulay) {
                            json.writeFieldName("cohen_macaulay");
                            if (done.cohenMacaulay().isPresent()) {
                                json.writeBoolean(done.cohenMacaulay().get());
                            } else {
                                json.writeNull();
                            }
                        }
                    });
                } else {
                    BatchOutcome.Failed failed = (BatchOutcome.Failed) outcome;
                    json.writeStartObject();
                    json.writeStringField("input", failed.item().path());
                    json.writeStringField("error", failed.message());
                    json.writeEndObject();
                }
            }
            out.write('\n');
        });
    }
}
