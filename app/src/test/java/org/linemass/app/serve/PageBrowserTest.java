package org.linemass.app.serve;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import com.fasterxml.jackson.databind.JsonNode;
import java.io.File;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.stream.Stream;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.linemass.app.PageSetup;
import org.linemass.reports.UnitSystem;
import org.openqa.selenium.By;
import org.openqa.selenium.Keys;
import org.openqa.selenium.OutputType;
import org.openqa.selenium.StaleElementReferenceException;
import org.openqa.selenium.WebElement;
import org.openqa.selenium.chrome.ChromeDriver;
import org.openqa.selenium.chrome.ChromeDriverService;
import org.openqa.selenium.chrome.ChromeOptions;
import org.openqa.selenium.support.ui.WebDriverWait;

/**
 * The local page in a real headless Chromium (Debian's chromium and chromium-driver, which
 * {@code .ci/run} installs; skipped with a message when they are not on the PATH): a drawing of
 * ../shared/corpus is chosen in the page, the totals shown are compared with the command line's
 * JSON report of the same drawing, a finding is clicked and must be highlighted and centred, a
 * section is picked and the mass must become the one the command line gives with that
 * assignment, the bill is downloaded and compared byte for byte with the command line's, and a
 * screenshot is saved (app/target/screenshots/; with -Dlinemass.screenshot.update=true also to
 * docs/images/, where the README shows it).
 */
class PageBrowserTest {

    private static final String DRAWING = "v01_wire_shelf_lines_r2000_mm.dxf";
    /** Layer of the wire shelf frame and the bar picked for it (a built-in 6 mm reinforcing bar). */
    private static final String LAYER = "SHELF_FRAME_D6";
    private static final String SECTION = "RB6";
    private static final Duration WAIT = Duration.ofSeconds(60);

    private static WebServer server;
    private static ChromeDriver browser;
    private static Path downloads;
    private static Path profile;

    static Optional<Path> onPath(String name) {
        String path = System.getenv("PATH");
        if (path == null) {
            return Optional.empty();
        }
        return Stream.of(path.split(File.pathSeparator)).map(d -> Path.of(d, name)).filter(Files::isExecutable)
                .findFirst();
    }

    static Path corpus() {
        return PageClient.repo().resolve("../shared/corpus").normalize();
    }

    @BeforeAll
    static void start() throws Exception {
        Optional<Path> chromium = onPath("chromium");
        Optional<Path> driver = onPath("chromedriver");
        assumeTrue(chromium.isPresent() && driver.isPresent(), "no chromium and chromedriver on the PATH (Debian "
                + "packages chromium and chromium-driver, which .ci/run installs): browser tests of the page skipped");
        assumeTrue(Files.isRegularFile(corpus().resolve(DRAWING)),
                "../shared/corpus is not beside this checkout: browser tests of the page skipped");
        server = WebServer.start("127.0.0.1", 0, PageSetup.defaults(), ServeLimits.DEFAULTS, UnitSystem.METRIC);
        downloads = Files.createTempDirectory("linemass-browser-downloads");
        profile = Files.createTempDirectory("linemass-browser-profile");
        ChromeOptions options = new ChromeOptions();
        options.setBinary(chromium.get().toFile());
        // a closed network: nothing in the background, no first-run work, an empty profile of its own
        options.addArguments("--headless", "--no-sandbox", "--disable-gpu", "--disable-quic", "--no-first-run",
                "--disable-background-networking", "--disable-component-update", "--disable-sync",
                "--user-data-dir=" + profile, "--window-size=1280,1500", "--force-device-scale-factor=1");
        Map<String, Object> prefs = new HashMap<>();
        prefs.put("download.default_directory", downloads.toString());
        prefs.put("download.prompt_for_download", false);
        options.setExperimentalOption("prefs", prefs);
        ChromeDriverService service = new ChromeDriverService.Builder().usingDriverExecutable(driver.get().toFile())
                .usingAnyFreePort().build();
        browser = new ChromeDriver(service, options);
        browser.manage().timeouts().scriptTimeout(WAIT);
    }

