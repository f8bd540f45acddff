package dev.morse.generate;

import dev.morse.poset.ChainCounts;
import dev.morse.complex.FaceCounts;

import dev.morse.complex.Facets;
import dev.morse.io.PosetWriter;
import dev.morse.io.SimplicialWriter;
import dev.morse.poset.Poset;
import java.io.IOException;
import java.io.OutputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * Writes the reference corpus: one input file per case and the manifest
 * ({@value CorpusManifest#FILE_NAME}). Run as {@code CorpusWriter DIRECTORY}; the output is
 * deterministic, so the committed corpus can be compared with a fresh run.
 */
public final class CorpusWriter {
    /** Cases with more cells than this are marked heavy in the manifest. */
    public static final long HEAVY_CELLS = 100_000;

    private CorpusWriter() {
    }

    /** Writes every corpus file into the directory {@code args[0]}, creating it if needed. */
    public static void main(String[] args) throws IOException {
        if (args.length != 1) {
            System.err.println("usage: CorpusWriter DIRECTORY");
            System.exit(2);
        }
        List<CorpusCase> cases = writeAll(Path.of(args[0]));
        for (CorpusCase c : cases) {
            System.out.println(c.file() + "\t" + c.totalCells() + " cells\t" + Expected.summary(c.expected()));
        }
    }

    /** Writes every case file and the manifest into {@code directory}; returns the manifest's cases. */
    public static List<CorpusCase> writeAll(Path directory) throws IOException {
        Files.createDirectories(directory);
        List<CorpusCase> cases = new ArrayList<>();
        List<Map<String, Long>> sizes = new ArrayList<>();
        for (CorpusEntry entry : CorpusCatalog.entries()) {
            Map<String, Long> size = new LinkedHashMap<>();
            long[] cells;
            String body;
            if (entry.isPoset()) {
                Poset p = entry.poset().get();
                size.put("elements", (long) p.size());
                size.put("covers", (long) p.coverCount());
                cells = ChainCounts.perDimension(p);
                body = PosetWriter.toText(p);
            } else {
                Facets f = entry.facets().get();
                size.put("vertices", (long) f.vertexCount());
                size.put("facets", (long) f.faceCount());
                cells = FaceCounts.ofSimplicial(f);
                body = SimplicialWriter.toText(f);
            }
            if (cells.length != entry.expected().size()) {
                throw new IllegalStateException(entry.name() + ": the complex has dimension " + (cells.length - 1)
                        + " but " + entry.expected().size() + " groups are expected");
            }
            List<Long> cellList = new ArrayList<>();
            long total = 0;
            for (long c : cells) {
                cellList.add(c);
                total = Math.addExact(total, c);
            }
            CorpusCase c = new CorpusCase(entry.name(), entry.fileName(), entry.isPoset() ? CorpusCase.POSET
                    : CorpusCase.SIMPLICIAL, entry.expected(), entry.cwPoset(), entry.description(), entry.source(),
                    total > HEAVY_CELLS, cellList);
            Files.writeString(c.path(directory), withComments(body, c), StandardCharsets.UTF_8);
            cases.add(c);
            sizes.add(size);
        }
        try (OutputStream out = Files.newOutputStream(directory.resolve(CorpusManifest.FILE_NAME))) {
            CorpusManifest.write(cases, sizes, out);
        }
        return List.copyOf(cases);
    }

    /** Puts comment lines saying what the case is right after the header line. */
    private static String withComments(String body, CorpusCase c) {
        int headerEnd = body.indexOf('\n') + 1;
        String comments = "# " + c.name() + ": " + c.description() + "\n"
                + "# expected homology: " + Expected.summary(c.expected()) + "\n"
                + "# source: " + c.source() + "\n";
        return body.substring(0, headerEnd) + comments + body.substring(headerEnd);
    }
}
