package org.linemass.reports.csv;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.StringWriter;
import java.util.List;
import org.linemass.reports.DrawingOutcome;
import org.linemass.reports.Fixtures;
import org.linemass.reports.Report;
import org.linemass.reports.UnitSystem;
import org.junit.jupiter.api.Test;

class CsvWritersTest {

    /** Cells carry 3 decimals of kg: sums agree to half a unit in the last place of each of 2 rows. */
    private static final double MASS_TOL = 1e-3;

    private static List<List<String>> bom(List<Report> reports, UnitSystem u) throws IOException {
        StringWriter w = new StringWriter();
        BomCsvWriter.write(reports, u, w);
        return CsvParse.parse(w.toString());
    }

    @Test
    void bom_oneDrawing_rowPerMarkTotalsAndNote() throws IOException {
        List<List<String>> rows = bom(List.of(Report.of(Fixtures.flatFrame("a.dxf"))), UnitSystem.METRIC);
        assertEquals(List.of("mark", "quantity", "section", "material", "cut length each [mm]", "bends each",
                "mass each [kg]", "mass total [kg]", "layer"), rows.get(0));
        assertEquals(List.of("A", "2", "B10", "steel", "1000.0", "0", "0.617", "1.234", "BARS"), rows.get(1));
        // formula-looking mark from the drawing is guarded; ring has no section so mass cells are empty
        assertEquals("'" + Fixtures.FORMULA_MARK, rows.get(2).get(0));
        assertEquals("", rows.get(2).get(7));
        List<String> total = rows.get(3);
        assertEquals("TOTAL", total.get(0));
        assertEquals("3", total.get(1));
        assertEquals(2 * Fixtures.B10_KG_PER_M, Double.parseDouble(total.get(7)), MASS_TOL);
        assertEquals("NOTE", rows.get(4).get(0));
        assertTrue(rows.get(4).get(2).contains("no section"), rows.get(4).toString());
        assertEquals(5, rows.size());
    }

    @Test
    void bom_severalDrawings_oneBillWithDrawingStatusAndSectionTotals() throws IOException {
        List<List<String>> rows = bom(List.of(Report.of(Fixtures.flatFrame("=evil.dxf")),
                Report.of(Fixtures.frame("b.dxf", 0.2, true))), UnitSystem.METRIC);
        assertEquals(List.of("drawing", "status", "mark"), rows.get(0).subList(0, 3));
        assertEquals("cut length total [m]", rows.get(0).get(11));
        assertEquals(List.of("'=evil.dxf", "ok"), rows.get(1).subList(0, 2));
        assertEquals(List.of("b.dxf", "incomplete"), rows.get(3).subList(0, 2));
        // mark A: 2 bars of 1 m each (Fixtures.frame), so 2.000 m of cut length per drawing
        assertEquals("2.000", rows.get(1).get(11));
        // rows 5 and 6: one total per section and material, sorted; the rings have no section
        List<String> noSection = rows.get(5);
        assertEquals(List.of("", "", "TOTAL", "2", "", ""), noSection.subList(0, 6));
        List<String> b10 = rows.get(6);
        assertEquals(List.of("", "", "TOTAL", "4", "B10", "steel"), b10.subList(0, 6));
        assertEquals(4 * Fixtures.B10_KG_PER_M, Double.parseDouble(b10.get(9)), MASS_TOL);
        assertEquals("4.000", b10.get(11));
        List<String> total = rows.get(7);
        assertEquals(List.of("", "", "TOTAL", "6", "", ""), total.subList(0, 6));
        assertEquals(4 * Fixtures.B10_KG_PER_M, Double.parseDouble(total.get(9)), MASS_TOL);
        assertTrue(rows.get(8).get(4).contains("b.dxf: drawing read incompletely"), rows.get(8).toString());
        assertEquals(9, rows.size());
    }

    @Test
    void bom_failedDrawing_oneStatusRowAndNoteNothingInTotals() throws IOException {
        StringWriter w = new StringWriter();
        BomCsvWriter.writeOutcomes(List.of(DrawingOutcome.of(Report.of(Fixtures.flatFrame("a.dxf")), 5),
                DrawingOutcome.failed("bad.dxf", "bad.dxf:17: LINE 2F: not a number", 7)), UnitSystem.METRIC, w);
        List<List<String>> rows = CsvParse.parse(w.toString());
        List<String> failed = rows.get(3);
        assertEquals(List.of("bad.dxf", "failed", "", ""), failed.subList(0, 4));
        assertEquals(12, failed.size());
        List<String> total = rows.get(rows.size() - 2);
        // only a.dxf counts: its two bars and one ring (Fixtures.flatFrame)
        assertEquals("3", total.get(3));
        assertTrue(rows.get(rows.size() - 1).get(4).contains("bad.dxf: failed, not in the totals"));
    }

