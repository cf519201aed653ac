package org.linemass.app.serve;

import io.javalin.Javalin;
import io.javalin.http.Handler;
import java.io.IOException;
import java.io.InputStream;
import java.net.InetAddress;
import java.nio.charset.StandardCharsets;
import java.security.SecureRandom;
import java.util.Map;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.atomic.AtomicInteger;
import org.linemass.reports.UnitSystem;
import org.linemass.reports.html.HtmlReportWriter;

/**
 * The HTTP side of {@code linemass serve}. Routes:
 * <ul>
 * <li>{@code GET /}: the page; {@code GET /assets/NAME}: its script and style, looked up by name;
 * <li>{@code POST /api/sessions}: a new session for a tab; {@code DELETE /api/session}: end it;
 * <li>{@code GET /api/state}: the tab's drawings, their stage, totals, sections and picks;
 * <li>{@code POST /api/drawings?name=N} (the file as the body), {@code DELETE /api/drawings/ID},
 *     {@code POST /api/drawings/ID/cancel}, {@code GET /api/drawings/ID}: its report and picture;
 * <li>{@code POST /api/section-table?name=N}, {@code POST /api/assignments?name=N} (CSV bodies),
 *     {@code POST /api/picks} ({@code {"layer": L, "section": S}});
 * <li>{@code GET /api/download/KIND?session=S[&drawing=ID]}: the reports as files.
 * </ul>
 * The tab's session id travels in the {@value #SESSION_HEADER} header (downloads: the
 * {@code session} query parameter). Errors answer {@code {"error": "one line"}} with a 4xx status.
 * Every answer carries a strict Content-Security-Policy (scripts and styles only from this server,
 * no framing, no forms posting elsewhere).
 */
public final class WebServer implements AutoCloseable {

    static final String SESSION_HEADER = "X-Linemass-Session";
    static final String CSP = "default-src 'none'; script-src 'self'; style-src 'self'; img-src 'self' data:; "
            + "connect-src 'self'; form-action 'none'; frame-ancestors 'none'; base-uri 'none'";

    private final Javalin app;
    private final Sessions sessions;
    private final ServeLimits limits;
    private final ExecutorService workers;
    private final String token;
    private final Api api;
    private final Map<String, Asset> assets;
    private RequestGuard guard;

    /** A file the page loads: its type and content. */
    private record Asset(String type, byte[] content) {
    }

    private WebServer(AnalysisSetup setup, ServeLimits limits, UnitSystem units) {
        this.limits = limits;
        this.sessions = new Sessions(setup, limits);
        this.token = Sessions.randomId(new SecureRandom()) + Sessions.randomId(new SecureRandom());
        AtomicInteger n = new AtomicInteger();
        int threads = Math.max(1, Math.min(4, Runtime.getRuntime().availableProcessors()));
        this.workers = Executors.newFixedThreadPool(threads, r -> {
            Thread t = new Thread(r, "linemass-serve-worker-" + n.incrementAndGet());
            t.setDaemon(true);
            return t;
        });
        this.api = new Api(sessions, limits, workers, units);
        this.assets = Map.of(
                "page.js", new Asset("text/javascript; charset=utf-8", resource("page.js")),
                "page.css", new Asset("text/css; charset=utf-8", resource("page.css")),
                "report.js", new Asset("text/javascript; charset=utf-8",
                        HtmlReportWriter.script().getBytes(StandardCharsets.UTF_8)),
                "report.css", new Asset("text/css; charset=utf-8",
                        HtmlReportWriter.style().getBytes(StandardCharsets.UTF_8)));
        this.app = Javalin.create(config -> {
            config.showJavalinBanner = false;
            config.startupWatcherEnabled = false;
        });
        routes();
    }

    /**
     * Starts a server on {@code host}:{@code port} (port 0: any free port; see {@link #port()}).
     *
     * @throws IOException when the address cannot be resolved or the port is taken
     */
    public static WebServer start(String host, int port, AnalysisSetup setup, ServeLimits limits, UnitSystem units)
            throws IOException {
        InetAddress address = InetAddress.getByName(host);
        WebServer s = new WebServer(setup, limits, units);
        try {
            s.app.start(address.getHostAddress(), port);
        } catch (RuntimeException e) {
            s.workers.shutdownNow();
            throw new IOException("cannot listen on " + host + ":" + port + ": " + rootMessage(e), e);
        }
        s.guard = new RequestGuard(RequestGuard.hostsFor(address.getHostAddress(), s.port(),
                address.isLoopbackAddress()), s.token);
        return s;
    }

