package org.linemass.app;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.InputStream;
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
 * The bending schedule of v07 (../shared/corpus) with its bar layers assigned to 8 and 16 mm bar, in
 * the JSON report and in the workbook's "bending schedule" sheet, read back with Apache POI (a reader
 * independent of the writer): the sheet shows every JSON line with the same numbers in millimetres,
 * every cut length is a whole number of 25 mm steps (the rounding step as remembered from BS 8666,
 * unverified) at or above the length it was rounded from, and each size's TOTAL is the sum of the
 * JSON groups' masses of that section. Cells keep full precision; the only change is the factor
 * 1000, one rounding, so 1e-12 relative covers it.
 */
class ScheduleOutputsTest {

    private static final double REL_TOL = 1e-12;

    @TempDir
    Path tmp;

    @Test
    void check_v07WithJsonAndXlsx_scheduleSheetEqualsJson() throws Exception {
        Path dir = CorpusJsonTest.corpus();
        assumeTrue(dir != null && Files.exists(dir.resolve("v07_rebar_cage_blocks_r2000_mm.dxf")),
                "../shared/corpus not present; skipped");
        Path json = tmp.resolve("v07.json");
        Path xlsx = tmp.resolve("v07.xlsx");
        AppFixtures.Run run = AppFixtures.run(new EnginePipeline(), "check", "-q",
                dir.resolve("v07_rebar_cage_blocks_r2000_mm.dxf").toString(), "-a", "REBAR_MAIN_D16=RB16", "-a",
                "REBAR_STIRRUP_D8=RB8", "--json=" + json, "--xlsx=" + xlsx);
        assertTrue(run.code() == 0 || run.code() == 1, run.err());
        JsonNode report = new ObjectMapper().readTree(json.toFile());
        JsonNode schedule = report.get("schedule");
        assertEquals("BS 8666:2005", schedule.get("standard").asText());
        double step = schedule.get("cut_length_step_m").asDouble();
        JsonNode lines = schedule.get("lines");
        assertEquals(report.get("groups").size(), lines.size(), "one schedule line per group");
        try (InputStream in = Files.newInputStream(xlsx); Workbook wb = new XSSFWorkbook(in)) {
            Sheet s = wb.getSheet("bending schedule");
            Map<String, Integer> col = columns(s);
            for (int i = 0; i < lines.size(); i++) {
                JsonNode l = lines.get(i);
                Row r = s.getRow(i + 1);
                assertEquals(l.get("bar_mark").asText(), r.getCell(col.get("bar mark")).getStringCellValue());
                double cut = l.get("cut_length_each_m").asDouble();
                double steps = cut / step;
                assertEquals(Math.rint(steps), steps, 1e-9, "whole 25 mm steps");
                double from = l.get("formula_minus_exact_m").isNull() ? l.get("exact_length_m").asDouble()
                        : l.get("exact_length_m").asDouble() + l.get("formula_minus_exact_m").asDouble();
                assertTrue(cut >= from - 1e-12, "rounded up: " + cut + " from " + from);
                close(cut * 1000, numeric(r, col.get("length of each bar [mm]")));
                close(l.get("exact_length_m").asDouble() * 1000, numeric(r, col.get("exact centre-line length [mm]")));
                if (!l.get("shape_code").isNull()) {
                    assertEquals(l.get("shape_code").asText(), r.getCell(col.get("shape code")).getStringCellValue());
                }
                if (!l.get("a_m").isNull()) {
                    close(l.get("a_m").asDouble() * 1000, numeric(r, col.get("A [mm]")));
                }
            }
            Map<String, Double> bySection = new HashMap<>();
            for (JsonNode g : report.get("groups")) {
                if (!g.get("section").isNull() && !g.get("mass_total_kg").isNull()) {
                    bySection.merge(g.get("section").asText(), g.get("mass_total_kg").asDouble(), Double::sum);
                }
            }
            int totals = 0;
            for (int i = lines.size() + 1; i <= s.getLastRowNum(); i++) {
                Row r = s.getRow(i);
                assertEquals("TOTAL", r.getCell(col.get("member")).getStringCellValue());
                String size = text(r, col.get("type and size"));
                if (bySection.containsKey(size)) {
                    // the sum in the engine and here may add in another order: a few units of rounding
                    assertEquals(bySection.get(size), numeric(r, col.get("mass [kg]")), 1e-9 * bySection.get(size));
                    totals++;
                }
            }
            assertEquals(2, totals, "a TOTAL row for RB8 and RB16");
        }
    }

    private static Map<String, Integer> columns(Sheet s) {
        Map<String, Integer> m = new HashMap<>();
        for (Cell c : s.getRow(0)) {
            m.put(c.getStringCellValue(), c.getColumnIndex());
        }
        return m;
    }

    private static double numeric(Row r, int c) {
        Cell cell = r.getCell(c);
        assertEquals(CellType.NUMERIC, cell.getCellType(), "column " + c + " of row " + r.getRowNum());
        return cell.getNumericCellValue();
    }

    private static String text(Row r, int c) {
        Cell cell = r.getCell(c);
        return cell == null ? "" : cell.getStringCellValue();
    }

    private static void close(double want, double got) {
        assertEquals(want, got, Math.abs(want) * REL_TOL);
    }
}
