package org.linemass.reports.xlsx;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayInputStream;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.util.List;
import org.apache.poi.ss.usermodel.Cell;
import org.apache.poi.ss.usermodel.CellType;
import org.apache.poi.ss.usermodel.Row;
import org.apache.poi.ss.usermodel.Sheet;
import org.apache.poi.ss.usermodel.Workbook;
import org.apache.poi.xssf.usermodel.XSSFWorkbook;
import org.junit.jupiter.api.Test;
import org.linemass.reports.Fixtures;
import org.linemass.reports.Report;
import org.linemass.reports.UnitSystem;

/** The workbook writer read back with Apache POI, an independent reader. */
class XlsxWorkbookTest {

    /** Cells keep full precision; one unit factor applied, so a few ulps relative. */
    private static final double REL_TOL = 1e-12;

    private static Workbook read(List<XlsxSheet> sheets) throws IOException {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        XlsxWorkbook.write(sheets, out);
        return new XSSFWorkbook(new ByteArrayInputStream(out.toByteArray()));
    }

    @Test
    void write_frame_sheetsInOrderWithTypedCells() throws IOException {
        try (Workbook wb = read(CheckSheets.of(List.of(Report.of(Fixtures.flatFrame("a.dxf"))), UnitSystem.METRIC))) {
            assertEquals(List.of("about", "bill of materials", "pieces", "findings", "layers"),
                    List.of(wb.getSheetName(0), wb.getSheetName(1), wb.getSheetName(2), wb.getSheetName(3),
                            wb.getSheetName(4)));
            Sheet bom = wb.getSheet("bill of materials");
            assertEquals("cut length each [mm]", bom.getRow(0).getCell(4).getStringCellValue());
            Row a = bom.getRow(1);
            assertEquals(CellType.NUMERIC, a.getCell(1).getCellType());
            assertEquals(2, a.getCell(1).getNumericCellValue(), 0);
            // 1 m bar in mm; 0.617 kg/m x 2 m (FACTS.md section 1.1)
            assertEquals(1000.0, a.getCell(4).getNumericCellValue(), 1000 * REL_TOL);
            assertEquals(2 * Fixtures.B10_KG_PER_M, a.getCell(8).getNumericCellValue(), REL_TOL);
            // the number format shows one decimal of mm, as the CSV does
            assertEquals("0.0", a.getCell(4).getCellStyle().getDataFormatString());
            // the ring has no section: its mass cell is empty, never zero; its formula-looking mark stays text
            Row ring = bom.getRow(2);
            Cell mass = ring.getCell(8);
            assertTrue(mass == null || mass.getCellType() == CellType.BLANK, "no mass must be an empty cell");
            assertEquals(CellType.STRING, ring.getCell(0).getCellType());
            assertEquals(Fixtures.FORMULA_MARK, ring.getCell(0).getStringCellValue());
            assertEquals("TOTAL", bom.getRow(3).getCell(0).getStringCellValue());
            assertEquals("NOTE", bom.getRow(4).getCell(0).getStringCellValue());
            Sheet pieces = wb.getSheet("pieces");
            // bar 1's centre of gravity is its midpoint, x = 0.5 m (closed form)
            assertEquals(0.5, pieces.getRow(1).getCell(9).getNumericCellValue(), REL_TOL);
            Sheet findings = wb.getSheet("findings");
            // the 1 mm gap, in mm
            assertEquals(1.0, findings.getRow(1).getCell(6).getNumericCellValue(), REL_TOL);
            Cell noPlace = findings.getRow(3).getCell(3);
            assertTrue(noPlace == null || noPlace.getCellType() == CellType.BLANK);
            Sheet layers = wb.getSheet("layers");
            assertEquals("BARS", layers.getRow(1).getCell(0).getStringCellValue());
            assertEquals(2 * Fixtures.B10_KG_PER_M, layers.getRow(1).getCell(5).getNumericCellValue(), REL_TOL);
        }
    }

    @Test
    void write_severalDrawingsImperial_drawingColumnAndConvertedValues() throws IOException {
        List<Report> two = List.of(Report.of(Fixtures.flatFrame("a.dxf")), Report.of(Fixtures.frame("b.dxf", 0.2, true)));
        try (Workbook wb = read(CheckSheets.of(two, UnitSystem.IMPERIAL))) {
            Sheet bom = wb.getSheet("bill of materials");
            assertEquals("drawing", bom.getRow(0).getCell(0).getStringCellValue());
            assertEquals("cut length each [in]", bom.getRow(0).getCell(5).getStringCellValue());
            assertEquals("b.dxf", bom.getRow(3).getCell(0).getStringCellValue());
            // 1 m = 1 / 0.0254 in exactly (international inch, FACTS.md section 0.1)
            assertEquals(1 / 0.0254, bom.getRow(1).getCell(5).getNumericCellValue(), 40 * REL_TOL);
            // 4 bars of 0.617 kg in pounds (1 lb = 0.45359237 kg exactly)
            assertEquals(4 * Fixtures.B10_KG_PER_M / 0.45359237, bom.getRow(5).getCell(9).getNumericCellValue(),
                    REL_TOL * 10);
            assertTrue(bom.getRow(6).getCell(3).getStringCellValue().contains("b.dxf: drawing read incompletely"));
            assertEquals("no", wb.getSheet("about").getRow(2).getCell(3).getStringCellValue());
        }
    }

    @Test
    void write_badSheets_refused() {
        XlsxSheet bad = sheet("a/b", List.of("x"));
        assertThrows(IllegalArgumentException.class, () -> XlsxWorkbook.write(List.of(bad), new ByteArrayOutputStream()));
        XlsxSheet a = sheet("plan", List.of("x"));
        XlsxSheet b = sheet("PLAN", List.of("x"));
        assertThrows(IllegalArgumentException.class, () -> XlsxWorkbook.write(List.of(a, b), new ByteArrayOutputStream()));
        assertThrows(IllegalArgumentException.class, () -> XlsxWorkbook.write(List.of(), new ByteArrayOutputStream()));
    }

    @Test
    void fill_rowShorterThanHeader_refused() {
        XlsxSheet shortRow = new XlsxSheet() {
            @Override
            public String name() {
                return "short";
            }

            @Override
            public List<String> header() {
                return List.of("a", "b");
            }

            @Override
            public void fill(SheetRows rows) {
                rows.text("only one").end();
            }
        };
        IllegalStateException e = assertThrows(IllegalStateException.class,
                () -> XlsxWorkbook.write(List.of(shortRow), new ByteArrayOutputStream()));
        assertTrue(e.getMessage().contains("row 2 has 1 cells, header has 2"), e.getMessage());
    }

    @Test
    void number_nullAndNonFinite_emptyCells() throws IOException {
        XlsxSheet s = new XlsxSheet() {
            @Override
            public String name() {
                return "n";
            }

            @Override
            public List<String> header() {
                return List.of("a [m]", "b [m]", "c [m]");
            }

            @Override
            public void fill(SheetRows rows) {
                rows.number(null, 3).number(Double.NaN, 3).number(-0.25, 3).end();
            }
        };
        try (Workbook wb = read(List.of(s))) {
            Row r = wb.getSheet("n").getRow(1);
            assertNull(r.getCell(0));
            assertNull(r.getCell(1));
            assertEquals(-0.25, r.getCell(2).getNumericCellValue(), 0);
        }
    }

    private static XlsxSheet sheet(String name, List<String> header) {
        return new XlsxSheet() {
            @Override
            public String name() {
                return name;
            }

            @Override
            public List<String> header() {
                return header;
            }

            @Override
            public void fill(SheetRows rows) {
            }
        };
    }
}
