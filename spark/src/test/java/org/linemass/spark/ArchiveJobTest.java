package org.linemass.spark;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.stream.Collectors;
import org.apache.spark.sql.Row;
import org.apache.spark.sql.SparkSession;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The job in local mode on a folder holding the demo drawing twice (once in a sub-folder, which the
 * recursive lookup must find), a drawing the importer refuses and one it reads in part, both from
 * {@code testdata/hostile}, and a file the glob leaves out. Check values: the hostile catalogue's
 * expected messages ({@code testdata/hostile/README.md}) and the demo's closed-form layer lengths
 * ({@code testdata/demo/README.md}).
 */
class ArchiveJobTest {

    /**
     * Lengths agree with the closed forms to far better than this: the engine promises its lengths
     * to about 1e-9 relative, and the README's values are rounded to 1e-7 m (0.0001 mm); 1e-6 m
     * leaves room for that rounding only.
     */
    private static final double LENGTH_TOLERANCE_M = 1e-6;

    private static SparkSession spark;

    @TempDir
    static Path dir;

    private static Path in;

    /** The tables of the one run every test reads (the re-run test runs into the same folder again). */
    private static Path out;

    private static LocalSpark.Run first;

    @BeforeAll
    static void start() throws IOException {
        spark = LocalSpark.start();
        Path repo = LocalSpark.repo();
        in = dir.resolve("archive");
        Files.createDirectories(in.resolve("2025"));
        Files.copy(repo.resolve("testdata/demo/garden-planter.dxf"), in.resolve("garden-planter.dxf"));
        Files.copy(repo.resolve("testdata/demo/garden-planter.dxf"), in.resolve("2025/planter-copy.dxf"));
        Files.copy(repo.resolve("testdata/hostile/group-code-not-number.dxf"), in.resolve("b-bad.dxf"));
        Files.copy(repo.resolve("testdata/hostile/truncated-mid-entity.dxf"), in.resolve("2025/cut-off.dxf"));
        Files.copy(repo.resolve("testdata/demo/README.md"), in.resolve("README.md"));
        out = dir.resolve("tables");
        first = LocalSpark.job(spark, args(out));
    }

    @AfterAll
    static void stop() {
        spark.stop();
    }

    private static String[] args(Path target, String... more) {
        Path demo = LocalSpark.repo().resolve("testdata/demo");
        List<String> a = new java.util.ArrayList<>(List.of(in.toString(), "*.dxf", target.toString(),
                "--section-table", demo.resolve("garden-planter-section-table.csv").toString(),
                "--assign-file", demo.resolve("garden-planter-layers.csv").toString()));
        a.addAll(List.of(more));
        return a.toArray(new String[0]);
    }

