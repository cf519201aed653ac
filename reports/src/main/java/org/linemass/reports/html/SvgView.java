package org.linemass.reports.html;

import java.math.BigDecimal;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.linemass.engine.result.DrawingResult;
import org.linemass.engine.result.Finding;
import org.linemass.engine.result.PieceResult;
import org.linemass.geometry.Vec3;
import org.linemass.reports.Report;
import org.linemass.reports.UnitSystem;

/**
 * One SVG picture of a drawing in one {@link View}: every piece as a polyline coloured by its
 * mark (its sampled shape when the report has one, else the straight line from start to end), a
 * numbered marker at each finding linking to its row of the findings table, the centre of gravity
 * (or, without mass, the length centroid) as a quartered circle, and a scale bar. Picture units
 * are pixels of the initial view; strokes keep their width when zoomed.
 */
final class SvgView {

    /** Width and height of the area the drawing is fitted into, pixels. */
    private static final double FIT_W = 960;
    private static final double FIT_H = 560;
    private static final double PAD = 30;
    /** Smallest extent fitted, metres: a drawing of one point still gets a finite scale. */
    private static final double MIN_EXTENT_M = 1e-3;

    private SvgView() {
    }

    /**
     * @param ids prefix that makes element ids unique in a page with several drawings
     * @param markIndex colour index per mark
     */
    static String render(Report report, View view, UnitSystem units, String ids, Map<String, Integer> markIndex,
            boolean primary) {
        DrawingResult r = report.result();
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
        Vec3 cog = r.totals().centroidM() != null ? r.totals().centroidM() : r.totals().lengthCentroidM();
        double minU = Double.POSITIVE_INFINITY;
        double minV = Double.POSITIVE_INFINITY;
        double maxU = Double.NEGATIVE_INFINITY;
        double maxV = Double.NEGATIVE_INFINITY;
        List<Vec3> all = new ArrayList<>();
        lines.forEach(all::addAll);
        for (Finding f : r.findings()) {
            if (f.atM() != null) {
                all.add(f.atM());
            }
        }
        if (cog != null) {
            all.add(cog);
        }
        for (Vec3 p : all) {
            if (p.isFinite()) {
                minU = Math.min(minU, view.u(p));
                maxU = Math.max(maxU, view.u(p));
                minV = Math.min(minV, view.v(p));
                maxV = Math.max(maxV, view.v(p));
            }
        }
        if (minU > maxU) {
            return "<p class=\"empty\">Nothing to draw: the drawing has no counted geometry.</p>\n";
        }
        double du = Math.max(maxU - minU, MIN_EXTENT_M);
        double dv = Math.max(maxV - minV, MIN_EXTENT_M);
        double k = Math.min(FIT_W / du, FIT_H / dv);
        double w = (maxU - minU) * k + 2 * PAD;
        double h = (maxV - minV) * k + 2 * PAD + 40;
        Frame f = new Frame(view, minU, maxV, k);

        StringBuilder s = new StringBuilder();
        s.append("<svg class=\"view\" xmlns=\"http://www.w3.org/2000/svg\" viewBox=\"0 0 ")
                .append(num(w)).append(' ').append(num(h)).append("\" width=\"").append(num(w))
                .append("\" height=\"").append(num(h)).append("\" role=\"img\" aria-label=\"")
                .append(Html.escape(view.title)).append("\">\n");
        s.append("<rect class=\"paper\" x=\"-100000\" y=\"-100000\" width=\"200000\" height=\"200000\"/>\n");
        for (int i = 0; i < lines.size(); i++) {
            PieceResult p = owners.get(i);
            int idx = markIndex.getOrDefault(p.mark() == null ? "" : p.mark(), 0);
            s.append("<polyline class=\"piece\" points=\"");
            for (Vec3 pt : lines.get(i)) {
                s.append(num(f.x(pt))).append(',').append(num(f.y(pt))).append(' ');
            }
            s.setLength(s.length() - 1);
            s.append("\" stroke=\"").append(Palette.colour(idx)).append('"');
            if (!Palette.dash(idx).isEmpty()) {
                s.append(" stroke-dasharray=\"").append(Palette.dash(idx)).append('"');
            }
            s.append("><title>piece ").append(p.id()).append(", mark ").append(Html.escape(p.mark()))
                    .append(", layer ").append(Html.escape(p.layer())).append(", ")
                    .append(units.shortLength(p.lengthM())).append(' ').append(units.shortUnit())
                    .append("</title></polyline>\n");
        }
        if (cog != null && cog.isFinite()) {
            double x = f.x(cog);
            double y = f.y(cog);
            s.append("<g class=\"cog\" id=\"").append(ids).append("cog-").append(view.name().toLowerCase(Locale.ROOT))
                    .append("\"><title>").append(r.totals().centroidM() != null ? "centre of gravity" : "length centroid")
                    .append("</title><circle cx=\"").append(num(x)).append("\" cy=\"").append(num(y))
                    .append("\" r=\"8\"/><path d=\"M").append(num(x)).append(',').append(num(y)).append(" h8 a8,8 0 0,0 -8,-8 z M")
                    .append(num(x)).append(',').append(num(y)).append(" h-8 a8,8 0 0,0 8,8 z\"/></g>\n");
        }
        int n = 0;
        for (Finding fd : r.findings()) {
            n++;
            if (fd.atM() == null || !fd.atM().isFinite()) {
                continue;
            }
            String marker = ids + "marker-" + n + (primary ? "" : "-" + view.name().toLowerCase(Locale.ROOT));
            s.append("<a class=\"marker ").append(fd.severity().jsonName()).append("\" id=\"").append(marker)
                    .append("\" href=\"#").append(ids).append("finding-").append(n).append("\"><title>")
                    .append(n).append(": ").append(Html.escape(fd.message())).append("</title><circle cx=\"")
                    .append(num(f.x(fd.atM()))).append("\" cy=\"").append(num(f.y(fd.atM())))
                    .append("\" r=\"10\"/><text x=\"").append(num(f.x(fd.atM()))).append("\" y=\"")
                    .append(num(f.y(fd.atM()) + 4)).append("\">").append(n).append("</text></a>\n");
        }
        scaleBar(s, units, k, h);
        s.append("</svg>\n");
        return s.toString();
    }

