package org.linemass.app.serve;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import java.io.BufferedReader;
import java.io.InputStreamReader;
import java.io.OutputStream;
import java.net.Socket;
import java.net.URI;
import java.net.http.HttpRequest;
import java.net.http.HttpResponse;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.Callable;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.linemass.app.PageSetup;
import org.linemass.reports.UnitSystem;

/**
 * Every endpoint of the local page's server over real HTTP, with its errors and limits. The numbers
 * the page gets are compared with what {@code linemass check} prints for the same drawing and
 * sections (the demo drawing, whose section table and assignment file sit beside it): the server
 * runs the same engine on the same bytes, so the values must be equal to the last bit; a
 * difference would mean the page re-read or re-assigned something the command line did not.
 */
class ServeHttpTest {

    private WebServer server;
    private PageClient page;

    @TempDir
    Path tmp;

    @BeforeEach
    void start() throws Exception {
        server = WebServer.start("127.0.0.1", 0, PageSetup.defaults(), new ServeLimits(1 << 20, 3, 4 << 20, 3,
                3600_000L), UnitSystem.METRIC);
        page = new PageClient(server.port());
    }

    @AfterEach
    void stop() {
        server.close();
    }

    private static byte[] demo(String file) throws Exception {
        return Files.readAllBytes(PageClient.demo(file));
    }

    private JsonNode loadDemo(PageClient p) throws Exception {
        assertEquals(204, p.upload("/api/section-table", "garden-planter-section-table.csv",
                demo("garden-planter-section-table.csv")).statusCode());
        assertEquals(204, p.upload("/api/assignments", "garden-planter-layers.csv",
                demo("garden-planter-layers.csv")).statusCode());
        HttpResponse<String> r = p.upload("/api/drawings", "garden-planter.dxf", demo("garden-planter.dxf"));
        assertEquals(202, r.statusCode(), r.body());
        return p.settled();
    }

    private static List<String> demoArgs() {
        return PageClient.list("check", PageClient.demo("garden-planter.dxf").toString(), "--section-table",
                PageClient.demo("garden-planter-section-table.csv").toString(), "--assign-file",
                PageClient.demo("garden-planter-layers.csv").toString());
    }

    private static JsonNode cliJson(List<String> args) throws Exception {
        List<String> a = new ArrayList<>(args);
        a.addAll(List.of("--json", "-"));
        return PageClient.JSON.readTree(PageClient.cli(a.toArray(new String[0])));
    }

    @Test
    void page_hasStrictPolicyAndToken() throws Exception {
        HttpResponse<String> r = page.http.send(HttpRequest.newBuilder(URI.create(page.base + "/")).build(),
                HttpResponse.BodyHandlers.ofString());
        assertEquals(200, r.statusCode());
        assertEquals(WebServer.CSP, r.headers().firstValue("Content-Security-Policy").orElse(""));
        assertEquals("nosniff", r.headers().firstValue("X-Content-Type-Options").orElse(""));
        assertTrue(r.body().contains("content=\"" + server.token() + "\""));
        assertTrue(!r.body().contains("http://") && !r.body().contains("https://"), "the page loads nothing from elsewhere");
        assertTrue(r.body().contains("<script src=\"/assets/page.js\"></script>"));
    }

    @Test
    void assets_areLookedUpByNameNeverAsPaths() throws Exception {
        assertEquals(200, page.get("/assets/page.js").statusCode());
        assertEquals(200, page.get("/assets/report.css").statusCode());
        for (String p : List.of("/assets/..%2Fpom.xml", "/assets/%2e%2e%2f%2e%2e%2fpom.xml", "/assets/",
                "/assets/page.html", "/api/", "/pom.xml", "/assets/..%5Cpom.xml")) {
            HttpResponse<String> r = page.get(p);
            assertTrue(r.statusCode() == 404 || r.statusCode() == 400, p + " answered " + r.statusCode());
            assertTrue(!r.body().contains("<modelVersion>"), p + " served a file from disk");
        }
    }