    @AfterAll
    static void stop() {
        if (browser != null) {
            browser.quit();
        }
        if (server != null) {
            server.close();
        }
    }

    private WebDriverWait waiting() {
        // the page redraws its tables after each answer: an element looked up a moment ago may be gone
        return (WebDriverWait) new WebDriverWait(browser, WAIT).ignoring(StaleElementReferenceException.class);
    }

    private void openWithDrawing() {
        browser.get("http://127.0.0.1:" + server.port() + "/");
        waiting().until(d -> "true".equals(d.findElement(By.tagName("body")).getDomAttribute("data-ready")));
        browser.findElement(By.id("files")).sendKeys(corpus().resolve(DRAWING).toString());
        waiting().until(d -> !d.findElements(By.cssSelector("section.drawing ol.findings li")).isEmpty());
    }

    private static JsonNode cliJson(String... extra) throws Exception {
        List<String> a = PageClient.list("check", corpus().resolve(DRAWING).toString(), "--json", "-");
        a.addAll(List.of(extra));
        return PageClient.JSON.readTree(PageClient.cli(a.toArray(new String[0])));
    }

    @Test
    void page_showsTotals_highlightsFindings_recomputes_downloads() throws Exception {
        openWithDrawing();
        JsonNode cli = cliJson();
        WebElement length = browser.findElement(By.id("combined-length"));
        double cliLength = cli.get("totals").get("length_m").asDouble();
        assertEquals(cliLength, Double.parseDouble(length.getDomAttribute("data-value")), 0.0,
                "the page shows the number of the JSON report (the same engine on the same bytes)");
        assertEquals(String.format(java.util.Locale.ROOT, "%.3f m", cliLength), length.getText());
        assertEquals(cli.get("findings").size(), browser.findElements(By.cssSelector("ol.findings li.finding")).size());

        // a finding: its row and its marker are highlighted, and the picture is centred on the marker
        WebElement first = browser.findElement(By.cssSelector("ol.findings li[data-n='1']"));
        first.click();
        WebElement marker = browser.findElement(By.id("d1-marker-1"));
        assertTrue(first.getDomAttribute("class").contains("hit"));
        assertTrue(marker.getDomAttribute("class").contains("hit"), marker.getDomAttribute("class"));
        Object centre = browser.executeScript("var s = arguments[0].ownerSVGElement.viewBox.baseVal;"
                + "return [s.x + s.width / 2, s.y + s.height / 2];", marker);
        List<?> c = (List<?>) centre;
        // the view box is centred on the marker's anchor to the picture's 2-decimal pixel coordinates
        assertEquals(Double.parseDouble(marker.getDomAttribute("data-x")), ((Number) c.get(0)).doubleValue(), 0.01);
        assertEquals(Double.parseDouble(marker.getDomAttribute("data-y")), ((Number) c.get(1)).doubleValue(), 0.01);

        // a piece: its details
        browser.executeScript("arguments[0].dispatchEvent(new MouseEvent('click', {bubbles: true}))",
                browser.findElement(By.cssSelector("polyline.piece[data-piece='1']")));
        assertTrue(browser.findElement(By.cssSelector(".piece-info h3")).getText().startsWith("Piece 1"));

        // a section for one layer: the mass is the command line's with the same assignment
        WebElement pick = browser.findElement(By.cssSelector("input.pick[data-layer='" + LAYER + "']"));
        pick.clear();
        pick.sendKeys(SECTION, Keys.TAB);
        waiting().until(d -> !d.findElement(By.id("combined-mass")).getText().equals("no section"));
        JsonNode picked = cliJson("-a", LAYER + "=" + SECTION);
        double cliMass = picked.get("totals").get("mass_kg").asDouble();
        waiting().until(d -> {
            String v = d.findElement(By.id("combined-mass")).getDomAttribute("data-value");
            return v != null && Double.parseDouble(v) == cliMass;
        });
        double cliLayer = 0;
        for (JsonNode l : picked.get("layers")) {
            if (LAYER.equals(l.get("name").asText())) {
                cliLayer = l.get("mass_kg").asDouble();
            }
        }
        final double expected = cliLayer;
        // the drawing's own tables are redrawn when its new report arrives, a moment after the totals
        waiting().until(d -> {
            String v = d.findElement(By.xpath("//input[@data-layer='" + LAYER
                    + "']/ancestor::tr/td[contains(@class, 'layer-mass')]")).getDomAttribute("data-value");
            return v != null && !v.equals("null") && Double.parseDouble(v) == expected;
        });

        // the bill, downloaded by the browser, is the command line's with that assignment
        Path cliBom = Files.createTempFile(downloads.getParent(), "cli-bom", ".csv");
        PageClient.cli("check", corpus().resolve(DRAWING).toString(), "-a", LAYER + "=" + SECTION, "--bom-csv",
                cliBom.toString());
        browser.findElement(By.cssSelector("#combined a[data-kind='bom.csv']")).click();
        Path got = downloads.resolve("v01_wire_shelf_lines_r2000_mm-bom.csv");
        waiting().until(d -> Files.isRegularFile(got));
        assertArrayEquals(Files.readAllBytes(cliBom), Files.readAllBytes(got));
        Files.delete(cliBom);

        screenshot("serve-page.png");
    }

