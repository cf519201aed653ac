package org.linemass.spark;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.io.PrintWriter;
import java.io.Reader;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.stream.Collectors;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVRecord;
import org.apache.spark.sql.Row;
import org.apache.spark.sql.SparkSession;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.linemass.app.AppContext;
import org.linemass.app.Cli;
import org.linemass.app.EngineFieldIntegrator;
import org.linemass.app.EnginePipeline;
import org.linemass.app.EngineSectionCatalog;
import org.linemass.reports.csv.CsvCell;

/**
 * The job and {@code linemass check} (run in this JVM, as the command line runs it) on the same
 * folder of drawings that are not the project's own ({@code ../shared/corpus} and
 * {@code ../shared/external}, beside the checkout) give the same numbers for every drawing: the
 * summary, bill and findings cells the job stores as text are those of check's CSV files byte for
 * byte, each per-section total of check's combined bill is a row of the job's, and the layer and
 * drawing doubles are check's JSON numbers exactly. The check value is check itself.
 */
class CheckComparisonTest {

    private static SparkSession spark;

    @TempDir
    static Path dir;

    @BeforeAll
    static void start() {
        spark = LocalSpark.start();
    }

    @AfterAll
    static void stop() {
        spark.stop();
    }

    @Test
    void job_corpus_sameNumbersAsCheck() throws IOException {
        compare(shared("corpus"), "corpus");
    }

    @Test
    void job_external_sameNumbersAsCheck() throws IOException {
        compare(shared("external"), "external");
    }

    private static Path shared(String name) throws IOException {
        Path repo = LocalSpark.repo();
        Path d = repo == null ? null : repo.resolve("../shared").resolve(name).normalize();
        assumeTrue(d != null && Files.isDirectory(d), "../shared/" + name + " is not beside the checkout; "
                + "the comparison with check on it is skipped");
        return d.toRealPath();
    }

    private static void compare(Path folder, String name) throws IOException {
        Path cli = dir.resolve(name + "-check");
        Files.createDirectories(cli);
        StringWriter so = new StringWriter();
        StringWriter se = new StringWriter();
        AppContext ctx = new AppContext(new PrintWriter(so), new PrintWriter(se), new EnginePipeline(),
                new EngineSectionCatalog(), new EngineFieldIntegrator(), false);
        int code = Cli.run(ctx, "check", "--jobs", "2", "--fail-at", "never", "-q",
                "--summary-csv", cli.resolve("summary.csv").toString(), "--bom-csv", cli.resolve("bom.csv").toString(),
                "--findings-csv", cli.resolve("findings.csv").toString(), "--json", cli.resolve("report.json").toString(),
                folder.toString());
        assertTrue(code == 0 || code == 2, "check ran (2: some drawings refused): " + se);

        Path out = dir.resolve(name + "-job");
        // check takes every name ending in .dxf in any case
        LocalSpark.Run run = LocalSpark.job(spark, folder.toString(), "*.[dD][xX][fF]", out.toString());
        assertEquals(0, run.code(), run.err());

        List<CSVRecord> summary = csv(cli.resolve("summary.csv"));
        List<Row> drawings = table(out, Tables.DRAWINGS);
        assertEquals(summary.size() - 1, drawings.size(), "one row per drawing (check adds a TOTAL row)");
        assertEquals(sorted(summary.subList(0, summary.size() - 1).stream().map(r -> {
            List<String> cells = new ArrayList<>(r.toList());
            cells.remove(9); // wall-clock time, the one column that differs between any two runs
            return cells;
        }).toList()), sorted(drawings.stream().map(r -> List.of(CsvCell.text(r.getAs("drawing")), r.getAs("status"),
                text(r, "length_text"), text(r, "mass_text"), number(r, "pieces"), number(r, "marks"),
                number(r, "errors"), number(r, "warnings"), number(r, "notes"), CsvCell.text(r.getAs("message"))))
                .toList()), name + ": summary");

        List<CSVRecord> bom = csv(cli.resolve("bom.csv"));
        List<List<String>> checkMarks = new ArrayList<>();
        List<List<String>> checkSections = new ArrayList<>();
        for (CSVRecord r : bom) {
            if (r.get(0).isEmpty() && r.get(2).equals("TOTAL")) {
                checkSections.add(List.of(r.get(3), r.get(4), r.get(5), r.get(9), r.get(11)));
            } else if (!r.get(0).isEmpty() && !r.get(1).equals("failed")) {
                checkMarks.add(r.toList());
            }
        }
        checkSections.remove(checkSections.size() - 1); // the grand total
        assertEquals(sorted(checkMarks), sorted(table(out, Tables.BILL).stream().map(r -> List.of(
                CsvCell.text(r.getAs("drawing")), r.<String>getAs("status"), CsvCell.text(r.getAs("mark")),
                number(r, "quantity"), CsvCell.text(r.getAs("section")), CsvCell.text(r.getAs("material")),
                text(r, "cut_length_each_text"), number(r, "bends_each"), text(r, "mass_each_text"),
                text(r, "mass_total_text"), CsvCell.text(r.getAs("layer")), text(r, "cut_length_total_text")))
                .toList()), name + ": bill of materials");
        assertEquals(sorted(checkSections), sorted(table(out, Tables.COMBINED_BILL).stream().map(r -> List.of(
                number(r, "quantity"), CsvCell.text(r.getAs("section")), CsvCell.text(r.getAs("material")),
                text(r, "mass_total_text"), text(r, "cut_length_total_text"))).toList()), name + ": combined bill");

        List<List<String>> checkFindings = csv(cli.resolve("findings.csv")).stream()
                .filter(r -> !r.get(1).equals("failed")).map(CSVRecord::toList).toList();
        assertEquals(sorted(checkFindings), sorted(table(out, Tables.FINDINGS).stream().map(r -> List.of(
                CsvCell.text(r.getAs("drawing")), r.<String>getAs("status"), number(r, "number"),
                CsvCell.text(r.getAs("kind")), r.<String>getAs("severity"), text(r, "x_text"), text(r, "y_text"),
                text(r, "z_text"), text(r, "size_text"), CsvCell.text(r.getAs("layer")), text(r, "mass_text"),
                CsvCell.text(r.getAs("entities")), CsvCell.text(r.getAs("message")))).toList()), name + ": findings");

        compareJson(cli.resolve("report.json"), drawings, table(out, Tables.LAYERS), name);
    }