    /** The port the server listens on. */
    public int port() {
        return app.port();
    }

    /** This start's token, as written into the page. */
    String token() {
        return token;
    }

    ServeLimits limits() {
        return limits;
    }

    /** Stops serving and drops every session's drawings. */
    @Override
    public void close() {
        app.stop();
        workers.shutdownNow();
        sessions.closeAll();
    }

    private void routes() {
        app.before(ctx -> {
            ctx.header("Content-Security-Policy", CSP);
            ctx.header("X-Content-Type-Options", "nosniff");
            ctx.header("Referrer-Policy", "no-referrer");
            ctx.header("X-Frame-Options", "DENY");
            ctx.header("Cache-Control", "no-store");
            String method = ctx.method().name();
            if ("GET".equals(method) || "HEAD".equals(method)) {
                guard.host(ctx.header("Host"));
            } else {
                guard.change(ctx.header("Host"), ctx.header("Origin"), ctx.header(RequestGuard.TOKEN_HEADER));
            }
        });
        app.exception(Problem.class, (e, ctx) -> Api.error(ctx, e.status(), e.getMessage()));
        app.exception(Exception.class, (e, ctx) -> Api.error(ctx, 500, "internal error ("
                + e.getClass().getSimpleName() + "); please report it with the drawing"));
        app.get("/", ctx -> ctx.contentType("text/html; charset=utf-8").result(page()));
        app.get("/assets/{name}", ctx -> {
            Asset a = assets.get(ctx.pathParam("name"));
            if (a == null) {
                throw new Problem(404, "no such file");
            }
            ctx.contentType(a.type()).result(a.content());
        });
        app.post("/api/sessions", ctx -> Api.json(ctx, 201, Map.of("session", sessions.create().id)));
        app.delete("/api/session", ctx -> {
            sessions.close(ctx.header(SESSION_HEADER));
            ctx.status(204);
        });
        app.get("/api/state", in(api::state));
        app.post("/api/drawings", in(api::upload));
        app.get("/api/drawings/{id}", in(api::drawing));
        app.delete("/api/drawings/{id}", in(api::remove));
        app.post("/api/drawings/{id}/cancel", in(api::cancel));
        app.post("/api/section-table", in(api::sectionTable));
        app.post("/api/assignments", in(api::assignments));
        app.post("/api/picks", in(api::pick));
        app.get("/api/download/{kind}", ctx -> api.download(ctx, sessions.get(ctx.queryParam("session"))));
    }

    /** A handler that works on the session named in the request header. */
    private Handler in(Api.SessionHandler h) {
        return ctx -> h.handle(ctx, sessions.get(ctx.header(SESSION_HEADER)));
    }

    private byte[] page() {
        return new String(resource("page.html"), StandardCharsets.UTF_8).replace("{{TOKEN}}", token)
                .replace("{{MAX_UPLOAD}}", Long.toString(limits.maxUploadBytes()))
                .replace("{{CAUTION}}", org.linemass.reports.html.Html.escape(org.linemass.reports.Caution.TEXT))
                .getBytes(StandardCharsets.UTF_8);
    }

    private static byte[] resource(String name) {
        try (InputStream in = WebServer.class.getResourceAsStream(name)) {
            if (in == null) {
                throw new IllegalStateException("resource " + name + " is missing from the app jar");
            }
            return in.readAllBytes();
        } catch (IOException e) {
            throw new java.io.UncheckedIOException("cannot read resource " + name, e);
        }
    }

    private static String rootMessage(Throwable e) {
        Throwable t = e;
        while (t.getCause() != null && t.getCause() != t) {
            t = t.getCause();
        }
        return t.getMessage() == null ? t.getClass().getSimpleName() : t.getMessage();
    }
}
