package org.linemass.app.serve;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.Test;
import org.linemass.app.PageSetup;
import org.linemass.engine.Analyzer;
import org.linemass.engine.result.DrawingResult;
import org.linemass.engine.result.Finding;
import org.linemass.engine.result.Severity;
import org.linemass.geometry.Vec3;
import org.linemass.importer.DxfImporter;
import org.linemass.reports.Report;
import org.linemass.reports.UnitSystem;
import org.linemass.reports.html.HtmlReportWriter;
import org.openqa.selenium.By;
import org.openqa.selenium.WebElement;
import org.openqa.selenium.OutputType;
import org.openqa.selenium.chrome.ChromeDriver;
import org.openqa.selenium.chrome.ChromeDriverService;
import org.openqa.selenium.chrome.ChromeOptions;

/**
 * The picture of the HTML report (also the local page's): fitted to the pieces, not to findings far
 * from them; no scale bar in the isometric view; and, in a real headless Chromium, readable at 800 px
 * wide (nothing wider than the window) and printed with its print style sheet (screenshots in
 * app/target/screenshots/).
 */
class ReportPictureTest {

    private static Report demo() throws Exception {
        PageSetup setup = PageSetup.defaults();
        var table = setup.readTable("t.csv", Files.readString(PageClient.demo("garden-planter-section-table.csv")));
        var rules = setup.readAssignments("a.csv", Files.readString(PageClient.demo("garden-planter-layers.csv")));
        return Report.of(Analyzer.analyze(DxfImporter.read(PageClient.demo("garden-planter.dxf"),
                setup.importOptions()), setup.settings(table, rules)));
    }

    private static double[] viewBox(String html) {
        Matcher m = Pattern.compile("<svg class=\"view\"[^>]*viewBox=\"([-0-9. ]+)\"").matcher(html);
        assertTrue(m.find(), "no picture");
        String[] p = m.group(1).trim().split(" ");
        return new double[] {Double.parseDouble(p[0]), Double.parseDouble(p[1]), Double.parseDouble(p[2]),
            Double.parseDouble(p[3])};
    }

    @Test
    void picture_fitsThePieces_notAFindingFarAway() throws Exception {
        Report r = demo();
        String plain = new HtmlReportWriter(UnitSystem.METRIC).picture(r, "");
        DrawingResult d = r.result();
        List<Finding> more = new ArrayList<>(d.findings());
        // a note 1 km away from a drawing of well under a metre
        more.add(new Finding("t_junction", Severity.INFO, new Vec3(1000, 1000, 0), null, "X", List.of(), null,
                "far away"));
        Report far = new Report(new DrawingResult(d.drawing(), d.entities(), d.layers(), d.pieces(), d.groups(), more,
                d.totals(), d.sections(), d.incompleteReasons()), r.pieceShapes());
        String withFar = new HtmlReportWriter(UnitSystem.METRIC).picture(far, "");
        double[] a = viewBox(plain);
        double[] b = viewBox(withFar);
        // same picture frame to the 2-decimal pixel coordinates the writer prints
        for (int i = 0; i < 4; i++) {
            assertEquals(a[i], b[i], 0.005, "view box component " + i);
        }
    }

    @Test
    void everyMark_isLabelledOnItsPieces_atAFixedScreenSize() throws Exception {
        Report r = demo();
        // the first view's picture only (the demo has elevations too, each labelled the same)
        String plain = new HtmlReportWriter(UnitSystem.METRIC).picture(r, "").split("<svg class=\"view\"")[1];
        for (var g : r.result().groups()) {
            // one label per piece of the mark (the demo has fewer pieces than the per-mark threshold)
            int labels = plain.split("<g class=\"mark-label fixed\"[^>]*><text x=\"4\" y=\"-4\">"
                    + Pattern.quote(g.mark()) + "</text>", -1).length - 1;
            assertEquals(g.quantity(), labels, "labels of mark " + g.mark());
        }
        assertTrue(HtmlReportWriter.style().contains(".mark-label text{font-size:11px"),
                "the labels are sized in screen pixels, kept while zooming by the fixed class");
    }

