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
    }
}
