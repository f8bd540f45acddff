package dev.morse.spark;

import java.nio.file.Path;

/** What the module's tests share: where the corpus is, and JSON without its timings. */
public final class SparkFixtures {
    private SparkFixtures() {
    }

    /** The corpus directory, as the build passes it in {@code morse.corpus}. */
    public static Path corpus() {
        return Path.of(System.getProperty("morse.corpus", "../corpus"));
    }

    /** JSON text without its timings, which differ from run to run. */
    public static String withoutTimings(String json) {
        return json.replaceAll("\"timings_ms\":\\{[^}]*\\},?", "").replaceAll("\"ms\":[0-9.]+,?", "")
                .replace(",}", "}");
    }
}