    /** Layer and drawing doubles of the job against check's JSON numbers, which are the doubles' shortest text. */
    private static void compareJson(Path json, List<Row> drawings, List<Row> layers, String name) throws IOException {
        JsonNode doc = new ObjectMapper().readTree(json.toFile());
        JsonNode list = doc.has("drawings") ? doc.get("drawings") : new ObjectMapper().createArrayNode().add(doc);
        Map<String, Row> byDrawing = drawings.stream().collect(Collectors.toMap(r -> r.getAs("drawing"), r -> r));
        Map<String, Row> byLayer = layers.stream()
                .collect(Collectors.toMap(r -> r.getAs("drawing") + "\u0000" + r.getAs("layer"), r -> r));
        int seen = 0;
        for (JsonNode d : list) {
            String file = d.get("drawing").get("file").asText();
            Row row = byDrawing.get(file);
            assertEquals(d.get("totals").get("length_m").asText(), String.valueOf(row.<Double>getAs("length_m")),
                    name + ": " + file + " length");
            assertEquals(d.get("totals").get("mass_kg").isNull() ? "null" : d.get("totals").get("mass_kg").asText(),
                    String.valueOf(row.<Double>getAs("mass_kg")), name + ": " + file + " mass");
            for (JsonNode l : d.get("layers")) {
                Row lr = byLayer.get(file + "\u0000" + l.get("name").asText());
                String where = name + ": " + file + " layer " + l.get("name").asText();
                assertEquals(l.get("length_m").asText(), String.valueOf(lr.<Double>getAs("length_m")), where);
                assertEquals(l.get("drawn_length_m").asText(), String.valueOf(lr.<Double>getAs("drawn_length_m")), where);
                assertEquals(l.get("mass_kg").isNull() ? "null" : l.get("mass_kg").asText(),
                        String.valueOf(lr.<Double>getAs("mass_kg")), where);
                assertEquals(l.get("pieces").asInt(), lr.<Integer>getAs("pieces"), where);
                seen++;
            }
        }
        assertEquals(seen, layers.size(), name + ": one layer row per layer of check's report");
    }

    private static List<Row> table(Path out, String name) {
        return spark.read().parquet(out.resolve(name).toString()).collectAsList();
    }

    private static List<CSVRecord> csv(Path file) throws IOException {
        try (Reader r = Files.newBufferedReader(file, StandardCharsets.UTF_8)) {
            return CSVFormat.RFC4180.builder().setHeader().setSkipHeaderRecord(true).get().parse(r).getRecords();
        }
    }

    private static String text(Row r, String column) {
        String s = r.getAs(column);
        return s == null ? "" : s;
    }

    private static String number(Row r, String column) {
        Object v = r.getAs(column);
        return v == null ? "" : v.toString();
    }

    /** The rows as lines, sorted: the two sides list rows in different orders (Spark's files, check's input order). */
    private static List<String> sorted(List<List<String>> rows) {
        return rows.stream().map(r -> String.join("\u0001", r)).sorted().toList();
    }
}