    @Test
    void changes_needSameOriginAndToken() throws Exception {
        HttpRequest.Builder noOrigin = HttpRequest.newBuilder(URI.create(page.base + "/api/sessions"))
                .header(RequestGuard.TOKEN_HEADER, page.token).POST(HttpRequest.BodyPublishers.noBody());
        assertEquals(403, page.http.send(noOrigin.build(), HttpResponse.BodyHandlers.ofString()).statusCode());
        HttpRequest.Builder otherOrigin = HttpRequest.newBuilder(URI.create(page.base + "/api/sessions"))
                .header("Origin", "http://evil.example").header(RequestGuard.TOKEN_HEADER, page.token)
                .POST(HttpRequest.BodyPublishers.noBody());
        HttpResponse<String> r = page.http.send(otherOrigin.build(), HttpResponse.BodyHandlers.ofString());
        assertEquals(403, r.statusCode());
        assertTrue(r.body().contains("Origin 'http://evil.example'"), r.body());
        HttpRequest.Builder noToken = HttpRequest.newBuilder(URI.create(page.base + "/api/sessions"))
                .header("Origin", page.base).POST(HttpRequest.BodyPublishers.noBody());
        r = page.http.send(noToken.build(), HttpResponse.BodyHandlers.ofString());
        assertEquals(403, r.statusCode());
        assertTrue(r.body().contains("token"), r.body());
        HttpRequest.Builder wrongToken = HttpRequest.newBuilder(URI.create(page.base + "/api/sessions"))
                .header("Origin", page.base).header(RequestGuard.TOKEN_HEADER, page.token + "x")
                .POST(HttpRequest.BodyPublishers.noBody());
        assertEquals(403, page.http.send(wrongToken.build(), HttpResponse.BodyHandlers.ofString()).statusCode());
        assertEquals(0, sessionsOpen(), "no refused request opened a session");
        page.open();
        assertEquals(1, sessionsOpen());
    }

    private int sessionsOpen() throws Exception {
        java.lang.reflect.Field f = WebServer.class.getDeclaredField("sessions");
        f.setAccessible(true);
        return ((Sessions) f.get(server)).size();
    }

    @Test
    void foreignHostName_isRefused() throws Exception {
        // a page that rebinds its own name to this machine sends its own name as Host
        try (Socket s = new Socket("127.0.0.1", server.port())) {
            OutputStream o = s.getOutputStream();
            o.write(("GET / HTTP/1.1\r\nHost: evil.example:" + server.port() + "\r\nConnection: close\r\n\r\n")
                    .getBytes(StandardCharsets.US_ASCII));
            o.flush();
            String status = new BufferedReader(new InputStreamReader(s.getInputStream(), StandardCharsets.US_ASCII))
                    .readLine();
            assertTrue(status.contains(" 421 "), status);
        }
    }

    @Test
    void demo_totalsAndBillMatchTheCommandLine() throws Exception {
        page.open();
        JsonNode state = loadDemo(page);
        JsonNode d = state.get("drawings").get(0);
        assertEquals("done", d.get("status").asText(), d.toString());
        JsonNode cli = cliJson(demoArgs());
        assertEquals(cli.get("totals").get("mass_kg").asDouble(), d.get("totals").get("mass_kg").asDouble(), 0.0);
        assertEquals(cli.get("totals").get("length_m").asDouble(), state.get("combined").get("totals")
                .get("length_m").asDouble(), 0.0);
        HttpResponse<String> full = page.get("/api/drawings/" + d.get("id").asInt());
        JsonNode report = PageClient.JSON.readTree(full.body()).get("report");
        assertEquals(cli.get("groups"), report.get("groups"));
        assertEquals(cli.get("findings").size(), report.get("findings").size());
        assertTrue(PageClient.JSON.readTree(full.body()).get("picture").asText().contains("<svg class=\"view\""));

        Path bom = tmp.resolve("bom.csv");
        List<String> a = demoArgs();
        a.addAll(List.of("--bom-csv", bom.toString()));
        PageClient.cli(a.toArray(new String[0]));
        HttpResponse<byte[]> got = page.getBytes("/api/download/bom.csv?session=" + page.session);
        assertEquals(200, got.statusCode());
        assertTrue(got.headers().firstValue("Content-Disposition").orElse("").contains("garden-planter-bom.csv"));
        assertArrayEquals(Files.readAllBytes(bom), got.body());
    }

    @Test
    void pick_recomputesWithoutReadingAgain_asTheCommandLineWithThatRule() throws Exception {
        page.open();
        JsonNode before = loadDemo(page).get("drawings").get(0);
        HttpResponse<String> r = page.send("POST", "/api/picks", HttpRequest.BodyPublishers.ofString(
                "{\"layer\": \"WIRES_D4\", \"section\": \"PLANTER-D8\"}"), "application/json");
        assertEquals(204, r.statusCode(), r.body());
        JsonNode after = page.state().get("drawings").get(0);
        assertEquals(before.get("revision").asInt() + 1, after.get("revision").asInt());
        List<String> a = demoArgs();
        a.addAll(List.of("-a", "WIRES_D4=PLANTER-D8"));
        double cli = cliJson(a).get("totals").get("mass_kg").asDouble();
        assertNotEquals(before.get("totals").get("mass_kg").asDouble(), cli, "the pick changes the mass");
        assertEquals(cli, after.get("totals").get("mass_kg").asDouble(), 0.0);

        HttpResponse<String> saved = page.get("/api/download/assignments.csv?session=" + page.session);
        assertTrue(saved.body().endsWith("CLIPS_D3,PLANTER-D3\nWIRES_D4,PLANTER-D8\n"), saved.body());

        r = page.send("POST", "/api/picks", HttpRequest.BodyPublishers.ofString(
                "{\"layer\": \"WIRES_D4\", \"section\": \"NO-SUCH-BAR\"}"), "application/json");
        assertEquals(400, r.statusCode());
        assertTrue(r.body().contains("NO-SUCH-BAR"), r.body());
        r = page.send("POST", "/api/picks", HttpRequest.BodyPublishers.ofString("layer=WIRES_D4"), "text/plain");
        assertEquals(400, r.statusCode());
        assertEquals(cli, page.state().get("drawings").get(0).get("totals").get("mass_kg").asDouble(), 0.0,
                "a refused pick leaves the numbers as they were");
    }