    @Test
    void job_archiveWithBadDrawing_failedRowAndEveryTable() {
        LocalSpark.Run run = first;
        assertEquals(0, run.code(), run.err());
        assertTrue(run.out().startsWith("linemass-spark: 4 drawings, 1 failed, 1 incomplete, 2 ok"), run.out());

        Map<String, Row> drawings = spark.read().parquet(out.resolve(Tables.DRAWINGS).toString()).collectAsList()
                .stream().collect(Collectors.toMap(r -> r.<String>getAs("drawing"), r -> r));
        assertEquals(4, drawings.size(), drawings.keySet().toString());
        Row bad = drawings.get(in.resolve("b-bad.dxf").toString());
        assertEquals("failed", bad.getAs("status"));
        // testdata/hostile/README.md: messages start with the path given to the importer
        assertEquals(in.resolve("b-bad.dxf") + ":11: LINE (handle 2B): expected a group code (an integer), got '1O'",
                bad.getAs("message"));
        assertNull(bad.getAs("length_m"));

        Row cut = drawings.get(in.resolve("2025/cut-off.dxf").toString());
        assertEquals("incomplete", cut.getAs("status"));
        assertTrue(cut.<String>getAs("message").contains("skipped"), cut.<String>getAs("message"));
        // testdata/hostile/README.md: the cut-off LINE at line 23 (handle 1F) is skipped with this note,
        // which the findings list
        List<Row> skipped = spark.read().parquet(out.resolve(Tables.FINDINGS).toString())
                .where("drawing = '" + in.resolve("2025/cut-off.dxf") + "' and kind = 'skipped_entity'").collectAsList();
        assertEquals(1, skipped.size(), skipped.toString());
        String note = skipped.get(0).getAs("message");
        assertTrue(note.contains("the file ends inside this record, which may be cut off; not read")
                && note.contains("line 23") && note.contains("1F"), note);

        Row demo = drawings.get(in.resolve("garden-planter.dxf").toString());
        assertEquals("ok", demo.getAs("status"));
        assertNull(demo.getAs("message"));

        List<Row> layers = spark.read().parquet(out.resolve(Tables.LAYERS).toString())
                .where("drawing = '" + in.resolve("2025/planter-copy.dxf") + "'").collectAsList();
        Map<String, Row> byLayer = layers.stream().collect(Collectors.toMap(r -> r.<String>getAs("layer"), r -> r));
        // testdata/demo/README.md, closed forms: 2 x 550 + 2 x 200 + 2 pi x 25 mm; 8 x 210 mm once,
        // 8 x 210 - 1 + 210 mm drawn
        assertEquals(1.6570796, byLayer.get("RIM_D8").<Double>getAs("length_m"), LENGTH_TOLERANCE_M);
        assertEquals(1.679, byLayer.get("WIRES_D4").<Double>getAs("length_m"), LENGTH_TOLERANCE_M);
        assertEquals(1.889, byLayer.get("WIRES_D4").<Double>getAs("drawn_length_m"), LENGTH_TOLERANCE_M);
        assertEquals("PLANTER-D8", byLayer.get("RIM_D8").getAs("section"));

        // the bill: the two copies of the demo have the same marks; nothing from the failed drawing
        List<Row> bill = spark.read().parquet(out.resolve(Tables.BILL).toString()).collectAsList();
        long demoMarks = bill.stream().filter(r -> r.<String>getAs("drawing").endsWith("garden-planter.dxf")).count();
        long copyMarks = bill.stream().filter(r -> r.<String>getAs("drawing").endsWith("planter-copy.dxf")).count();
        assertTrue(demoMarks > 0);
        assertEquals(demoMarks, copyMarks);
        assertEquals(demoMarks, (long) demo.<Integer>getAs("marks"));
        assertTrue(bill.stream().noneMatch(r -> r.<String>getAs("drawing").endsWith("b-bad.dxf")));

        // the demo's 1 mm gap at (320, 125, 0) mm is among its findings (testdata/demo/README.md)
        List<Row> gaps = spark.read().parquet(out.resolve(Tables.FINDINGS).toString())
                .where("drawing = '" + in.resolve("garden-planter.dxf") + "' and kind = 'gap'").collectAsList();
        assertEquals(1, gaps.size(), gaps.toString());
        assertEquals("0.320", gaps.get(0).<String>getAs("x_text"), "x in m, three decimals as check prints it");
        assertEquals("0.125", gaps.get(0).<String>getAs("y_text"));
        assertEquals(0.001, gaps.get(0).<Double>getAs("size_m"), LENGTH_TOLERANCE_M);

        // the combined bill: one row per section of the demo's table, each from the three drawings read
        List<Row> combined = spark.read().parquet(out.resolve(Tables.COMBINED_BILL).toString()).collectAsList();
        assertTrue(combined.stream().anyMatch(r -> "PLANTER-D8".equals(r.getAs("section"))), combined.toString());
        for (Row r : combined) {
            if ("PLANTER-D8".equals(r.getAs("section"))) {
                assertEquals(2L, r.<Long>getAs("drawings"), "the demo and its copy");
            }
        }
    }

