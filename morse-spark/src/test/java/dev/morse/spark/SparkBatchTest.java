package dev.morse.spark;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.morse.batch.BatchItem;
import dev.morse.batch.BatchOptions;
import dev.morse.batch.BatchRun;
import dev.morse.engine.Request;
import dev.morse.input.ReadOptions;
import dev.morse.report.BatchJsonWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.apache.spark.api.java.JavaSparkContext;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** A batch on Spark (local mode, two task slots) against the batch on one machine, bad inputs included. */
class SparkBatchTest {
    private static JavaSparkContext spark;

    @BeforeAll
    static void start() {
        spark = SparkContexts.start("local[2]");
    }

    @AfterAll
    static void stop() {
        spark.close();
    }

    private static List<String> lines(List<BatchItem> items, Request request, boolean cohenMacaulay, boolean onSpark) {
        List<String> out = new ArrayList<>();
        if (onSpark) {
            SparkBatch.run(spark, items, request, ReadOptions.DEFAULT_GRAPH_COMPLEX, cohenMacaulay,
                    line -> out.add(SparkFixtures.withoutTimings(line)));
        } else {
            BatchOptions options = new BatchOptions(request, ReadOptions.defaults(), 1, cohenMacaulay);
            BatchRun.run(items, options, o -> BatchJsonWriter.toJsonLine(o, cohenMacaulay), line -> out.add(SparkFixtures.withoutTimings(line)));
        }
        return out;
    }

    @Test
    void theCorpusGivesTheLinesOfTheBatchOnOneMachine() {
        List<BatchItem> items = BatchRun.items(List.of(SparkFixtures.corpus()));
        Request request = Request.defaults();
        List<String> there = lines(items, request, false, true);
        assertEquals(lines(items, request, false, false), there);
        // the manifest is not an input: one error line, and the batch went on past it
        assertEquals(items.size(), there.size());
    }

    @Test
    void aBadInputIsItsOwnLineAndTheBatchGoesOn(@TempDir Path dir) throws Exception {
        Path cycle = dir.resolve("cycle.poset");
        Files.writeString(cycle, "morse-poset 1\na: b\nb: a\n", StandardCharsets.UTF_8);
        Path loop = SparkFixtures.corpus().resolve("loop.poset");
        List<BatchItem> items = List.of(new BatchItem(0, loop.toString()), new BatchItem(1, cycle.toString()),
                new BatchItem(2, dir.resolve("missing.poset").toString()), new BatchItem(3, loop.toString()));
        List<String> there = new ArrayList<>();
        int failed = SparkBatch.run(spark, items, Request.defaults(), ReadOptions.DEFAULT_GRAPH_COMPLEX, false, there::add);
        assertEquals(2, failed);
        assertEquals(4, there.size());
        // the reader's message for a cycle names its elements in order (shared/DESIGN.md, errors)
        assertEquals("{\"input\":\"" + cycle + "\",\"error\":\"" + cycle
                + ":3: the relations contain a cycle of 2 elements: b < a < b\"}\n", there.get(1));
        assertEquals(lines(items, Request.defaults(), false, false),
                there.stream().map(SparkFixtures::withoutTimings).toList());
        assertTrue(there.get(0).startsWith("{\"input\":\"" + loop + "\",\"format\":\"poset\""), there.get(0));
    }
}
