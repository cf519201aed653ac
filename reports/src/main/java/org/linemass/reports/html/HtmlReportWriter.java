package org.linemass.reports.html;

import java.io.IOException;
import java.io.Writer;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.linemass.engine.result.DrawingResult;
import org.linemass.engine.result.MarkResult;
import org.linemass.engine.result.PieceResult;
import org.linemass.engine.result.Totals;
import org.linemass.geometry.Vec3;
import org.linemass.reports.Caution;
import org.linemass.engine.result.CombinedTotals;
import org.linemass.reports.Report;
import org.linemass.reports.Words;
import org.linemass.reports.UnitSystem;

/**
 * Writes the HTML report: one self-contained page. Per drawing: a summary, the picture (plan, and
 * an elevation for a three-dimensional drawing, see {@link View#choose}) with a legend of marks,
 * then bill of materials, layer totals, findings (each row linked to its marker and back), and
 * the sections used with the source of their data. The page ends with the combined totals of
 * several drawings and the caution. A drawing read incompletely gets a warning box beside its
 * totals. All drawing strings are escaped with {@link Html#escape}.
 */
public final class HtmlReportWriter {

    /** Page style and the pan/zoom script, inlined into every page (nothing is fetched). */
    private static final String CSS = resource("report.css");
    private static final String SCRIPT = resource("report.js");

    private final UnitSystem units;
    private final HtmlTables tables;

    public HtmlReportWriter(UnitSystem units) {
        this.units = units;
        this.tables = new HtmlTables(units);
    }

    public void write(List<Report> reports, Writer out) throws IOException {
        write(reports, List.of(), out);
    }

    /**
     * Like {@link #write(List, Writer)}, with {@code extraSections} (ready, escaped HTML, such as
     * the cutting plan) placed after the drawings and before the caution.
     */
    public void write(List<Report> reports, List<String> extraSections, Writer out) throws IOException {
        StringBuilder s = new StringBuilder(1 << 16);
        String title = reports.size() == 1 ? "linemass report: " + reports.get(0).result().drawing().file()
                : "linemass report: " + reports.size() + " drawings";
        s.append("<!DOCTYPE html>\n<html lang=\"en\">\n<head>\n<meta charset=\"utf-8\">\n")
                .append("<meta name=\"viewport\" content=\"width=device-width, initial-scale=1\">\n")
                .append("<title>").append(Html.escape(title)).append("</title>\n<style>\n").append(CSS)
                .append("</style>\n</head>\n<body>\n<h1>").append(Html.escape(title)).append("</h1>\n");
        int d = 0;
        for (Report r : reports) {
            d++;
            drawing(s, r, reports.size() == 1 ? "" : "d" + d + "-");
        }
        if (reports.size() > 1) {
            List<Totals> all = new ArrayList<>();
            boolean complete = true;
            for (Report r : reports) {
                all.add(r.result().totals());
                complete &= r.result().complete();
            }
            s.append("<section class=\"combined\">\n<h2>All drawings together</h2>\n");
            tables.totals(s, CombinedTotals.of(all));
            if (!complete) {
                s.append("<p class=\"incomplete\">Some drawings were read incompletely: these totals leave part of "
                        + "the material out. See the drawings above.</p>\n");
            }
            s.append("</section>\n");
        }
        extraSections.forEach(s::append);
        s.append("<section class=\"caution\" id=\"caution\">\n<h2>Caution</h2>\n<p>").append(Html.escape(Caution.TEXT))
                .append("</p>\n</section>\n<script>\n").append(SCRIPT).append("</script>\n</body>\n</html>\n");
        out.write(s.toString());
    }

    private void drawing(StringBuilder s, Report report, String ids) {
        DrawingResult r = report.result();
        s.append("<section class=\"drawing\">\n<h2>").append(Html.escape(r.drawing().file())).append("</h2>\n");
        s.append("<p class=\"meta\">DXF ").append(Html.escape(r.drawing().dxfVersion().isEmpty() ? "(no header)"
                : r.drawing().dxfVersion())).append(", units ").append(Html.escape(r.drawing().unit().symbol()))
                .append(" (").append(unitSource(r)).append("), ").append(Words.count(r.pieces().size(), "piece"))
                .append(" in ").append(Words.count(r.groups().size(), "mark")).append(", ")
                .append(Words.count(r.findings().size(), "finding")).append("</p>\n");
        if (!r.complete()) {
            s.append("<div class=\"incomplete\"><strong>Totals are incomplete.</strong> Part of the drawing was not "
                    + "counted:<ul>\n");
            for (String reason : r.incompleteReasons()) {
                s.append("<li>").append(Html.escape(reason)).append("</li>\n");
            }
            s.append("</ul></div>\n");
        }
        tables.totals(s, r.totals());
        s.append("<p class=\"caution-short\"><strong>Estimates only:</strong> worked out from the drawn centre-lines "
                + "and the section data; not for lifting or structural decisions on their own. "
                + "<a href=\"#caution\">Read the caution</a>.</p>\n");

        picture(s, report, ids);
        tables.bom(s, r);
        BendingTables.write(s, r);
        tables.layers(s, r);
        tables.findings(s, r, ids);
        tables.sections(s, r);
        s.append("</section>\n");
    }

    /**
     * The picture of one drawing as in the report (legend, then one figure per view), for a page
     * that shows it among its own tables; {@code ids} prefixes every element id (markers are
     * {@code ids + "marker-" + n}, linking to {@code ids + "finding-" + n}). The page must load the
     * report's style and script ({@link #style()}, {@link #script()}).
     */
    public String picture(Report report, String ids) {
        StringBuilder s = new StringBuilder(1 << 14);
        picture(s, report, ids);
        return s.toString();
    }

