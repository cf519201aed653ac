package org.linemass.reports.console;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.linemass.engine.result.DrawingResult;
import org.linemass.engine.result.Finding;
import org.linemass.engine.result.FindingKind;
import org.linemass.engine.result.Severity;
import org.linemass.geometry.Vec3;
import org.linemass.reports.DrawingOutcome;
import org.linemass.reports.Fixtures;
import org.linemass.reports.Report;
import org.linemass.reports.UnitSystem;
import org.junit.jupiter.api.Test;

class ConsoleReportTest {

    private static String print(List<Report> reports, UnitSystem u, boolean colour, boolean quiet) {
        StringWriter w = new StringWriter();
        new ConsoleReport(u, colour, quiet).print(reports, new PrintWriter(w));
        return w.toString();
    }

    /** The frame with {@code n} alike warnings (same kind and text, each naming its own entity) added. */
    private static List<Report> alikeWarnings(int n) {
        DrawingResult r = Fixtures.flatFrame("a.dxf");
        List<Finding> findings = new ArrayList<>(r.findings());
        for (int i = 0; i < n; i++) {
            org.linemass.engine.result.SourceRef e = new org.linemass.engine.result.SourceRef(200 + i, "", "ARC",
                    List.of());
            findings.add(new Finding(FindingKind.TIGHT_BEND, Severity.WARNING, new Vec3(0.1 * i, 0, 0), 0.012, "BARS",
                    List.of(e), null, "Bend of ARC at line " + (200 + i) + " has an inside radius of 12.000 mm, below "
                            + "the minimum 16.000 mm for section B10."));
        }
        return List.of(Report.of(new DrawingResult(r.drawing(), r.entities(), r.layers(), r.pieces(), r.groups(),
                findings, r.totals(), r.sections(), r.incompleteReasons())));
    }

    @Test
    void print_alikeFindings_oneRowUnlessAllAsked() {
        StringWriter g = new StringWriter();
        new ConsoleReport(UnitSystem.METRIC, false, false, false, false, 200).print(alikeWarnings(76), new PrintWriter(g));
        // wrapped lines joined again, so the checks do not depend on where the message wraps
        String grouped = g.toString().replaceAll("\\s+", " ");
        assertTrue(grouped.contains("x76 warning tight_bend"), grouped);
        assertTrue(grouped.contains("76 tight bends on layer BARS: Bend of ARC has an inside radius of 12.000 mm"),
                grouped);
        // the frame's three findings come first: the bends are findings 4 to 79
        assertTrue(grouped.contains("(findings 4-79)"), grouped);
        assertTrue(grouped.contains("--all-findings lists each one"), grouped);
        assertFalse(grouped.contains("line 237"), "no single bend row: " + grouped);
        StringWriter a = new StringWriter();
        new ConsoleReport(UnitSystem.METRIC, false, false, false, true, 200).print(alikeWarnings(76), new PrintWriter(a));
        String all = a.toString().replaceAll("\\s+", " ");
        for (int line = 200; line < 276; line++) {
            assertTrue(all.contains("Bend of ARC at line " + line + " "), "bend at line " + line);
        }
        assertFalse(all.contains("x76"), all);
    }

    @Test
    void print_narrowTerminal_everyTextLineFits() {
        for (int width : new int[] {80, 100, 120}) {
            StringWriter w = new StringWriter();
            new ConsoleReport(UnitSystem.METRIC, false, false, false, false, width).print(alikeWarnings(3),
                    new PrintWriter(w));
            String out = w.toString();
            // the tables of numbers (bill, layers) are as wide as their columns; everything else fits
            boolean inNumbers = false;
            for (String l : out.split("\n")) {
                if (l.equals("Bill of materials") || l.equals("Layers")) {
                    inNumbers = true;
                } else if (l.isEmpty()) {
                    inNumbers = false;
                } else if (!inNumbers && !l.startsWith("    #") && !l.startsWith("  ---") && !l.matches("  (x?[0-9]+) .*")) {
                    assertTrue(l.length() < width, width + " columns: " + l.length() + " characters in '" + l + "'");
                }
            }
            assertTrue(out.contains("Caution: These lengths"), out);
        }
    }

