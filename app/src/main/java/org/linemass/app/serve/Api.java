package org.linemass.app.serve;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import io.javalin.http.Context;
import java.io.IOException;
import java.io.InputStream;
import java.io.StringWriter;
import java.nio.charset.CharacterCodingException;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import java.util.concurrent.ExecutorService;
import org.linemass.engine.error.AnalysisException;
import org.linemass.engine.result.MarkResult;
import org.linemass.engine.section.Section;
import org.linemass.reports.FindingGroups;
import org.linemass.reports.Report;
import org.linemass.reports.UnitSystem;
import org.linemass.reports.html.HtmlReportWriter;
import org.linemass.reports.json.JsonReportWriter;

/**
 * The page's API on one session: uploads, picks, the state the page draws and the reports it
 * offers for download. Every string from a drawing or an upload goes out as JSON text or as an
 * escaped report; none is used as a file path.
 */
final class Api {

    /** A request handler on the session the request names. */
    @FunctionalInterface
    interface SessionHandler {
        void handle(Context ctx, Session session) throws Exception;
    }

    static final ObjectMapper JSON = new ObjectMapper();
    /** Longest display name kept from an upload, characters. */
    private static final int MAX_NAME = 200;

    private final Sessions sessions;
    private final ServeLimits limits;
    private final ExecutorService workers;
    private final UnitSystem units;
    private final Downloads downloads;

    Api(Sessions sessions, ServeLimits limits, ExecutorService workers, UnitSystem units) {
        this.sessions = sessions;
        this.limits = limits;
        this.workers = workers;
        this.units = units;
        this.downloads = new Downloads(units);
    }

    void state(Context ctx, Session s) throws IOException, AnalysisException {
        ObjectNode out = JSON.createObjectNode();
        ArrayNode list = out.putArray("drawings");
        for (LoadedDrawing d : s.drawings()) {
            ObjectNode o = list.addObject();
            synchronized (s) {
                o.put("id", d.id);
                o.put("name", d.name);
                o.put("status", d.status.name().toLowerCase(java.util.Locale.ROOT));
                o.put("stage", d.stage);
                o.put("revision", d.revision);
                o.put("bytes", d.bytes.length);
                if (d.message != null) {
                    o.put("message", d.message);
                }
                if (d.report != null) {
                    o.set("totals", document(List.of(d.report)).get("totals"));
                    o.put("findings", d.report.result().findings().size());
                }
            }
        }
        List<Report> reports = s.reports();
        if (!reports.isEmpty()) {
            JsonNode all = document(reports);
            ObjectNode combined = out.putObject("combined");
            combined.put("drawings", reports.size());
            combined.set("totals", all.get("totals"));
            combined.set("complete", all.get("complete"));
            combined.set("bill", bySection(reports));
        }
        ArrayNode sections = out.putArray("sections");
        for (Section sec : s.settings().sections().rows()) {
            ObjectNode o = sections.addObject();
            o.put("id", sec.id());
            o.put("description", sec.description());
            o.put("kg_per_m", sec.kgPerM());
        }
        ObjectNode picks = out.putObject("picks");
        s.picks().forEach(picks::put);
        out.put("section_table", s.tableName());
        out.put("assignments", s.rulesName());
        ObjectNode lim = out.putObject("limits");
        lim.put("max_upload_bytes", limits.maxUploadBytes());
        lim.put("max_drawings", limits.maxDrawings());
        out.put("units", units.name().toLowerCase(java.util.Locale.ROOT));
        json(ctx, 200, out);
    }

    /** The combined bill: per section, the pieces, cut length and mass over all drawings. */
    private static ArrayNode bySection(List<Report> reports) {
        Map<String, double[]> rows = new TreeMap<>();
        for (Report r : reports) {
            for (MarkResult m : r.result().groups()) {
                double[] a = rows.computeIfAbsent(m.section() == null ? "" : m.section(), k -> new double[4]);
                a[0] += m.quantity();
                a[1] += m.lengthEachM() * m.quantity();
                if (m.massTotalKg() != null) {
                    a[2] += m.massTotalKg();
                } else {
                    a[3] = 1;
                }
            }
        }
        ArrayNode out = JSON.createArrayNode();
        rows.forEach((section, a) -> {
            ObjectNode o = out.addObject();
            o.put("section", section);
            o.put("pieces", (long) a[0]);
            o.put("length_m", a[1]);
            if (a[3] == 0) {
                o.put("mass_kg", a[2]);
            } else {
                o.putNull("mass_kg");
            }
        });
        return out;
    }

    void upload(Context ctx, Session s) throws Problem, IOException {
        String name = displayName(ctx.queryParam("name"));
        byte[] bytes = body(ctx, limits.maxUploadBytes(), name);
        LoadedDrawing d = s.add(name, bytes, workers);
        json(ctx, 202, Map.of("id", d.id));
    }

    void drawing(Context ctx, Session s) throws Problem, IOException {
        LoadedDrawing d = s.find(id(ctx));
        Report report;
        int revision;
        synchronized (s) {
            report = d.report;
            revision = d.revision;
        }
        if (report == null) {
            throw new Problem(409, d.name + " has no report yet (" + d.stage + ")");
        }
        ObjectNode out = JSON.createObjectNode();
        out.put("id", d.id);
        out.put("revision", revision);
        out.set("report", document(List.of(report)));
        out.put("picture", new HtmlReportWriter(units).picture(report, "d" + d.id + "-"));
        // alike findings, so the page lists them as one entry each (the JSON report lists every finding)
        ArrayNode groups = out.putArray("finding_groups");
        for (FindingGroups.Group g : FindingGroups.of(report.result())) {
            ObjectNode o = groups.addObject();
            o.put("severity", g.severity().jsonName());
            o.put("kind", g.kind());
            o.put("headline", g.headline());
            o.put("message", g.message());
            ArrayNode n = o.putArray("numbers");
            g.numbers().forEach(n::add);
        }
        json(ctx, 200, out);
    }

