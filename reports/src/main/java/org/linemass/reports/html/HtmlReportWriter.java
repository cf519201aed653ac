package org.linemass.reports.html;

import java.io.IOException;
import java.io.Writer;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.linemass.engine.result.DrawingResult;
import org.linemass.engine.result.Finding;
import org.linemass.engine.result.LayerResult;
import org.linemass.engine.result.MarkResult;
import org.linemass.engine.result.PieceResult;
import org.linemass.engine.result.SectionUse;
import org.linemass.engine.result.Totals;
import org.linemass.geometry.Vec3;
import org.linemass.reports.Caution;
import org.linemass.reports.CombinedTotals;
import org.linemass.reports.Report;
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

    private final UnitSystem units;

    public HtmlReportWriter(UnitSystem units) {
        this.units = units;
    }

    public void write(List<Report> reports, Writer out) throws IOException {
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
            totals(s, CombinedTotals.of(all));
            if (!complete) {
                s.append("<p class=\"incomplete\">Some drawings were read incompletely: these totals leave part of "
                        + "the material out. See the drawings above.</p>\n");
            }
            s.append("</section>\n");
        }
        s.append("<section class=\"caution\">\n<h2>Caution</h2>\n<p>").append(Html.escape(Caution.TEXT))
                .append("</p>\n</section>\n<script>\n").append(SCRIPT).append("</script>\n</body>\n</html>\n");
        out.write(s.toString());
    }

    private void drawing(StringBuilder s, Report report, String ids) {
        DrawingResult r = report.result();
        s.append("<section class=\"drawing\">\n<h2>").append(Html.escape(r.drawing().file())).append("</h2>\n");
        s.append("<p class=\"meta\">DXF ").append(Html.escape(r.drawing().dxfVersion().isEmpty() ? "(no header)"
                : r.drawing().dxfVersion())).append(", units ").append(Html.escape(r.drawing().unit().symbol()))
                .append(" (").append(unitSource(r)).append("), ").append(r.pieces().size()).append(" pieces in ")
                .append(r.groups().size()).append(" marks, ").append(r.findings().size()).append(" findings</p>\n");
        if (!r.complete()) {
            s.append("<div class=\"incomplete\"><strong>Totals are incomplete.</strong> Part of the drawing was not "
                    + "counted:<ul>\n");
            for (String reason : r.incompleteReasons()) {
                s.append("<li>").append(Html.escape(reason)).append("</li>\n");
            }
            s.append("</ul></div>\n");
        }
        totals(s, r.totals());

        Map<String, Integer> markIndex = new LinkedHashMap<>();
        for (MarkResult m : r.groups()) {
            markIndex.putIfAbsent(m.mark(), markIndex.size());
        }
        for (PieceResult p : r.pieces()) {
            markIndex.putIfAbsent(p.mark() == null ? "" : p.mark(), markIndex.size());
        }
        List<View> views = View.choose(extent(report));
        boolean primary = true;
        for (View v : views) {
            s.append("<figure>\n<figcaption>").append(Html.escape(v.title))
                    .append(" &mdash; scroll to zoom, drag to pan, double-click to reset</figcaption>\n")
                    .append(SvgView.render(report, v, units, ids, markIndex, primary)).append("</figure>\n");
            primary = false;
        }
        legend(s, markIndex);
        bom(s, r);
        layers(s, r);
        findings(s, r, ids);
        sections(s, r);
        s.append("</section>\n");
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

    private void totals(StringBuilder s, Totals t) {
        s.append("<table class=\"totals\">\n");
        row(s, "Length [" + units.longUnit() + "]", units.longLength(t.lengthM())
                + (t.drawnLengthM() != t.lengthM() ? " (drawn " + units.longLength(t.drawnLengthM())
                        + "; material drawn twice counted once)" : ""));
        row(s, "Mass [" + units.massUnit() + "]", t.massKg() == null ? "unknown: no layer has a section"
                : units.mass(t.massKg()) + (t.massComplete() ? "" : " (only the layers that have a section)"));
        Vec3 g = t.centroidM();
        row(s, "Centre of gravity [" + units.longUnit() + "]", g == null ? "unknown" : point(g));
        Vec3 lc = t.lengthCentroidM();
        row(s, "Length centroid [" + units.longUnit() + "]", lc == null ? "none" : point(lc));
        s.append("</table>\n");
    }

    private String point(Vec3 g) {
        return "x " + units.longLength(g.x()) + ", y " + units.longLength(g.y()) + ", z " + units.longLength(g.z());
    }

    private static void row(StringBuilder s, String name, String value) {
        s.append("<tr><th>").append(Html.escape(name)).append("</th><td>").append(Html.escape(value))
                .append("</td></tr>\n");
    }

    private static void legend(StringBuilder s, Map<String, Integer> markIndex) {
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
            s.append("/></svg> ").append(e.getKey().isEmpty() ? "(no mark)" : Html.escape(e.getKey())).append("</li>\n");
        }
        s.append("<li><svg width=\"18\" height=\"18\" aria-hidden=\"true\"><g class=\"cog\"><circle cx=\"9\" cy=\"9\" "
                + "r=\"7\"/></g></svg> centre of gravity</li>\n</ul>\n");
    }

    private void bom(StringBuilder s, DrawingResult r) {
        s.append("<h3>Bill of materials</h3>\n");
        if (r.groups().isEmpty()) {
            s.append("<p>No pieces.</p>\n");
            return;
        }
        s.append("<table class=\"data\">\n<tr><th>mark</th><th>qty</th><th>section</th><th>material</th>")
                .append("<th>cut length each [").append(units.shortUnit()).append("]</th><th>bends each</th>")
                .append("<th>mass each [").append(units.massUnit()).append("]</th><th>mass total [")
                .append(units.massUnit()).append("]</th><th>layer</th></tr>\n");
        double mass = 0;
        int qty = 0;
        boolean allMass = true;
        for (MarkResult m : r.groups()) {
            s.append("<tr>");
            cell(s, m.mark(), false);
            cell(s, Integer.toString(m.quantity()), true);
            cell(s, m.section(), false);
            cell(s, m.material(), false);
            cell(s, units.shortLength(m.lengthEachM()), true);
            cell(s, Integer.toString(m.bendsEach()), true);
            cell(s, units.mass(m.massEachKg()), true);
            cell(s, units.mass(m.massTotalKg()), true);
            cell(s, m.layer(), false);
            s.append("</tr>\n");
            qty += m.quantity();
            if (m.massTotalKg() != null) {
                mass += m.massTotalKg();
            } else {
                allMass = false;
            }
        }
        s.append("<tr class=\"sum\"><td>total</td><td class=\"n\">").append(qty)
                .append("</td><td colspan=\"5\">").append(allMass && r.complete() ? "" : "incomplete: see above")
                .append("</td><td class=\"n\">").append(units.mass(mass)).append("</td><td></td></tr>\n</table>\n");
    }

    private void layers(StringBuilder s, DrawingResult r) {
        s.append("<h3>Layers</h3>\n");
        if (r.layers().isEmpty()) {
            s.append("<p>No counted layers.</p>\n");
            return;
        }
        String lu = units.longUnit();
        s.append("<table class=\"data\">\n<tr><th>layer</th><th>section</th><th>length [").append(lu)
                .append("]</th><th>mass [").append(units.massUnit()).append("]</th><th>pieces</th><th>centre of gravity [")
                .append(lu).append("]</th><th>length error bound [").append(units.shortUnit()).append("]</th></tr>\n");
        for (LayerResult l : r.layers()) {
            s.append("<tr>");
            cell(s, l.name(), false);
            cell(s, l.section(), false);
            cell(s, units.longLength(l.lengthM()), true);
            cell(s, units.mass(l.massKg()), true);
            cell(s, Integer.toString(l.pieces()), true);
            Vec3 g = l.centroidM() != null ? l.centroidM() : l.lengthCentroidM();
            cell(s, g == null ? "" : point(g), false);
            cell(s, units.shortLength(l.errorBoundM()), true);
            s.append("</tr>\n");
        }
        s.append("</table>\n");
    }

    private void findings(StringBuilder s, DrawingResult r, String ids) {
        s.append("<h3>Findings</h3>\n");
        if (r.findings().isEmpty()) {
            s.append("<p>No drawing defects found.</p>\n");
            return;
        }
        String lu = units.longUnit();
        s.append("<table class=\"data\">\n<tr><th>#</th><th>severity</th><th>kind</th><th>where [").append(lu)
                .append("]</th><th>size [").append(units.shortUnit()).append("]</th><th>layer</th><th>entities (line:handle)</th>")
                .append("<th>message</th></tr>\n");
        int n = 0;
        for (Finding f : r.findings()) {
            n++;
            s.append("<tr id=\"").append(ids).append("finding-").append(n).append("\" class=\"")
                    .append(f.severity().jsonName()).append("\"><td>");
            if (f.atM() != null && f.atM().isFinite()) {
                s.append("<a href=\"#").append(ids).append("marker-").append(n).append("\">").append(n).append("</a>");
            } else {
                s.append(n);
            }
            s.append("</td>");
            cell(s, f.severity().jsonName(), false);
            cell(s, f.kind(), false);
            cell(s, f.atM() == null ? "" : point(f.atM()), false);
            cell(s, units.shortLength(f.sizeM()), true);
            cell(s, f.layer(), false);
            StringBuilder refs = new StringBuilder();
            f.entities().forEach(e -> refs.append(refs.length() == 0 ? "" : " ").append(e.line())
                    .append(e.handle() == null || e.handle().isEmpty() ? "" : ":" + e.handle()));
            cell(s, refs.toString(), false);
            cell(s, f.message(), false);
            s.append("</tr>\n");
        }
        s.append("</table>\n");
    }

    private void sections(StringBuilder s, DrawingResult r) {
        s.append("<h3>Sections used and where their data come from</h3>\n");
        if (r.sections().isEmpty()) {
            s.append("<p>No section was assigned, so no mass was computed.</p>\n");
            return;
        }
        s.append("<table class=\"data\">\n<tr><th>section</th><th>description</th><th>material</th>")
                .append("<th>mass per length [").append(units.massUnit()).append('/').append(units.longUnit())
                .append("]</th><th>diameter [").append(units.shortUnit()).append("]</th><th>source</th></tr>\n");
        double perLong = units == UnitSystem.IMPERIAL ? 0.3048 / 0.45359237 : 1.0;
        for (SectionUse u : r.sections()) {
            s.append("<tr>");
            cell(s, u.section(), false);
            cell(s, u.description(), false);
            cell(s, u.material(), false);
            cell(s, UnitSystem.fixed(u.kgPerM() * perLong, 4), true);
            cell(s, units.shortLength(u.diameterM()), true);
            cell(s, u.source(), false);
            s.append("</tr>\n");
        }
        s.append("</table>\n");
    }

    private static void cell(StringBuilder s, String text, boolean numeric) {
        s.append(numeric ? "<td class=\"n\">" : "<td>").append(Html.escape(text)).append("</td>");
    }

    private static final String CSS = """
            body{font-family:system-ui,-apple-system,"Segoe UI",sans-serif;margin:1.5em;color:#1d1d1f;max-width:1100px}
            h1{font-size:1.4em}h2{font-size:1.2em;border-bottom:1px solid #ccc;padding-bottom:.2em;margin-top:1.6em}
            h3{font-size:1.05em;margin-top:1.4em}
            table{border-collapse:collapse;margin:.5em 0}th,td{padding:.25em .6em;border-bottom:1px solid #e2e2e2;text-align:left;vertical-align:top}
            td.n{text-align:right;font-variant-numeric:tabular-nums}tr.sum td{font-weight:bold;border-top:2px solid #999}
            table.totals th{font-weight:normal;color:#555}
            figure{margin:1em 0;border:1px solid #ccc;overflow:hidden}figcaption{font-size:.85em;color:#555;padding:.3em .6em}
            svg.view{display:block;max-width:100%;height:auto;cursor:grab;touch-action:none}
            svg.view .paper{fill:#fff}svg.view .piece{fill:none;stroke-width:2;vector-effect:non-scaling-stroke;stroke-linejoin:round}
            .cog circle{fill:#fff;stroke:#000;stroke-width:1.5}.cog path{fill:#000}
            .marker circle{stroke:#000;stroke-width:1}.marker text{font-size:11px;text-anchor:middle;font-weight:bold}
            .marker.error circle{fill:#c0392b}.marker.error text{fill:#fff}
            .marker.warning circle{fill:#f2c14e}.marker.warning text{fill:#000}
            .marker.info circle{fill:#dfe6ee}.marker.info text{fill:#000}
            .marker:target circle{stroke-width:4}
            .scale path{fill:none;stroke:#000;stroke-width:1.5}.scale text{font-size:12px}
            tr:target{background:#fff2b3}tr.error td:nth-child(2){color:#a32418;font-weight:bold}
            ul.legend{list-style:none;padding:0;display:flex;flex-wrap:wrap;gap:.4em 1.4em}
            .incomplete{background:#fff0e6;border:1px solid #d9822b;padding:.5em .8em}
            .caution{background:#f4f6f8;padding:.2em 1em;margin-top:2em}
            """;

    private static final String SCRIPT = """
            document.querySelectorAll('svg.view').forEach(function (svg) {
              var vb = svg.viewBox.baseVal, home = [vb.x, vb.y, vb.width, vb.height], drag = null, moved = false;
              function toView(e) {
                var r = svg.getBoundingClientRect();
                return [vb.x + (e.clientX - r.left) / r.width * vb.width, vb.y + (e.clientY - r.top) / r.height * vb.height];
              }
              svg.addEventListener('wheel', function (e) {
                e.preventDefault();
                var p = toView(e), f = e.deltaY < 0 ? 0.8 : 1.25;
                vb.x = p[0] - (p[0] - vb.x) * f; vb.y = p[1] - (p[1] - vb.y) * f;
                vb.width *= f; vb.height *= f;
              }, {passive: false});
              svg.addEventListener('pointerdown', function (e) { drag = [e.clientX, e.clientY]; moved = false; });
              window.addEventListener('pointerup', function () { drag = null; });
              svg.addEventListener('pointermove', function (e) {
                if (!drag) { return; }
                var r = svg.getBoundingClientRect(), dx = e.clientX - drag[0], dy = e.clientY - drag[1];
                if (Math.abs(dx) + Math.abs(dy) > 3) { moved = true; }
                vb.x -= dx / r.width * vb.width; vb.y -= dy / r.height * vb.height;
                drag = [e.clientX, e.clientY];
              });
              svg.addEventListener('click', function (e) { if (moved) { e.preventDefault(); moved = false; } }, true);
              svg.addEventListener('dblclick', function () { vb.x = home[0]; vb.y = home[1]; vb.width = home[2]; vb.height = home[3]; });
            });
            """;
}