    @Test
    void isometricView_hasNoScaleBar() throws Exception {
        Path shelf = PageBrowserTest.corpus().resolve("v01_wire_shelf_lines_r2000_mm.dxf");
        assumeTrue(Files.isRegularFile(shelf), "../shared/corpus is not beside this checkout: test skipped");
        PageSetup setup = PageSetup.defaults();
        Report r = Report.of(Analyzer.analyze(DxfImporter.read(shelf, setup.importOptions()), setup.settings(null,
                List.of())));
        String html = new HtmlReportWriter(UnitSystem.METRIC).picture(r, "");
        String[] svgs = html.split("<svg class=\"view\"");
        int iso = 0;
        for (String svg : svgs) {
            if (svg.contains("aria-label=\"Isometric")) {
                iso++;
                assertTrue(!svg.contains("class=\"scale\""), "a scale bar in the isometric view");
            } else if (svg.contains("aria-label=")) {
                assertTrue(svg.contains("class=\"scale\""), "the orthographic views keep their scale bar");
            }
        }
        assertEquals(1, iso, "the wire shelf is drawn in an isometric view too");
    }

    @Test
    void report_at800px_andPrinted_inChromium() throws Exception {
        Optional<Path> chromium = PageBrowserTest.onPath("chromium");
        Optional<Path> driver = PageBrowserTest.onPath("chromedriver");
        assumeTrue(chromium.isPresent() && driver.isPresent(), "no chromium and chromedriver on the PATH (Debian "
                + "packages chromium and chromium-driver, which .ci/run installs): browser test skipped");
        Path dir = Files.createTempDirectory("linemass-report-browser");
        Path file = dir.resolve("report.html");
        StringWriter w = new StringWriter();
        new HtmlReportWriter(UnitSystem.METRIC).write(List.of(demo()), w);
        Files.writeString(file, w.toString());
        ChromeOptions options = new ChromeOptions();
        options.setBinary(chromium.get().toFile());
        options.addArguments("--headless", "--no-sandbox", "--disable-gpu", "--disable-quic", "--no-first-run",
                "--disable-background-networking", "--disable-component-update", "--disable-sync",
                "--user-data-dir=" + dir.resolve("profile"), "--window-size=800,1000", "--force-device-scale-factor=1");
        ChromeDriver b = new ChromeDriver(new ChromeDriverService.Builder().usingDriverExecutable(driver.get().toFile())
                .usingAnyFreePort().build(), options);
        try {
            b.get(file.toUri().toString());
            long inner = ((Number) b.executeScript("return document.documentElement.clientWidth")).longValue();
            long wide = ((Number) b.executeScript("return document.documentElement.scrollWidth")).longValue();
            assertTrue(inner <= 800, "window " + inner);
            assertTrue(wide <= inner, "the page is " + wide + " px wide in a window of " + inner + " px");
            save(b.getScreenshotAs(OutputType.BYTES), "report-800px.png");
            Map<String, Object> media = new HashMap<>();
            media.put("media", "print");
            b.executeCdpCommand("Emulation.setEmulatedMedia", media);
            String breakInside = (String) b.executeScript("return getComputedStyle(arguments[0]).breakInside",
                    b.findElement(By.tagName("figure")));
            assertEquals("avoid", breakInside, "printed pictures are not cut across pages");
            String layout = (String) b.executeScript("return getComputedStyle(arguments[0]).tableLayout",
                    b.findElement(By.tagName("table")));
            assertEquals("fixed", layout, "printed columns keep their width");
            save(b.getScreenshotAs(OutputType.BYTES), "report-print.png");
        } finally {
            b.quit();
        }
    }

    private static void save(byte[] png, String name) throws Exception {
        Path out = PageClient.repo().resolve("app/target/screenshots");
        Files.createDirectories(out);
        Files.write(out.resolve(name), png);
        if (Boolean.getBoolean("linemass.screenshot.update")) {
            Path docs = PageClient.repo().resolve("docs/images");
            Files.createDirectories(docs);
            Files.write(docs.resolve(name), png);
        }
    }