    @Test
    void notADxf_isRefusedWithTheImportersLine_andTheServerGoesOn() throws Exception {
        page.open();
        page.upload("/api/drawings", "notes.dxf", "this is not a drawing\n".getBytes(StandardCharsets.UTF_8));
        JsonNode d = page.settled().get("drawings").get(0);
        assertEquals("refused", d.get("status").asText());
        assertTrue(d.get("message").asText().startsWith("notes.dxf"), d.toString());
        assertTrue(!d.get("message").asText().contains("\n"));
        assertEquals(202, page.upload("/api/drawings", "garden-planter.dxf", demo("garden-planter.dxf")).statusCode());
        assertEquals("done", page.settled().get("drawings").get(1).get("status").asText());
        assertEquals(204, page.send("DELETE", "/api/drawings/1", HttpRequest.BodyPublishers.noBody(), null)
                .statusCode());
        assertEquals(1, page.state().get("drawings").size());
        assertEquals(404, page.send("DELETE", "/api/drawings/1", HttpRequest.BodyPublishers.noBody(), null)
                .statusCode());
        assertEquals(204, page.send("POST", "/api/drawings/2/cancel", HttpRequest.BodyPublishers.noBody(), null)
                .statusCode(), "cancelling a drawing already read leaves it");
        assertEquals("done", page.state().get("drawings").get(0).get("status").asText());
    }

    @Test
    void badSectionCsv_isRefusedNamingFileAndLine() throws Exception {
        page.open();
        HttpResponse<String> r = page.upload("/api/section-table", "mine.csv",
                "section,shape,d_mm,density_kg_m3\nX1,round,abc,7850\n".getBytes(StandardCharsets.UTF_8));
        assertEquals(400, r.statusCode());
        String msg = PageClient.JSON.readTree(r.body()).get("error").asText();
        assertTrue(msg.startsWith("mine.csv") && msg.contains("line 2"), msg);
        r = page.upload("/api/assignments", "rules.csv", "layer;section\nA;B\n".getBytes(StandardCharsets.UTF_8));
        assertEquals(400, r.statusCode(), r.body());
        r = page.upload("/api/section-table", "latin1.csv", new byte[] {'a', (byte) 0xE9, '\n'});
        assertEquals(400, r.statusCode());
        assertTrue(r.body().contains("UTF-8"), r.body());
        assertTrue(page.state().get("section_table").isNull(), "a refused table is not used");
    }

    @Test
    void limits_tooLargeTooManyAndUnknownSession() throws Exception {
        page.open();
        HttpResponse<String> r = page.upload("/api/drawings", "big.dxf", new byte[(1 << 20) + 1]);
        assertEquals(413, r.statusCode());
        assertTrue(r.body().contains("1 MB"), r.body());
        for (int i = 0; i < 3; i++) {
            assertEquals(202, page.upload("/api/drawings", "d" + i + ".dxf", demo("garden-planter.dxf")).statusCode());
        }
        r = page.upload("/api/drawings", "d4.dxf", demo("garden-planter.dxf"));
        assertEquals(409, r.statusCode());
        assertTrue(r.body().contains("3 drawings"), r.body());
        page.settled();

        PageClient stranger = new PageClient(server.port());
        stranger.session = "not-a-session";
        r = stranger.get("/api/state");
        assertEquals(404, r.statusCode());
        assertTrue(r.body().contains("reload the page"), r.body());
        assertEquals(404, stranger.get("/api/download/bom.csv?session=nope").statusCode());

        new PageClient(server.port()).open();
        new PageClient(server.port()).open();
        HttpResponse<String> fourth = new PageClient(server.port()).send("POST", "/api/sessions",
                HttpRequest.BodyPublishers.noBody(), null);
        assertEquals(429, fourth.statusCode());
        assertEquals(204, page.send("DELETE", "/api/session", HttpRequest.BodyPublishers.noBody(), null).statusCode());
        assertEquals(404, page.get("/api/state").statusCode(), "an ended session holds nothing");
    }

