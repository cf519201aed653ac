package org.linemass.app.serve;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.fail;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.net.URI;
import java.net.http.HttpClient;
import java.net.http.HttpRequest;
import java.net.http.HttpResponse;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.linemass.app.AppContext;
import org.linemass.app.Cli;
import org.linemass.app.EngineFieldIntegrator;
import org.linemass.app.EnginePipeline;
import org.linemass.app.EngineSectionCatalog;

/**
 * What a page of the server does over HTTP, for tests: reads the token from the page, opens a
 * session, sends requests with the same-origin Origin and the token, and waits for readings.
 * Also runs the command line on the same drawings, to compare with.
 */
final class PageClient {

    static final ObjectMapper JSON = new ObjectMapper();
    /** The longest a test waits for a drawing to be read, ms (the demo takes well under a second). */
    private static final long WAIT_MS = 60_000;

    final HttpClient http = HttpClient.newHttpClient();
    final String base;
    final String token;
    String session;

    PageClient(int port) throws IOException, InterruptedException {
        this.base = "http://127.0.0.1:" + port;
        HttpResponse<String> page = http.send(HttpRequest.newBuilder(URI.create(base + "/")).build(),
                HttpResponse.BodyHandlers.ofString());
        Matcher m = Pattern.compile("name=\"linemass-token\" content=\"([^\"]+)\"").matcher(page.body());
        if (!m.find()) {
            fail("no token in the page");
        }
        token = m.group(1);
    }

    PageClient open() throws IOException, InterruptedException {
        HttpResponse<String> r = send("POST", "/api/sessions", HttpRequest.BodyPublishers.noBody(), null);
        assertEquals(201, r.statusCode(), r.body());
        session = JSON.readTree(r.body()).get("session").asText();
        return this;
    }

    HttpRequest.Builder request(String path) {
        HttpRequest.Builder b = HttpRequest.newBuilder(URI.create(base + path)).header("Origin", base)
                .header(RequestGuard.TOKEN_HEADER, token);
        if (session != null) {
            b.header(WebServer.SESSION_HEADER, session);
        }
        return b;
    }

    HttpResponse<String> send(String method, String path, HttpRequest.BodyPublisher body, String type)
            throws IOException, InterruptedException {
        HttpRequest.Builder b = request(path).method(method, body);
        if (type != null) {
            b.header("Content-Type", type);
        }
        return http.send(b.build(), HttpResponse.BodyHandlers.ofString());
    }

    HttpResponse<String> get(String path) throws IOException, InterruptedException {
        return http.send(request(path).GET().build(), HttpResponse.BodyHandlers.ofString());
    }

    HttpResponse<byte[]> getBytes(String path) throws IOException, InterruptedException {
        return http.send(request(path).GET().build(), HttpResponse.BodyHandlers.ofByteArray());
    }

    HttpResponse<String> upload(String path, String name, byte[] content) throws IOException, InterruptedException {
        return send("POST", path + "?name=" + java.net.URLEncoder.encode(name, StandardCharsets.UTF_8),
                HttpRequest.BodyPublishers.ofByteArray(content), "application/octet-stream");
    }

    JsonNode state() throws IOException, InterruptedException {
        HttpResponse<String> r = get("/api/state");
        assertEquals(200, r.statusCode(), r.body());
        return JSON.readTree(r.body());
    }

    /** The state once no drawing is being read any more. */
    JsonNode settled() throws IOException, InterruptedException {
        long end = System.currentTimeMillis() + WAIT_MS;
        while (true) {
            JsonNode s = state();
            boolean busy = false;
            for (JsonNode d : s.get("drawings")) {
                busy |= "working".equals(d.get("status").asText());
            }
            if (!busy) {
                return s;
            }
            if (System.currentTimeMillis() > end) {
                fail("drawings still being read after " + WAIT_MS + " ms: " + s);
            }
            Thread.sleep(50);
        }
    }

    /** The repository checkout (the build passes it; the working folder otherwise). */
    static Path repo() {
        String p = System.getProperty("linemass.repo");
        return p == null ? Path.of("..").toAbsolutePath().normalize() : Path.of(p);
    }

    static Path demo(String file) {
        return repo().resolve("testdata/demo").resolve(file);
    }

    /** {@code linemass ARGS} in this JVM: its standard output; fails the test on a non-zero exit. */
    static String cli(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int code = Cli.run(new AppContext(new PrintWriter(out), new PrintWriter(err), new EnginePipeline(),
                new EngineSectionCatalog(), new EngineFieldIntegrator(), false), args);
        if (code != 0 && code != 1) {
            fail("linemass " + String.join(" ", args) + " exited " + code + ": " + err);
        }
        return out.toString();
    }

    static List<String> list(String... a) {
        return new ArrayList<>(List.of(a));
    }
}
