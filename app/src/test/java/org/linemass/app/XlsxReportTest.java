package org.linemass.app;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.InputStream;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.HashMap;
import java.util.Map;
import org.apache.poi.ss.usermodel.Cell;
import org.apache.poi.ss.usermodel.CellType;
import org.apache.poi.ss.usermodel.Row;
import org.apache.poi.ss.usermodel.Sheet;
import org.apache.poi.ss.usermodel.Workbook;
import org.apache.poi.xssf.usermodel.XSSFWorkbook;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * {@code check --xlsx} on the demo, read back with Apache POI (a reader independent of the writer):
 * every number of the bill, the pieces and the layers is a numeric cell equal to the JSON report's
 * value in the unit named in its header.
 */
class XlsxReportTest {

    /**
     * Cells keep full double precision; the only change is the unit factor (x 1000 for mm), one
     * rounding, so 1e-12 relative covers it with margin.
     */
    private static final double REL_TOL = 1e-12;

    @TempDir
    Path tmp;

    @Test
    void check_demoWithXlsx_numericCellsEqualJson() throws Exception {
        Path demo = CorpusJsonTest.repo().resolve("testdata/demo");
        Path xlsx = tmp.resolve("demo.xlsx");
        Path json = tmp.resolve("demo.json");
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        AppContext ctx = new AppContext(new PrintWriter(out), new PrintWriter(err), new EnginePipeline(),
                new EngineSectionCatalog(), new EngineFieldIntegrator(), false);
        int code = Cli.run(ctx, "check", demo.resolve("garden-planter.dxf").toString(), "--fail-at", "never",
                "--section-table", demo.resolve("garden-planter-section-table.csv").toString(),
                "--assign-file", demo.resolve("garden-planter-layers.csv").toString(),
                "--json", json.toString(), "--xlsx", xlsx.toString());
        assertEquals(0, code, err::toString);
        JsonNode report = new ObjectMapper().readTree(json.toFile());
        try (InputStream in = Files.newInputStream(xlsx); Workbook wb = new XSSFWorkbook(in)) {
            assertEquals("about", wb.getSheetName(0));
            bill(wb.getSheet("bill of materials"), report);
            pieces(wb.getSheet("pieces"), report);
            layers(wb.getSheet("layers"), report);
            assertEquals(report.get("findings").size() + 1, wb.getSheet("findings").getPhysicalNumberOfRows());
        }
    }

    private static void bill(Sheet s, JsonNode report) {
        Map<String, Integer> col = columns(s);
        JsonNode groups = report.get("groups");
        assertTrue(groups.size() > 0, "the demo has marks");
        double mass = 0;
        for (int i = 0; i < groups.size(); i++) {
            JsonNode g = groups.get(i);
            Row r = s.getRow(i + 1);
            assertEquals(g.get("mark").asText(), r.getCell(col.get("mark")).getStringCellValue());
            assertEquals(g.get("quantity").asDouble(), numeric(r, col.get("quantity")), 0);
            close(g.get("length_each_m").asDouble() * 1000, numeric(r, col.get("cut length each [mm]")));
            close(g.get("mass_total_kg").asDouble(), numeric(r, col.get("mass total [kg]")));
            close(g.get("length_total_m").asDouble(), numeric(r, col.get("length total [m]")));
            mass += g.get("mass_total_kg").asDouble();
        }
        Row total = s.getRow(groups.size() + 1);
        assertEquals("TOTAL", total.getCell(col.get("mark")).getStringCellValue());
        // the demo has a section for every layer, so the bill's total is the drawing's mass
        close(report.get("totals").get("mass_kg").asDouble(), numeric(total, col.get("mass total [kg]")));
        close(mass, numeric(total, col.get("mass total [kg]")));
    }

    private static void pieces(Sheet s, JsonNode report) {
        Map<String, Integer> col = columns(s);
        JsonNode pieces = report.get("pieces");
        assertEquals(pieces.size() + 1, s.getPhysicalNumberOfRows());
        for (int i = 0; i < pieces.size(); i++) {
            JsonNode p = pieces.get(i);
            Row r = s.getRow(i + 1);
            assertEquals(p.get("id").asDouble(), numeric(r, col.get("piece")), 0);
            close(p.get("length_m").asDouble() * 1000, numeric(r, col.get("length [mm]")));
            close(p.get("mass_kg").asDouble(), numeric(r, col.get("mass [kg]")));
            close(p.get("centroid_m").get(0).asDouble(), numeric(r, col.get("cog x [m]")));
            close(p.get("centroid_m").get(1).asDouble(), numeric(r, col.get("cog y [m]")));
            close(p.get("end_m").get(2).asDouble(), numeric(r, col.get("end z [m]")));
            assertEquals(p.get("bends").size(), numeric(r, col.get("bends")), 0);
        }
    }

    private static void layers(Sheet s, JsonNode report) {
        Map<String, Integer> col = columns(s);
        JsonNode layers = report.get("layers");
        for (int i = 0; i < layers.size(); i++) {
            JsonNode l = layers.get(i);
            Row r = s.getRow(i + 1);
            assertEquals(l.get("name").asText(), r.getCell(col.get("layer")).getStringCellValue());
            close(l.get("length_m").asDouble(), numeric(r, col.get("length [m]")));
            if (!l.get("mass_kg").isNull()) {
                close(l.get("mass_kg").asDouble(), numeric(r, col.get("mass [kg]")));
            }
        }
    }

    private static Map<String, Integer> columns(Sheet s) {
        Map<String, Integer> m = new HashMap<>();
        for (Cell c : s.getRow(0)) {
            m.put(c.getStringCellValue(), c.getColumnIndex());
        }
        return m;
    }

    private static double numeric(Row r, int col) {
        Cell c = r.getCell(col);
        assertEquals(CellType.NUMERIC, c.getCellType(), "row " + (r.getRowNum() + 1) + " column " + (col + 1));
        return c.getNumericCellValue();
    }

    private static void close(double want, double got) {
        assertEquals(want, got, Math.abs(want) * REL_TOL + 1e-15, "want " + want + ", got " + got);
    }
}
