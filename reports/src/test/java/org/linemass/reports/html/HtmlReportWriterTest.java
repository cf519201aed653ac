package org.linemass.reports.html;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.StringWriter;
import java.util.ArrayList;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.linemass.engine.result.DrawingResult;
import org.linemass.engine.result.Finding;
import org.linemass.engine.result.FindingKind;
import org.linemass.engine.result.Severity;
import org.linemass.geometry.Vec3;
import org.linemass.reports.Fixtures;
import org.linemass.reports.Report;
import org.linemass.reports.UnitSystem;
import org.junit.jupiter.api.Test;

class HtmlReportWriterTest {

    private static String html(List<Report> reports) throws IOException {
        StringWriter w = new StringWriter();
        new HtmlReportWriter(UnitSystem.METRIC).write(reports, w);
        return w.toString();
    }

    @Test
    void write_scriptLayerName_rendersAsText() throws IOException {
        String s = html(List.of(Report.of(Fixtures.flatFrame("a.dxf"))));
        assertFalse(s.contains(Fixtures.SCRIPT_LAYER), "raw <script> from the drawing must not appear");
        assertTrue(s.contains("&lt;script&gt;alert(1)&lt;/script&gt;"));
        // the page's own single script block is the only one
        assertEquals(1, count(s, "<script>"));
    }

    @Test
    void write_selfContained_noNetworkReferences() throws IOException {
        String s = html(List.of(Report.of(Fixtures.frame("a.dxf", 0.3, false))));
        assertFalse(Pattern.compile("(src|href)\\s*=\\s*\"(https?:)?//").matcher(s).find(), "no external resources");
        assertFalse(s.contains("<link"));
        assertFalse(s.contains("@import"));
        assertTrue(s.startsWith("<!DOCTYPE html>"));
        assertTrue(s.trim().endsWith("</html>"));
    }

    @Test
    void write_findingMarkersAndRowsLinkBothWays() throws IOException {
        String s = html(List.of(Report.of(Fixtures.flatFrame("a.dxf"))));
        for (int n = 1; n <= 2; n++) {
            assertTrue(s.contains("id=\"marker-" + n + "\" href=\"#finding-" + n + "\""), "marker " + n);
            assertTrue(s.contains("<tr id=\"finding-" + n + "\""), "row " + n);
            assertTrue(s.contains("<a href=\"#marker-" + n + "\" title=\"show in the picture\">" + n + "</a>"),
                    "row link " + n);
        }
        // finding 3 has no place: a row but no marker
        assertTrue(s.contains("<tr id=\"finding-3\""));
        assertFalse(s.contains("id=\"marker-3\""));
        // every href="#x" points at an id that exists
        Matcher m = Pattern.compile("href=\"#([^\"]+)\"").matcher(s);
        while (m.find()) {
            assertTrue(s.contains("id=\"" + m.group(1) + "\""), "dangling link #" + m.group(1));
        }
    }

    @Test
    void write_flatDrawing_onePlanView_3dDrawing_addsElevation() throws IOException {
        assertEquals(1, count(html(List.of(Report.of(Fixtures.flatFrame("a.dxf")))), "<svg class=\"view\""));
        // ring lifted 0.3 m above bars spanning 1 m: z extent 30 % of the horizontal one
        String s = html(List.of(Report.of(Fixtures.frame("a.dxf", 0.3, false))));
        // extents 1 x 0.5 x 0.3 m: every extent at least 20 % of the largest, so an isometric view too;
        // plan and front elevation both show 2 m of bar, the tie keeps the plan first
        assertEquals(3, count(s, "<svg class=\"view\""));
        int plan = s.indexOf("Plan view");
        int front = s.indexOf("Front elevation");
        int iso = s.indexOf("Isometric view");
        assertTrue(plan >= 0 && plan < front && front < iso, "plan, front elevation, isometric in that order");
    }

    @Test
    void write_hasLegendCogScaleBarAndSections() throws IOException {
        String s = html(List.of(Report.of(Fixtures.flatFrame("a.dxf"))));
        assertTrue(s.contains("class=\"legend\""));
        assertTrue(s.contains("A <span class=\"note\">2 &times; B10, BARS</span>"), "legend names quantity, section, layer");
        assertTrue(s.contains("<g class=\"cog fixed\" id=\"cog-plan\""));
        // the centre of gravity's tooltip gives its coordinates in the report's units
        assertTrue(Pattern.compile("<title>centre of gravity: x [0-9.]+, y [0-9.]+, z [0-9.]+ m</title>").matcher(s).find());
        assertTrue(s.contains("href=\"#caution\""), "a short caution beside the totals links to the full one");
        assertTrue(s.contains("<g class=\"scale\">"));
        assertTrue(s.contains("BS 4449 nominal mass &lt;table 1&gt;"), "section source shown, escaped");
        assertTrue(s.contains("Caution"));
        assertEquals(3, count(s, "<polyline class=\"piece\""));
    }

    @Test
    void write_severalDrawings_uniqueIdsAndCombinedTotals() throws IOException {
        String s = html(List.of(Report.of(Fixtures.flatFrame("a.dxf")), Report.of(Fixtures.frame("b.dxf", 0, true))));
        assertTrue(s.contains("id=\"d1-finding-1\""));
        assertTrue(s.contains("id=\"d2-finding-1\""));
        assertTrue(s.contains("All drawings together"));
        assertTrue(s.contains("Totals are incomplete."));
        Matcher m = Pattern.compile(" id=\"([^\"]+)\"").matcher(s);
        java.util.Set<String> seen = new java.util.HashSet<>();
        while (m.find()) {
            assertTrue(seen.add(m.group(1)), "duplicate id " + m.group(1));
        }
    }