    private static void scaleBar(StringBuilder s, UnitSystem units, double pxPerM, double h) {
        double unitM = units == UnitSystem.IMPERIAL ? 0.3048 : 1.0;
        double target = (FIT_W / 5) / pxPerM / unitM;
        double length = niceBelow(target);
        double px = length * unitM * pxPerM;
        double y = h - 18;
        s.append("<g class=\"scale\"><path d=\"M").append(num(PAD)).append(',').append(num(y - 5)).append(" v5 h")
                .append(num(px)).append(" v-5\"/><text x=\"").append(num(PAD + px + 6)).append("\" y=\"")
                .append(num(y)).append("\">").append(new BigDecimal(Double.toString(length)).stripTrailingZeros()
                        .toPlainString()).append(' ').append(units.longUnit()).append("</text></g>\n");
    }

    /** The largest of 1, 2, 5 times a power of ten not above {@code x} (x > 0). */
    static double niceBelow(double x) {
        double p = Math.pow(10, Math.floor(Math.log10(x)));
        double m = x / p;
        double nice = m >= 5 ? 5 : m >= 2 ? 2 : 1;
        return Double.parseDouble(String.format(Locale.ROOT, "%.12g", nice * p));
    }

    static String num(double v) {
        return UnitSystem.fixed(v, 2);
    }

    /** World to picture: u grows right, v grows up (picture y grows down). */
    private record Frame(View view, double minU, double maxV, double k) {
        double x(Vec3 p) {
            return PAD + (view.u(p) - minU) * k;
        }

        double y(Vec3 p) {
            return PAD + (maxV - view.v(p)) * k;
        }
    }
}