    @Test
    void print_manyNotesCountedUnlessListed() {
        org.linemass.engine.result.DrawingResult r = Fixtures.flatFrame("a.dxf");
        List<org.linemass.engine.result.Finding> findings = new java.util.ArrayList<>(r.findings());
        org.linemass.engine.result.Finding note = findings.stream()
                .filter(f -> f.severity() == org.linemass.engine.result.Severity.INFO).findFirst().orElseThrow();
        for (int i = 0; i < ConsoleReport.NOTES_LISTED; i++) {
            findings.add(note);
        }
        List<Report> reports = List.of(Report.of(new org.linemass.engine.result.DrawingResult(r.drawing(),
                r.entities(), r.layers(), r.pieces(), r.groups(), findings, r.totals(), r.sections(),
                r.incompleteReasons())));
        String counted = print(reports, UnitSystem.METRIC, false, false);
        StringWriter w = new StringWriter();
        new ConsoleReport(UnitSystem.METRIC, false, false, true).print(reports, new PrintWriter(w));
        String listed = w.toString();
        // 1 + NOTES_LISTED notes: over the limit, so counted unless --list-notes asks for every row
        assertTrue(counted.contains((ConsoleReport.NOTES_LISTED + 1) + " notes not listed here ("), counted);
        assertTrue(counted.contains("or add --list-notes"), counted);
        assertFalse(listed.contains("not listed"), listed);
        assertTrue(listed.length() > counted.length(), "every note gets its own row when listed");
    }

    @Test
    void print_summaryComesBeforeTables() {
        String s = print(List.of(Report.of(Fixtures.flatFrame("a.dxf"))), UnitSystem.METRIC, false, false);
        int summary = s.indexOf("centre of gravity");
        assertTrue(summary > 0, s);
        assertTrue(s.indexOf("mm (from the file header)") < s.indexOf("Bill of materials"));
        assertTrue(summary < s.indexOf("Bill of materials"));
        assertTrue(s.indexOf("Bill of materials") < s.indexOf("Layers"));
        assertTrue(s.indexOf("Layers") < s.indexOf("Findings"));
        assertTrue(s.contains("1 error, 1 warning, 1 note"), s);
        assertTrue(s.contains("cut length each [mm]"));
        assertTrue(s.contains("3 in 2 marks"));
        // mass of the two B10 bars: 2 x 0.617 kg (FACTS.md section 1.1)
        assertTrue(s.contains("1.234 kg (only layers with a section)"), s);
        assertFalse(s.contains("\u001b["), "no colour when not a terminal");
        assertTrue(s.contains("Caution:"));
    }

    @Test
    void print_tableColumnsAreAligned() {
        String s = print(List.of(Report.of(Fixtures.flatFrame("a.dxf"))), UnitSystem.METRIC, false, false);
        String[] lines = s.split("\n");
        int header = -1;
        for (int i = 0; i < lines.length; i++) {
            if (lines[i].trim().startsWith("mark")) {
                header = i;
                break;
            }
        }
        assertTrue(header > 0);
        // the right edge of the right-aligned "qty" column is the same on header and rows
        int end = lines[header].indexOf("qty") + 3;
        assertEquals('2', lines[header + 2].charAt(end - 1), lines[header + 2]);
        assertEquals('1', lines[header + 3].charAt(end - 1), lines[header + 3]);
    }

    @Test
    void print_colourOnlyWhenAsked() {
        String s = print(List.of(Report.of(Fixtures.flatFrame("a.dxf"))), UnitSystem.METRIC, true, false);
        assertTrue(s.contains("\u001b[31m1 error\u001b[0m"));
    }

    @Test
    void print_quiet_oneLinePerDrawingPlusTotal() {
        String s = print(List.of(Report.of(Fixtures.flatFrame("a.dxf")), Report.of(Fixtures.frame("b.dxf", 0, true))),
                UnitSystem.METRIC, false, true);
        String[] lines = s.split("\n");
        assertEquals(3, lines.length, s);
        assertTrue(lines[0].startsWith("a.dxf: "));
        assertTrue(lines[1].endsWith("INCOMPLETE"));
        assertTrue(lines[2].startsWith("all 2 drawings: "));
        // 2 x (2 bars + ring of 0.2 pi m) rounded to mm
        assertTrue(lines[2].contains(UnitSystem.fixed(2 * (2 + 0.2 * Math.PI), 3) + " m"), lines[2]);
    }

    @Test
    void print_imperialAndGermanLocale_usesFeetPoundsAndDots() {
        Locale before = Locale.getDefault();
        try {
            Locale.setDefault(Locale.GERMANY);
            String s = print(List.of(Report.of(Fixtures.flatFrame("a.dxf"))), UnitSystem.IMPERIAL, false, false);
            // 1.234 kg = 2.7205 lb, shown 2.721 (1 lb = 0.45359237 kg, FACTS.md section 0.1)
            assertTrue(s.contains("2.721 lb"), s);
            assertTrue(s.contains("cut length each [in]"));
            assertFalse(s.contains(" kg"));
        } finally {
            Locale.setDefault(before);
        }
    }