    void remove(Context ctx, Session s) throws Problem {
        s.remove(id(ctx));
        ctx.status(204);
    }

    void cancel(Context ctx, Session s) throws Problem {
        s.cancel(id(ctx));
        ctx.status(204);
    }

    void sectionTable(Context ctx, Session s) throws Problem, IOException {
        String name = displayName(ctx.queryParam("name"));
        s.sectionTable(name, text(body(ctx, limits.maxUploadBytes(), name), name));
        ctx.status(204);
    }

    void assignments(Context ctx, Session s) throws Problem, IOException {
        String name = displayName(ctx.queryParam("name"));
        s.assignments(name, text(body(ctx, limits.maxUploadBytes(), name), name));
        ctx.status(204);
    }

    void pick(Context ctx, Session s) throws Problem, IOException {
        JsonNode body;
        try {
            body = JSON.readTree(body(ctx, 1 << 16, "the pick"));
        } catch (com.fasterxml.jackson.core.JacksonException e) {
            throw new Problem(400, "a pick must be JSON like {\"layer\": \"FRAME\", \"section\": \"RB8\"}");
        }
        if (body == null || !body.path("layer").isTextual() || !(body.path("section").isTextual()
                || body.path("section").isNull())) {
            throw new Problem(400, "a pick must be JSON like {\"layer\": \"FRAME\", \"section\": \"RB8\"}");
        }
        s.pick(body.get("layer").asText(), body.path("section").isNull() ? null : body.get("section").asText());
        ctx.status(204);
    }

    void download(Context ctx, Session s) throws Problem, IOException, AnalysisException {
        String drawing = ctx.queryParam("drawing");
        List<Report> reports;
        LoadedDrawing one = null;
        if (drawing == null || drawing.isEmpty()) {
            reports = s.reports();
        } else {
            one = s.find(number(drawing));
            synchronized (s) {
                if (one.report == null) {
                    throw new Problem(409, one.name + " has no report yet (" + one.stage + ")");
                }
                reports = List.of(one.report);
            }
        }
        Downloads.File f = downloads.make(ctx.pathParam("kind"), reports, one, s);
        ctx.header("Content-Disposition", "attachment; filename=\"" + f.name() + "\"");
        ctx.contentType(f.type()).result(f.content());
    }

    /** The JSON report document of {@code reports}, as the command line writes it. */
    static JsonNode document(List<Report> reports) throws IOException {
        StringWriter w = new StringWriter();
        JsonReportWriter.write(reports, w);
        return JSON.readTree(w.toString());
    }

    static void json(Context ctx, int status, Object body) throws IOException {
        ctx.status(status).contentType("application/json; charset=utf-8").result(JSON.writeValueAsBytes(body));
    }

    static void error(Context ctx, int status, String message) {
        try {
            json(ctx, status, Map.of("error", message == null ? "" : message));
        } catch (IOException e) {
            ctx.status(status).result(message == null ? "" : message);
        }
    }

    /** The request body, refused with 413 beyond {@code limit} bytes. */
    static byte[] body(Context ctx, long limit, String what) throws Problem, IOException {
        long declared = ctx.req().getContentLengthLong();
        if (declared > limit) {
            throw tooLarge(what, declared, limit);
        }
        try (InputStream in = ctx.req().getInputStream()) {
            byte[] b = in.readNBytes((int) Math.min(limit + 1, Integer.MAX_VALUE - 16));
            if (b.length > limit) {
                throw tooLarge(what, -1, limit);
            }
            return b;
        }
    }

    private static Problem tooLarge(String what, long size, long limit) {
        return new Problem(413, what + " is " + (size >= 0 ? ServeLimits.size(size) : "larger than the limit")
                + (size >= 0 ? ", more than the limit of " : " of ") + ServeLimits.size(limit)
                + " for one upload (start the server with a larger --max-upload)");
    }

    /** UTF-8 text of a CSV upload; 400 when it is not UTF-8. */
    static String text(byte[] b, String name) throws Problem {
        try {
            return StandardCharsets.UTF_8.newDecoder().onMalformedInput(CodingErrorAction.REPORT)
                    .onUnmappableCharacter(CodingErrorAction.REPORT).decode(java.nio.ByteBuffer.wrap(b)).toString();
        } catch (CharacterCodingException e) {
            throw new Problem(400, name + ": not UTF-8 text; save the CSV file as UTF-8");
        }
    }

    /** The file name the browser gave, for display only: its last part, without control characters. */
    static String displayName(String raw) {
        String n = raw == null ? "" : raw;
        n = n.substring(Math.max(n.lastIndexOf('/'), n.lastIndexOf('\\')) + 1);
        n = n.codePoints().filter(c -> !Character.isISOControl(c))
                .collect(StringBuilder::new, StringBuilder::appendCodePoint, StringBuilder::append).toString().strip();
        if (n.length() > MAX_NAME) {
            n = n.substring(0, MAX_NAME);
        }
        return n.isEmpty() ? "drawing.dxf" : n;
    }

    private static int id(Context ctx) throws Problem {
        return number(ctx.pathParam("id"));
    }

    private static int number(String text) throws Problem {
        try {
            return Integer.parseInt(text);
        } catch (NumberFormatException e) {
            throw new Problem(404, "no drawing '" + text + "' on this page");
        }
    }
}