    @Test
    void findingsAndPieces_failedDrawing_rowWithStatus() throws IOException {
        List<DrawingOutcome> outcomes = List.of(DrawingOutcome.failed("bad.dxf", "bad.dxf:17: not a number", 7),
                DrawingOutcome.of(Report.of(Fixtures.flatFrame("a.dxf")), 5));
        StringWriter f = new StringWriter();
        FindingsCsvWriter.writeOutcomes(outcomes, UnitSystem.METRIC, f);
        List<List<String>> findings = CsvParse.parse(f.toString());
        assertEquals(List.of("drawing", "status", "number"), findings.get(0).subList(0, 3));
        assertEquals(List.of("bad.dxf", "failed", ""), findings.get(1).subList(0, 3));
        assertEquals("bad.dxf:17: not a number", findings.get(1).get(findings.get(1).size() - 1));
        assertEquals(List.of("a.dxf", "ok", "1"), findings.get(2).subList(0, 3));
        StringWriter p = new StringWriter();
        PiecesCsvWriter.writeOutcomes(outcomes, UnitSystem.METRIC, p);
        List<List<String>> pieces = CsvParse.parse(p.toString());
        assertEquals(List.of("bad.dxf", "failed", ""), pieces.get(1).subList(0, 3));
        assertEquals(List.of("a.dxf", "ok", "1"), pieces.get(2).subList(0, 3));
    }

    @Test
    void summary_rowPerDrawingAndTotal() throws IOException {
        StringWriter w = new StringWriter();
        SummaryCsvWriter.write(List.of(DrawingOutcome.of(Report.of(Fixtures.flatFrame("a.dxf")), 1_500_000_000L),
                DrawingOutcome.failed("bad.dxf", "bad.dxf:17: not a number", 250_000_000L),
                DrawingOutcome.of(Report.of(Fixtures.frame("b.dxf", 0.2, true)), 0)), UnitSystem.METRIC, w);
        List<List<String>> rows = CsvParse.parse(w.toString());
        assertEquals(List.of("drawing", "status", "length [m]", "mass [kg]", "pieces", "marks", "errors", "warnings",
                "notes", "time [s]", "message"), rows.get(0));
        assertEquals(List.of("a.dxf", "ok"), rows.get(1).subList(0, 2));
        assertEquals("1.500", rows.get(1).get(9));
        assertEquals(List.of("bad.dxf", "failed", "", "", "", "", "", "", "", "0.250", "bad.dxf:17: not a number"),
                rows.get(2));
        assertEquals("incomplete", rows.get(3).get(1));
        List<String> total = rows.get(4);
        assertEquals("TOTAL", total.get(0));
        // each frame has 2 bars of B10 with a mass and a ring without (Fixtures.frame)
        assertEquals(4 * Fixtures.B10_KG_PER_M, Double.parseDouble(total.get(3)), MASS_TOL);
        assertEquals(Integer.parseInt(rows.get(1).get(4)) + Integer.parseInt(rows.get(3).get(4)),
                Integer.parseInt(total.get(4)));
        assertEquals(Integer.parseInt(rows.get(1).get(6)) + Integer.parseInt(rows.get(3).get(6)),
                Integer.parseInt(total.get(6)));
        assertEquals("1.750", total.get(9));
        assertEquals("3 drawings, 1 incomplete, 1 failed, not in the totals", total.get(10));
    }

    @Test
    void bom_imperial_unitsInHeadersAndValues() throws IOException {
        List<List<String>> rows = bom(List.of(Report.of(Fixtures.flatFrame("a.dxf"))), UnitSystem.IMPERIAL);
        assertEquals("cut length each [in]", rows.get(0).get(4));
        assertEquals("mass each [lb]", rows.get(0).get(6));
        // 1 m = 39.370 in; 0.617 kg = 1.360 lb (1 in = 0.0254 m, 1 lb = 0.45359237 kg, FACTS.md section 0.1)
        assertEquals("39.370", rows.get(1).get(4));
        assertEquals("1.360", rows.get(1).get(6));
    }

