package dev.morse.spark;

import org.apache.spark.SparkConf;
import org.apache.spark.api.java.JavaSparkContext;

/**
 * Starts the Spark context of a run: quiet (no web UI, no progress bar: standard output carries the
 * JSON), with the master given, else the one {@code spark-submit} set, else every core of this machine.
 */
public final class SparkContexts {
    /** The master when none is given: local mode on every core. */
    public static final String DEFAULT_MASTER = "local[*]";

    private SparkContexts() {
    }

    /**
     * A new context.
     *
     * @param master a Spark master URL, or {@code null} for the one {@code spark-submit} set or {@link #DEFAULT_MASTER}
     */
    public static JavaSparkContext start(String master) {
        SparkConf conf = new SparkConf().setAppName("morse")
                .set("spark.ui.enabled", "false")
                .set("spark.ui.showConsoleProgress", "false");
        if (master != null) {
            conf.setMaster(master);
        } else if (!conf.contains("spark.master")) {
            conf.setMaster(DEFAULT_MASTER);
        }
        JavaSparkContext spark = new JavaSparkContext(conf);
        spark.setLogLevel("WARN");
        return spark;
    }
}