    /** The report's style sheet, as inlined into every report. */
    public static String style() {
        return CSS;
    }

    /** The report's pan and zoom script, as inlined into every report. */
    public static String script() {
        return SCRIPT;
    }

    private void picture(StringBuilder s, Report report, String ids) {
        DrawingResult r = report.result();
        Map<String, Integer> markIndex = new LinkedHashMap<>();
        for (MarkResult m : r.groups()) {
            markIndex.putIfAbsent(m.mark(), markIndex.size());
        }
        for (PieceResult p : r.pieces()) {
            markIndex.putIfAbsent(p.mark() == null ? "" : p.mark(), markIndex.size());
        }
        List<List<Vec3>> lines = new ArrayList<>();
        List<PieceResult> owners = new ArrayList<>();
        for (PieceResult p : r.pieces()) {
            List<Vec3> shape = report.shape(p.id());
            if (shape.size() < 2 && p.startM() != null && p.endM() != null) {
                shape = List.of(p.startM(), p.endM());
            }
            if (shape.size() >= 2) {
                lines.add(shape);
                owners.add(p);
            }
        }
        legend(s, markIndex, r);
        List<View> views = View.choose(extent(report), lines);
        boolean primary = true;
        for (View v : views) {
            s.append("<figure>\n<figcaption>").append(Html.escape(v.title))
                    .append(" &mdash; scroll to zoom, drag to pan, double-click to reset</figcaption>\n")
                    .append(SvgView.render(r, lines, owners, v, units, ids, markIndex, primary)).append("</figure>\n");
            primary = false;
        }
    }

    private static Vec3 extent(Report report) {
        double[] min = {Double.POSITIVE_INFINITY, Double.POSITIVE_INFINITY, Double.POSITIVE_INFINITY};
        double[] max = {Double.NEGATIVE_INFINITY, Double.NEGATIVE_INFINITY, Double.NEGATIVE_INFINITY};
        for (PieceResult p : report.result().pieces()) {
            List<Vec3> pts = new ArrayList<>(report.shape(p.id()));
            if (p.startM() != null) {
                pts.add(p.startM());
            }
            if (p.endM() != null) {
                pts.add(p.endM());
            }
            for (Vec3 v : pts) {
                for (int a = 0; a < 3; a++) {
                    if (Double.isFinite(v.get(a))) {
                        min[a] = Math.min(min[a], v.get(a));
                        max[a] = Math.max(max[a], v.get(a));
                    }
                }
            }
        }
        if (min[0] > max[0]) {
            return Vec3.ZERO;
        }
        return new Vec3(max[0] - min[0], max[1] - min[1], max[2] - min[2]);
    }

    private String unitSource(DrawingResult r) {
        return switch (r.drawing().unitSource()) {
            case HEADER -> "from the file header";
            case OPTION -> "chosen on the command line";
            case ASSUMED -> "assumed: the file does not say";
        };
    }




    private static void legend(StringBuilder s, Map<String, Integer> markIndex, DrawingResult r) {
        Map<String, MarkResult> groups = new java.util.HashMap<>();
        r.groups().forEach(g -> groups.putIfAbsent(g.mark(), g));
        if (markIndex.isEmpty()) {
            return;
        }
        s.append("<ul class=\"legend\">\n");
        for (Map.Entry<String, Integer> e : markIndex.entrySet()) {
            int i = e.getValue();
            s.append("<li><svg width=\"34\" height=\"10\" aria-hidden=\"true\"><line x1=\"2\" y1=\"5\" x2=\"32\" y2=\"5\" "
                    + "stroke-width=\"3\" stroke=\"").append(Palette.colour(i)).append('"');
            if (!Palette.dash(i).isEmpty()) {
                s.append(" stroke-dasharray=\"").append(Palette.dash(i)).append('"');
            }
            s.append("/></svg> ").append(e.getKey().isEmpty() ? "(no mark)" : Html.escape(e.getKey()));
            MarkResult g = groups.get(e.getKey());
            if (g != null) {
                s.append(" <span class=\"note\">").append(g.quantity()).append(" &times; ")
                        .append(Html.escape(g.section() == null ? "no section" : g.section())).append(", ")
                        .append(Html.escape(g.layer())).append("</span>");
            }
            s.append("</li>\n");
        }
        s.append("<li><svg width=\"18\" height=\"18\" aria-hidden=\"true\"><g class=\"cog\" transform=\"translate(9,9)\">"
                + "<circle r=\"7\"/><path d=\"M0,0 h7 a7,7 0 0,0 -7,-7 z M0,0 h-7 a7,7 0 0,0 7,7 z\"/></g></svg> "
                + (r.totals().centroidM() != null ? "centre of gravity (CG)" : "length centroid (CG; no mass known)")
                + "</li>\n");
        for (String sev : r.findings().isEmpty() ? new String[0] : new String[] {"error", "warning", "info"}) {
            s.append("<li><svg width=\"22\" height=\"22\" aria-hidden=\"true\"><g class=\"marker ").append(sev)
                    .append("\"><circle class=\"balloon\" cx=\"11\" cy=\"11\" r=\"9\"/><text x=\"11\" y=\"15\">n</text>"
                            + "</g></svg> finding n: ").append(sev.equals("info") ? "note" : sev).append("</li>\n");
        }
        s.append("</ul>\n");
    }






    private static String resource(String name) {
        try (java.io.InputStream in = HtmlReportWriter.class.getResourceAsStream(name)) {
            if (in == null) {
                throw new IllegalStateException("resource " + name + " is missing from the reports jar");
            }
            return new String(in.readAllBytes(), java.nio.charset.StandardCharsets.UTF_8);
        } catch (IOException e) {
            throw new java.io.UncheckedIOException("cannot read resource " + name, e);
        }
    }
}