    @Test
    void alikeFindings_oneEntry_listedOnClick_memberShownInThePicture() throws Exception {
        openWithDrawing();
        // the shelf's 40 T-junction welds say the same thing at 40 places: one entry for them
        WebElement group = browser.findElement(By.cssSelector("ol.findings li.group"));
        assertTrue(group.findElement(By.cssSelector(".headline")).getText().matches("[0-9]+ T-junctions on .*"),
                group.getText());
        WebElement members = group.findElement(By.cssSelector("ol.members"));
        assertTrue(!members.isDisplayed(), "the alike findings are one click away, not listed at first");
        group.findElement(By.cssSelector("button.open-group")).click();
        assertTrue(members.isDisplayed());
        WebElement member = members.findElement(By.cssSelector("li.finding"));
        String n = member.getDomAttribute("data-n");
        member.click();
        WebElement marker = browser.findElement(By.id("d1-marker-" + n));
        assertTrue(marker.getDomAttribute("class").contains("hit"));
        // a marker inside a count badge is brought out of it
        assertEquals(null, marker.getDomAttribute("display"), "marker " + n + " still hidden in its badge");
    }

    @Test
    void hostileLayerName_isShownAsText() throws Exception {
        Path dxf = downloads.resolve("hostile.dxf");
        Files.writeString(dxf, Files.readString(corpus().resolve(DRAWING)).replace(LAYER, "<img src=x id=pwn>"));
        browser.get("http://127.0.0.1:" + server.port() + "/");
        waiting().until(d -> "true".equals(d.findElement(By.tagName("body")).getDomAttribute("data-ready")));
        browser.findElement(By.id("files")).sendKeys(dxf.toString());
        waiting().until(d -> !d.findElements(By.cssSelector("section.drawing td.layer-name")).isEmpty());
        assertTrue(browser.findElements(By.id("pwn")).isEmpty(), "a layer name became markup");
        List<String> names = browser.findElements(By.cssSelector("td.layer-name")).stream().map(WebElement::getText)
                .toList();
        assertTrue(names.contains("<img src=x id=pwn>"), names.toString());
    }

    private static void screenshot(String name) throws Exception {
        browser.executeScript("window.scrollTo(0, 0)");
        byte[] png = browser.getScreenshotAs(OutputType.BYTES);
        Path out = PageClient.repo().resolve("app/target/screenshots");
        Files.createDirectories(out);
        Files.write(out.resolve(name), png);
        if (Boolean.getBoolean("linemass.screenshot.update")) {
            Path docs = PageClient.repo().resolve("docs/images");
            Files.createDirectories(docs);
            Files.write(docs.resolve(name), png);
        }
    }
}