    /** The sections of the dense rebar cage v07 used in the README: bars by their layers' diameters. */
    static final String[] V07_SECTIONS = {"-a", "REBAR_MAIN*=RB16", "-a", "*_D8=RB8", "-a", "CAGE*=RB8", "-a",
        "*_D6=RB6", "-a", "CLIP*=round:3:steel"};

    private static ChromeDriver chromium(Path dir, int width, int height) {
        Optional<Path> chromium = PageBrowserTest.onPath("chromium");
        Optional<Path> driver = PageBrowserTest.onPath("chromedriver");
        assumeTrue(chromium.isPresent() && driver.isPresent(), "no chromium and chromedriver on the PATH (Debian "
                + "packages chromium and chromium-driver, which .ci/run installs): browser test skipped");
        ChromeOptions options = new ChromeOptions();
        options.setBinary(chromium.get().toFile());
        options.addArguments("--headless", "--no-sandbox", "--disable-gpu", "--disable-quic", "--no-first-run",
                "--disable-background-networking", "--disable-component-update", "--disable-sync",
                "--user-data-dir=" + dir.resolve("profile"), "--window-size=" + width + "," + height,
                "--force-device-scale-factor=1");
        return new ChromeDriver(new ChromeDriverService.Builder().usingDriverExecutable(driver.get().toFile())
                .usingAnyFreePort().build(), options);
    }

    /** Screen boxes (left, top, right, bottom) of the balloons and badges shown in the first picture. */
    private static List<double[]> shownBoxes(ChromeDriver b) {
        List<?> raw = (List<?>) b.executeScript("var svg = document.querySelector('svg.view'), out = [];"
                + "svg.querySelectorAll('a.marker:not([display]) circle.balloon, g.cluster rect').forEach(function (c) {"
                + "  var r = c.getBoundingClientRect(); out.push([r.left, r.top, r.right, r.bottom]); });"
                + "return out;");
        List<double[]> boxes = new ArrayList<>();
        for (Object o : raw) {
            List<?> l = (List<?>) o;
            boxes.add(new double[] {((Number) l.get(0)).doubleValue(), ((Number) l.get(1)).doubleValue(),
                ((Number) l.get(2)).doubleValue(), ((Number) l.get(3)).doubleValue()});
        }
        return boxes;
    }