    @Test
    void pieces_rowPerPieceWithEntitiesAndGuard() throws IOException {
        StringWriter w = new StringWriter();
        PiecesCsvWriter.write(List.of(Report.of(Fixtures.flatFrame("a.dxf"))), UnitSystem.METRIC, w);
        List<List<String>> rows = CsvParse.parse(w.toString());
        assertEquals(4, rows.size());
        assertEquals("piece", rows.get(0).get(0));
        assertTrue(rows.get(0).contains("length [mm]"));
        assertEquals("1", rows.get(1).get(0));
        // spelled out: a spreadsheet would read "120:2A"-like "1911:32" as a time of day
        assertEquals("line 120 handle 2A", rows.get(1).get(rows.get(1).size() - 1));
        assertEquals(Fixtures.SCRIPT_LAYER, rows.get(3).get(2));
        assertEquals("'" + Fixtures.FORMULA_MARK, rows.get(3).get(1));
        // cog x of bar 1 is its midpoint 0.5 m (closed form)
        assertEquals("0.500", rows.get(1).get(9));
    }

    @Test
    void findings_numberedWithGuardedMessage() throws IOException {
        StringWriter w = new StringWriter();
        FindingsCsvWriter.write(List.of(Report.of(Fixtures.flatFrame("a.dxf"))), UnitSystem.METRIC, w);
        List<List<String>> rows = CsvParse.parse(w.toString());
        assertEquals(List.of("number", "kind", "severity", "x [m]", "y [m]", "z [m]", "size [mm]", "layer", "mass [kg]",
                "entities", "message"), rows.get(0));
        // 1.0005 m shown with 3 decimals rounds half up (java.util.Formatter)
        // defect sizes get 3 decimals in mm so that a 0.05 mm gap does not read as 0.0
        assertEquals(List.of("1", "gap", "error", "1.001", "0.000", "0.000", "1.000", "BARS", "", "line 120 handle 2A",
                "ends 1 mm apart on layer BARS were not joined"), rows.get(1));
        assertEquals("line 134 handle 2B; line 120 handle 2A", rows.get(2).get(9));
        assertEquals("'-1+1 message starting with a minus", rows.get(3).get(10));
        assertEquals("", rows.get(3).get(3));
    }

    /**
     * What a spreadsheet needs to open the files as tables: every row as wide as the header, and
     * every cell under a header with a unit in brackets (and the counts) either empty or a plain
     * number with a dot, so it lands in the cell as a number in any locale setting of the import.
     * The files were also opened with a spreadsheet program (UTF-8 import): all numeric columns came
     * in as numbers, entity lists as text.
     */
    @Test
    void allCsvs_rectangularAndNumericColumnsParse() throws IOException {
        List<Report> reports = List.of(Report.of(Fixtures.flatFrame("a.dxf")), Report.of(Fixtures.frame("b.dxf", 0.3, true)));
        for (UnitSystem u : UnitSystem.values()) {
            StringWriter bom = new StringWriter();
            BomCsvWriter.write(reports, u, bom);
            StringWriter pieces = new StringWriter();
            PiecesCsvWriter.write(reports, u, pieces);
            StringWriter findings = new StringWriter();
            FindingsCsvWriter.write(reports, u, findings);
            for (String csv : List.of(bom.toString(), pieces.toString(), findings.toString())) {
                List<List<String>> rows = CsvParse.parse(csv);
                List<String> head = rows.get(0);
                for (List<String> row : rows) {
                    assertEquals(head.size(), row.size(), "row " + row + " under " + head);
                    if (row.get(0).equals("NOTE") || row.size() > 1 && row.get(1).equals("NOTE")) {
                        continue;
                    }
                    for (int c = 0; c < head.size(); c++) {
                        String h = head.get(c);
                        boolean numeric = h.contains("[") || h.equals("quantity") || h.equals("bends each")
                                || h.equals("piece") || h.equals("number") || h.equals("segments") || h.equals("bends");
                        String cell = row.get(c);
                        if (numeric && row != head && !cell.isEmpty()) {
                            assertTrue(cell.matches("-?[0-9]+(\\.[0-9]+)?"), h + " = '" + cell + "' is not a plain number");
                        }
                    }
                }
            }
        }
    }
}