    @Test
    void write_markerSitsWhereTheFindingIs() throws IOException {
        String s = html(List.of(Report.of(Fixtures.flatFrame("a.dxf"))));
        // bar 1 runs from (0,0) to (1,0) m; the gap finding is at (1.0005, 0): 0.5 mm beyond its end
        Matcher bar = Pattern.compile("points=\"([0-9.]+),([0-9.]+) ([0-9.]+),([0-9.]+)\"[^>]*><title>piece 1,")
                .matcher(s);
        assertTrue(bar.find());
        double x0 = Double.parseDouble(bar.group(1));
        double x1 = Double.parseDouble(bar.group(3));
        double y1 = Double.parseDouble(bar.group(4));
        Matcher marker = Pattern.compile("id=\"marker-1\" href=\"#finding-1\" data-x=\"([0-9.]+)\" data-y=\"([0-9.]+)\"")
                .matcher(s);
        assertTrue(marker.find());
        double pxPerM = (x1 - x0) / 1.0;
        // positions are printed with 2 decimals: 0.01 px
        assertEquals(x1 + 0.0005 * pxPerM, Double.parseDouble(marker.group(1)), 0.011);
        assertEquals(y1, Double.parseDouble(marker.group(2)), 0.011);
    }

    @Test
    void write_manyNotesOnOneSpot_oneCountBadge_pictureNotGrown() throws IOException {
        // 30 notes at the drawing's corner (0, 0): fanned they would need a circle of 115 px radius,
        // far past the 40 px padding; clustered they are one badge and the picture keeps its frame
        DrawingResult base = Fixtures.flatFrame("a.dxf");
        String plain = html(List.of(Report.of(base)));
        List<Finding> findings = new ArrayList<>(base.findings());
        for (int i = 0; i < 30; i++) {
            findings.add(new Finding(FindingKind.T_JUNCTION, Severity.INFO, Vec3.ZERO, null, "BARS", List.of(), null,
                    "weld " + i));
        }
        DrawingResult r = new DrawingResult(base.drawing(), base.entities(), base.layers(), base.pieces(), base.groups(),
                findings, base.totals(), base.sections(), base.incompleteReasons());
        String s = html(List.of(Report.of(r)));
        Matcher vb = Pattern.compile("viewBox=\"(-?[0-9.]+) (-?[0-9.]+) ([0-9.]+) ([0-9.]+)\"").matcher(s);
        assertTrue(vb.find());
        Matcher vbPlain = Pattern.compile("viewBox=\"[^\"]+\"").matcher(plain);
        assertTrue(vbPlain.find());
        assertEquals(vbPlain.group(), vb.group(), "the notes' badge does not widen the picture");
        double x0 = Double.parseDouble(vb.group(1));
        double y0 = Double.parseDouble(vb.group(2));
        double x1 = x0 + Double.parseDouble(vb.group(3));
        double y1 = y0 + Double.parseDouble(vb.group(4));
        // the two findings of the frame stay markers with their balloons inside the picture
        Matcher m = Pattern.compile("id=\"marker-[0-9]+\" href=\"#finding-[0-9]+\" data-x=\"(-?[0-9.]+)\" "
                + "data-y=\"(-?[0-9.]+)\" transform=\"[^\"]+\"><title>.*?<circle class=\"balloon\" cx=\"(-?[0-9.]+)\" "
                + "cy=\"(-?[0-9.]+)\" r=\"([0-9.]+)\"").matcher(s);
        int shown = 0;
        while (m.find()) {
            shown++;
            double x = Double.parseDouble(m.group(1)) + Double.parseDouble(m.group(3));
            double y = Double.parseDouble(m.group(2)) + Double.parseDouble(m.group(4));
            double radius = Double.parseDouble(m.group(5));
            assertTrue(x - radius >= x0 && x + radius <= x1 && y - radius >= y0 && y + radius <= y1,
                    "balloon at " + x + "," + y + " outside " + vb.group());
        }
        assertEquals(base.findings().stream().filter(f -> f.atM() != null).count(), shown);
        assertEquals(30, s.split("display=\"none\"", -1).length - 1, "the 30 notes are hidden behind their badge");
        assertTrue(s.contains("<g class=\"cluster fixed info\""), "one badge for the notes");
        assertTrue(s.contains("&times;30</text></g>"), "the badge counts them");
    }

    @Test
    void niceBelow_picksOneTwoFive() {
        assertEquals(0.2, SvgView.niceBelow(0.25), 0.0);
        assertEquals(5.0, SvgView.niceBelow(9.9), 0.0);
        assertEquals(100.0, SvgView.niceBelow(100.0), 0.0);
    }

    @Test
    void escape_coversQuotesAndControls() {
        assertEquals("&amp;&lt;&gt;&quot;&#39;ab", Html.escape("&<>\"'a\u0000b"));
    }

    private static int count(String s, String what) {
        int n = 0;
        for (int i = s.indexOf(what); i >= 0; i = s.indexOf(what, i + 1)) {
            n++;
        }
        return n;
    }
}