    @Test
    void wrap_longMessage_splitsAtSpacesWithinWidth() {
        List<String> parts = TextTable.wrap("LINE at line 877, handle 47 is drawn again over LINE at line 853", 20);
        assertEquals(List.of("LINE at line 877,", "handle 47 is drawn", "again over LINE at", "line 853"), parts);
        assertEquals(List.of("abcdefghij", "klm"), TextTable.wrap("abcdefghijklm", 10));
    }

    @Test
    void render_wrappedRowsContinueUnderTheLastColumn() {
        TextTable t = new TextTable(List.of("#", "message"), true, false);
        t.add(List.of("1", "one two three four five six"));
        String[] lines = t.render("", 12).split("\n");
        assertEquals("1  one two", lines[2]);
        assertEquals("   three four", lines[3]);
        assertEquals("   five six", lines[4]);
    }

    @Test
    void print_controlCharactersInNamesAreNeutralised() {
        assertEquals("a?[31mb", TextTable.clean("a\u001b[31mb"));
    }

    @Test
    void print_incompleteDrawing_saysSo() {
        String s = print(List.of(Report.of(Fixtures.frame("a.dxf", 0, true))), UnitSystem.METRIC, false, false);
        assertTrue(s.contains("incomplete: SPLINE at line 400 skipped"), s);
        assertTrue(s.contains("NO: some of the drawing was not counted"));
    }

    @Test
    void print_manyNotes_summedUpAfterErrorsAndWarnings() {
        DrawingResult base = Fixtures.flatFrame("weld.dxf");
        List<Finding> findings = new ArrayList<>();
        for (int i = 0; i < ConsoleReport.NOTES_LISTED + 2; i++) {
            findings.add(new Finding(FindingKind.CROSSING, Severity.INFO, new Vec3(0.1 * i, 0, 0), null, "BARS",
                    List.of(), null, "weld note " + i));
        }
        findings.addAll(base.findings().subList(0, 2));
        DrawingResult r = new DrawingResult(base.drawing(), base.entities(), base.layers(), base.pieces(), base.groups(),
                findings, base.totals(), base.sections(), base.incompleteReasons());
        String s = print(List.of(Report.of(r)), UnitSystem.METRIC, false, false);
        String table = s.substring(s.indexOf("Findings"));
        assertFalse(table.contains("weld note"), "notes are not listed one by one");
        assertTrue(table.contains("12 notes not listed here (12 " + FindingKind.CROSSING + ")"), table);
        // the error keeps its number 13 (the order of every report) and comes first
        assertTrue(table.matches("(?s).*\\n\\s+13\\s+error.*\\n\\s+14\\s+warning.*"), table);
    }

    @Test
    void print_fewNotes_listedAfterErrorsAndWarnings() {
        String s = print(List.of(Report.of(Fixtures.flatFrame("a.dxf"))), UnitSystem.METRIC, false, false);
        String table = s.substring(s.indexOf("Findings"));
        assertTrue(table.indexOf("error") < table.indexOf("warning") && table.indexOf("warning") < table.indexOf("info"),
                table);
    }

    @Test
    void printOutcomes_failedDrawing_inTableAndTotalsSayHowManyFailed() {
        List<DrawingOutcome> outcomes = List.of(DrawingOutcome.of(Report.of(Fixtures.flatFrame("a.dxf")), 0),
                DrawingOutcome.failed("bad.dxf", "bad.dxf:17: LINE 2F: group 10 value 'abc' is not a number", 0),
                DrawingOutcome.of(Report.of(Fixtures.frame("b.dxf", 0, true)), 0));
        StringWriter w = new StringWriter();
        // a wide terminal: each drawing's message stays on its row
        new ConsoleReport(UnitSystem.METRIC, false, false, false, false, 200).printOutcomes(outcomes, new PrintWriter(w));
        String s = w.toString();
        String table = s.substring(s.indexOf("Drawings\n"), s.indexOf("All 2 drawings together"));
        List<String> rows = table.lines().skip(3).filter(l -> !l.isBlank()).toList();
        assertEquals(3, rows.size(), table);
        assertTrue(rows.get(0).contains("a.dxf") && rows.get(0).contains(" ok "), rows.get(0));
        assertTrue(rows.get(1).contains(" failed ") && rows.get(1).contains("is not a number"), rows.get(1));
        assertTrue(rows.get(2).contains(" incomplete "), rows.get(2));
        assertTrue(s.contains("1 of 3 drawings could not be read, not in these totals"), s);
        StringWriter q = new StringWriter();
        new ConsoleReport(UnitSystem.METRIC, false, true).printOutcomes(outcomes, new PrintWriter(q));
        List<String> lines = q.toString().lines().toList();
        assertEquals(4, lines.size(), q.toString());
        assertTrue(lines.get(1).startsWith("bad.dxf: FAILED (bad.dxf:17:"), lines.get(1));
    }
}