    @Test
    void denseCage_markersClusterIntoBadges_openOnClick_alikeFindingsListedOnClick() throws Exception {
        Path v07 = PageBrowserTest.corpus().resolve("v07_rebar_cage_blocks_r2000_mm.dxf");
        assumeTrue(Files.isRegularFile(v07), "../shared/corpus is not beside this checkout: test skipped");
        Path dir = Files.createTempDirectory("linemass-dense-report");
        Path file = dir.resolve("v07-report.html");
        List<String> args = new ArrayList<>(List.of("check", v07.toString(), "--html", file.toString(), "-q"));
        args.addAll(List.of(V07_SECTIONS));
        PageClient.cli(args.toArray(new String[0]));
        ChromeDriver b = chromium(dir, 1280, 1400);
        try {
            b.get(file.toUri().toString());
            long markers = ((Number) b.executeScript(
                    "return document.querySelector('svg.view').querySelectorAll('a.marker').length")).longValue();
            List<double[]> boxes = shownBoxes(b);
            long badges = ((Number) b.executeScript(
                    "return document.querySelector('svg.view').querySelectorAll('g.cluster').length")).longValue();
            assertTrue(badges > 0, "no count badge on the dense cage");
            assertTrue(boxes.size() < markers / 2, boxes.size() + " balloons and badges for " + markers + " markers");
            // readable: no two balloons or badges overlap by more than a sliver (1 px of anti-aliased edge)
            int overlaps = 0;
            for (int i = 0; i < boxes.size(); i++) {
                for (int j = i + 1; j < boxes.size(); j++) {
                    double w = Math.min(boxes.get(i)[2], boxes.get(j)[2]) - Math.max(boxes.get(i)[0], boxes.get(j)[0]);
                    double h = Math.min(boxes.get(i)[3], boxes.get(j)[3]) - Math.max(boxes.get(i)[1], boxes.get(j)[1]);
                    if (w > 1 && h > 1) {
                        overlaps++;
                    }
                }
            }
            // a badge may sit on a lone balloon next to its cluster: a few, never the pile the fans made
            assertTrue(overlaps <= boxes.size() / 10, overlaps + " overlapping of " + boxes.size());
            save(b.getScreenshotAs(OutputType.BYTES), "report-dense.png");

            // a badge clicked zooms in to its markers: the view narrows and more markers come out
            double before = ((Number) b.executeScript(
                    "return document.querySelector('svg.view').viewBox.baseVal.width")).doubleValue();
            long shownBefore = ((Number) b.executeScript("return document.querySelector('svg.view')"
                    + ".querySelectorAll('a.marker:not([display])').length")).longValue();
            b.executeScript("arguments[0].dispatchEvent(new MouseEvent('click', {bubbles: true}))",
                    b.findElement(By.cssSelector("svg.view g.cluster")));
            double after = ((Number) b.executeScript(
                    "return document.querySelector('svg.view').viewBox.baseVal.width")).doubleValue();
            long shownAfter = ((Number) b.executeScript("return document.querySelector('svg.view')"
                    + ".querySelectorAll('a.marker:not([display])').length")).longValue();
            assertTrue(after < before, "zoomed from " + before + " to " + after);
            assertTrue(shownAfter > shownBefore || after < before / 2, shownBefore + " -> " + shownAfter);

            // the 76 tight bends of mark M02 are one row, their own rows one click away
            WebElement group = b.findElement(By.xpath("//tr[contains(@class, 'group')][.//strong[starts-with(., "
                    + "'76 tight bends on M02')]]"));
            String gid = group.getDomAttribute("id");
            List<WebElement> members = b.findElements(By.cssSelector("tr.member[data-group='" + gid + "']"));
            assertEquals(76, members.size());
            assertTrue(members.stream().noneMatch(WebElement::isDisplayed), "listed before the click");
            group.findElement(By.cssSelector("button.open-group")).click();
            assertTrue(members.stream().allMatch(WebElement::isDisplayed), "not listed after the click");
        } finally {
            b.quit();
        }
    }

    @Test
    void weldedMesh_22000Notes_pictureFittedToTheWire_fewBadges() throws Exception {
        // a 1 m square frame with 22,000 weld notes spread over it: the picture frame is the frame's alone
        Report r = demo();
        DrawingResult d = r.result();
        List<Finding> many = new ArrayList<>(d.findings());
        for (int i = 0; i < 22_000; i++) {
            double x = 0.6 * (i % 148) / 147.0;
            double y = 0.25 * (i / 148) / 148.0;
            many.add(new Finding("crossing", Severity.INFO, new Vec3(x, y, 0), null, "WIRES_D4", List.of(), null,
                    "a crossing, counted as one weld"));
        }
        Report dense = new Report(new DrawingResult(d.drawing(), d.entities(), d.layers(), d.pieces(), d.groups(), many,
                d.totals(), d.sections(), d.incompleteReasons()), r.pieceShapes());
        String plain = new HtmlReportWriter(UnitSystem.METRIC).picture(r, "");
        String withNotes = new HtmlReportWriter(UnitSystem.METRIC).picture(dense, "");
        double[] a = viewBox(plain);
        double[] b = viewBox(withNotes);
        for (int i = 0; i < 4; i++) {
            assertEquals(a[i], b[i], 0.005, "view box component " + i);
        }
        String first = withNotes.split("<svg class=\"view\"")[1];
        int badges = first.split("<g class=\"cluster ", -1).length - 1;
        int shown = first.split("<a class=\"marker ", -1).length - 1 - (first.split("display=\"none\"", -1).length - 1);
        // the plan view is about 960 x 400 px: at most one badge or balloon per 40 px reach
        assertTrue(badges > 0 && badges + shown < 960 * 600 / (40 * 40), badges + " badges, " + shown + " balloons");
    }
}