    @Test
    void job_rerunIntoSameOutput_replacesRows() {
        assertEquals(0, first.code(), first.err());
        long[] before = counts(out);
        LocalSpark.Run again = LocalSpark.job(spark, args(out));
        assertEquals(0, again.code(), again.err());
        assertEquals(java.util.Arrays.toString(before), java.util.Arrays.toString(counts(out)),
                "a re-run replaces the tables");
        assertEquals(4, before[0]);
    }

    @Test
    void job_csvOnRequest_sameSummaryAsParquet() {
        Path csv = dir.resolve("csv");
        assertEquals(0, LocalSpark.job(spark, args(csv, "--csv")).code());
        List<Row> rows = spark.read().option("header", "true").csv(csv.resolve(Tables.DRAWINGS).toString())
                .collectAsList();
        assertEquals(4, rows.size());
        Row demo = rows.stream().filter(r -> r.<String>getAs("drawing").endsWith("/garden-planter.dxf")).findFirst()
                .orElseThrow();
        Row p = spark.read().parquet(out.resolve(Tables.DRAWINGS).toString())
                .where("drawing = '" + in.resolve("garden-planter.dxf") + "'").first();
        assertEquals(p.<String>getAs("length_text"), demo.getAs("length_text"));
        assertEquals(p.<String>getAs("mass_text"), demo.getAs("mass_text"));
    }

    @Test
    void job_badOption_oneLineAndExitTwo() {
        LocalSpark.Run run = LocalSpark.job(spark, args(dir.resolve("never"), "--join", "fast"));
        assertEquals(2, run.code());
        assertEquals(1, run.err().lines().count(), run.err());
        assertTrue(run.err().startsWith("linemass-spark: "), run.err());
        assertTrue(Files.notExists(dir.resolve("never")), "nothing written");
    }

    @Test
    void job_noFileMatches_exitTwo() {
        LocalSpark.Run run = LocalSpark.job(spark, in.toString(), "*.dwg", dir.resolve("none").toString());
        assertEquals(2, run.code());
        assertEquals("linemass-spark: " + in + ": no file name matches *.dwg\n", run.err());
    }

    @Test
    void job_oneFileTooBig_failedWithoutReading() {
        Path demo = in.resolve("garden-planter.dxf");
        Path target = dir.resolve("too-big");
        LocalSpark.Run run = LocalSpark.job(spark, demo.toString(), "*.dxf", target.toString(),
                "--max-drawing-bytes", "1000");
        assertEquals(0, run.code(), run.err());
        List<Row> rows = spark.read().parquet(target.resolve(Tables.DRAWINGS).toString()).collectAsList();
        assertEquals(1, rows.size());
        long bytes = demo.toFile().length();
        assertEquals(demo + ": " + bytes + " bytes, more than --max-drawing-bytes 1000; not read",
                rows.get(0).getAs("message"));
        assertEquals("failed", rows.get(0).getAs("status"));
        assertEquals(0, spark.read().parquet(target.resolve(Tables.BILL).toString()).count());
    }

    @Test
    void job_inputMissing_oneLineAndExitTwo() {
        LocalSpark.Run run = LocalSpark.job(spark, dir.resolve("no-such-folder").toString(), "*.dxf",
                dir.resolve("none").toString());
        assertEquals(2, run.code());
        assertEquals(1, run.err().lines().count(), run.err());
        assertTrue(run.err().startsWith("linemass-spark: ") && run.err().contains("no-such-folder"), run.err());
    }

    private static long[] counts(Path tables) {
        String[] names = {Tables.DRAWINGS, Tables.LAYERS, Tables.BILL, Tables.FINDINGS, Tables.COMBINED_BILL};
        long[] n = new long[names.length];
        for (int i = 0; i < names.length; i++) {
            n[i] = spark.read().parquet(tables.resolve(names[i]).toString()).count();
        }
        return n;
    }
}
