package org.linemass.reports.html;

import org.linemass.engine.result.DrawingResult;
import org.linemass.engine.result.Finding;
import org.linemass.engine.result.LayerResult;
import org.linemass.engine.result.MarkResult;
import org.linemass.engine.result.SectionUse;
import org.linemass.engine.result.Totals;
import org.linemass.geometry.Vec3;
import org.linemass.reports.FindingGroups;
import org.linemass.reports.UnitSystem;

/**
 * The tables of the HTML report (totals, bill of materials, layers, findings, sections used) in
 * the chosen units; every cell is escaped. Finding rows carry ids {@code <prefix>finding-n} and
 * link to the picture's markers {@code <prefix>marker-n}.
 */
final class HtmlTables {

    private final UnitSystem units;

    HtmlTables(UnitSystem units) {
        this.units = units;
    }

    void totals(StringBuilder s, Totals t) {
        s.append("<table class=\"totals\">\n");
        String length = units.longLengthReadable(t.lengthM());
        String drawn = units.longLengthReadable(t.drawnLengthM());
        // only when the difference shows at the printed precision
        row(s, "Length [" + units.longUnit() + "]", length
                + (!drawn.equals(length) ? " (drawn " + drawn + "; material drawn twice counted once)" : ""));
        row(s, "Mass [" + units.massUnit() + "]", t.massKg() == null ? "unknown: no layer has a section"
                : units.massReadable(t.massKg()) + (t.massComplete() ? "" : " (only the layers that have a section)"));
        Vec3 g = t.centroidM();
        int extra = units.extraDecimalsFor(t.lengthM());
        row(s, "Centre of gravity [" + units.longUnit() + "]", g == null ? "unknown" : point(g, extra));
        Vec3 lc = t.lengthCentroidM();
        row(s, "Length centroid [" + units.longUnit() + "]", lc == null ? "none" : point(lc, extra));
        s.append("</table>\n");
    }

    String point(Vec3 g) {
        return point(g, 0);
    }

    /** "x .., y .., z .." in the long unit with {@code extra} more decimals than usual. */
    String point(Vec3 g, int extra) {
        return "x " + units.longLength(g.x(), extra) + ", y " + units.longLength(g.y(), extra) + ", z "
                + units.longLength(g.z(), extra);
    }

    static void row(StringBuilder s, String name, String value) {
        s.append("<tr><th>").append(Html.escape(name)).append("</th><td>").append(Html.escape(value))
                .append("</td></tr>\n");
    }