    @Test
    void twoSessions_uploadingAtOnce_neverMix() throws Exception {
        PageClient a = page.open();
        PageClient b = new PageClient(server.port()).open();
        ExecutorService pool = Executors.newFixedThreadPool(2);
        try {
            Callable<JsonNode> ua = () -> {
                a.upload("/api/drawings", "first.dxf", demo("garden-planter.dxf"));
                return a.settled();
            };
            Callable<JsonNode> ub = () -> {
                b.upload("/api/drawings", "second.dxf", demo("garden-planter.dxf"));
                b.upload("/api/drawings", "third.dxf", demo("garden-planter.dxf"));
                return b.settled();
            };
            Future<JsonNode> fa = pool.submit(ua);
            Future<JsonNode> fb = pool.submit(ub);
            JsonNode sa = fa.get();
            JsonNode sb = fb.get();
            assertEquals(1, sa.get("drawings").size());
            assertEquals("first.dxf", sa.get("drawings").get(0).get("name").asText());
            assertEquals(2, sb.get("drawings").size());
            assertEquals("second.dxf", sb.get("drawings").get(0).get("name").asText());
        } finally {
            pool.shutdownNow();
        }
        assertEquals(204, a.send("POST", "/api/picks", HttpRequest.BodyPublishers.ofString(
                "{\"layer\": \"WIRES_D4\", \"section\": \"RB8\"}"), "application/json").statusCode());
        assertEquals(1, a.state().get("picks").size());
        assertEquals(0, b.state().get("picks").size(), "a pick on one tab does not reach the other");
    }

    @Test
    void downloads_allKindsAndUnknown() throws Exception {
        page.open();
        assertEquals(409, page.get("/api/download/bom.csv?session=" + page.session).statusCode());
        loadDemo(page);
        for (String k : List.of("bom.csv", "pieces.csv", "findings.csv", "report.json", "report.html")) {
            HttpResponse<byte[]> r = page.getBytes("/api/download/" + k + "?session=" + page.session);
            assertEquals(200, r.statusCode(), k);
            assertTrue(r.body().length > 100, k);
        }
        HttpResponse<byte[]> book = page.getBytes("/api/download/report.xlsx?session=" + page.session);
        assertEquals(200, book.statusCode());
        // an .xlsx file is a ZIP archive (ECMA-376 Part 2): it starts with the local file header "PK\3\4"
        assertArrayEquals(new byte[] {'P', 'K', 3, 4}, java.util.Arrays.copyOf(book.body(), 4));
        HttpResponse<byte[]> dxf = page.getBytes("/api/download/markup.dxf?session=" + page.session + "&drawing=1");
        assertEquals(200, dxf.statusCode());
        assertTrue(new String(dxf.body(), StandardCharsets.UTF_8).contains("LINEMASS_FINDINGS"));
        assertEquals(400, page.get("/api/download/markup.dxf?session=" + page.session).statusCode());
        assertEquals(404, page.get("/api/download/secret.txt?session=" + page.session).statusCode());
        assertEquals(404, page.get("/api/download/bom.csv?session=" + page.session + "&drawing=9").statusCode());
    }

    @Test
    void drawingStrings_reachThePageOnlyEscaped() throws Exception {
        page.open();
        String dxf = new String(demo("garden-planter.dxf"), StandardCharsets.UTF_8).replace("WIRES_D4",
                "<script>alert(1)</script>");
        page.upload("/api/drawings", "<img src=x onerror=alert(1)>.dxf", dxf.getBytes(StandardCharsets.UTF_8));
        JsonNode d = page.settled().get("drawings").get(0);
        assertEquals("done", d.get("status").asText(), d.toString());
        String picture = PageClient.JSON.readTree(page.get("/api/drawings/1").body()).get("picture").asText();
        assertTrue(picture.contains("&lt;script&gt;alert(1)&lt;/script&gt;"));
        assertTrue(!picture.contains("<script>"));
        HttpResponse<String> html = page.get("/api/download/report.html?session=" + page.session);
        assertTrue(html.headers().firstValue("Content-Disposition").orElse("").startsWith("attachment"));
        assertTrue(!html.body().contains("<script>alert"));
        String cd = page.get("/api/download/bom.csv?session=" + page.session + "&drawing=1").headers()
                .firstValue("Content-Disposition").orElse("");
        assertTrue(cd.matches("attachment; filename=\"[A-Za-z0-9._-]+\""), cd);
    }
}