    void bom(StringBuilder s, DrawingResult r) {
        s.append("<h3>Bill of materials</h3>\n");
        if (r.groups().isEmpty()) {
            s.append("<p>No pieces.</p>\n");
            return;
        }
        s.append("<table class=\"data\">\n<tr><th>mark</th><th>qty</th><th>section</th><th>material</th>")
                .append("<th>cut length each [").append(units.cutUnit()).append("]</th><th>bends each</th>")
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
            cell(s, units.cutLength(m.lengthEachM()), true);
            cell(s, Integer.toString(m.bendsEach()), true);
            cell(s, units.massReadable(m.massEachKg()), true);
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

    void layers(StringBuilder s, DrawingResult r) {
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

    /**
     * The findings table. Alike findings ({@link FindingGroups}) get one row saying how many there
     * are, on which marks, and what they say, with a button that shows their own rows (hidden until
     * then; the report's script also opens them when a marker links to one). A finding unlike any
     * other is one row as it always was.
     */
    void findings(StringBuilder s, DrawingResult r, String ids) {
        s.append("<h3>Findings</h3>\n");
        if (r.findings().isEmpty()) {
            s.append("<p>No drawing defects found.</p>\n");
            return;
        }
        String lu = units.longUnit();
        s.append("<table class=\"data findings\">\n<tr><th>#</th><th>severity</th><th>kind</th><th>x [").append(lu)
                .append("]</th><th>y [").append(lu).append("]</th><th>z [").append(lu).append("]</th><th>size [").append(units.shortUnit()).append("]</th><th>layer</th><th>entities (line:handle)</th>")
                .append("<th>message</th></tr>\n");
        int g = 0;
        for (FindingGroups.Group group : FindingGroups.of(r)) {
            if (group.count() == 1) {
                int n = group.numbers().get(0);
                findingRow(s, r.findings().get(n - 1), n, ids, null, units.message(r.findings().get(n - 1).message()));
                continue;
            }
            g++;
            String gid = ids + "group-" + g;
            s.append("<tr id=\"").append(gid).append("\" class=\"group ").append(group.severity().jsonName())
                    .append("\"><td>&times;").append(group.count()).append("</td>");
            cell(s, group.severity().jsonName(), false);
            cell(s, group.kind(), false);
            s.append("<td></td><td></td><td></td>");
            cell(s, units.defectSize(group.sizeM()), true);
            cell(s, String.join(", ", group.layers()), false);
            s.append("<td></td><td><strong>").append(Html.escape(group.headline())).append("</strong>: ")
                    .append(Html.escape(units.message(group.message()))).append(" <button type=\"button\" class=\"open-group\" "
                            + "aria-expanded=\"false\" data-count=\"").append(group.count()).append("\" data-group=\"").append(gid)
                    .append("\">list the ")
                    .append(group.count()).append("</button></td></tr>\n");
            for (int n : group.numbers()) {
                findingRow(s, r.findings().get(n - 1), n, ids, gid, "");
            }
        }
        s.append("</table>\n");
    }

    /** One finding's row; a member of a group ({@code group} not null) is hidden and leaves its message to the group's row. */
    private void findingRow(StringBuilder s, Finding f, int n, String ids, String group, String message) {
        s.append("<tr id=\"").append(ids).append("finding-").append(n).append("\" class=\"")
                .append(f.severity().jsonName()).append(group == null ? "\"" : " member\" data-group=\"" + group
                        + "\" hidden").append("><td>");
        if (f.atM() != null && f.atM().isFinite()) {
            s.append("<a href=\"#").append(ids).append("marker-").append(n).append("\" title=\"show in the picture\">")
                    .append(n).append("</a>");
        } else {
            s.append(n);
        }
        s.append("</td>");
        cell(s, f.severity().jsonName(), false);
        cell(s, f.kind(), false);
        Vec3 at = f.atM();
        cell(s, at == null ? "" : units.longLength(at.x()), true);
        cell(s, at == null ? "" : units.longLength(at.y()), true);
        cell(s, at == null ? "" : units.longLength(at.z()), true);
        cell(s, units.defectSize(f.sizeM()), true);
        cell(s, f.layer(), false);
        StringBuilder refs = new StringBuilder();
        f.entities().forEach(e -> refs.append(refs.length() == 0 ? "" : " ").append(e.line())
                .append(e.handle() == null || e.handle().isEmpty() ? "" : ":" + e.handle()));
        cell(s, refs.toString(), false);
        cell(s, message, false);
        s.append("</tr>\n");
    }

    void sections(StringBuilder s, DrawingResult r) {
        s.append("<h3>Sections used and where their data come from</h3>\n");
        if (r.sections().isEmpty()) {
            s.append("<p>No section was assigned, so no mass was computed.</p>\n");
            return;
        }
        s.append("<table class=\"data\">\n<tr><th>section</th><th>description</th><th>material</th>")
                .append("<th>mass per length [").append(units.massUnit()).append('/').append(units.longUnit())
                .append("]</th><th>diameter [").append(units.shortUnit()).append("]</th><th>source</th></tr>\n");
        double perLong = units.isImperial() ? 0.3048 / 0.45359237 : 1.0;
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

    static void cell(StringBuilder s, String text, boolean numeric) {
        s.append(numeric ? "<td class=\"n\">" : "<td>").append(Html.escape(text)).append("</td>");
    }
}
