package org.linemass.reports.html;

import java.math.BigDecimal;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.linemass.engine.result.DrawingResult;
import org.linemass.engine.result.Finding;
import org.linemass.engine.result.PieceResult;
import org.linemass.engine.result.Severity;
import org.linemass.geometry.Vec3;
import org.linemass.reports.UnitSystem;

/**
 * One SVG picture of a drawing in one {@link View}: every piece as a polyline coloured by its
 * mark, a marker at each finding (a ring exactly at the place, a leader line and a numbered
 * balloon placed by {@link MarkerLayout}) linking to its row of the findings table, the centre
 * of gravity (or, without mass, the length centroid) as a quartered circle whose tooltip gives
 * its coordinates, and a scale bar (not in the isometric view, where lengths are foreshortened).
 * The view is fitted to the pieces alone (markers outside them are reached by panning). Picture units are pixels of the initial view. When the page
 * is zoomed, strokes keep their width, and markers, the centre of gravity and the scale bar keep
 * their size on screen: their groups carry {@code data-x}/{@code data-y} anchors that the page's
 * script re-scales, and the scale bar is redrawn with a fitting length.
 */
final class SvgView {

    /** Width and height of the area the drawing is fitted into, pixels. */
    private static final double FIT_W = 960;
    private static final double FIT_H = 560;
    private static final double PAD = 40;
    /** Room below the drawing for the scale bar, pixels. */
    private static final double SCALE_ROOM = 40;
    /** Smallest extent fitted, metres: a drawing of one point still gets a finite scale. */
    private static final double MIN_EXTENT_M = 1e-3;
    /** Balloon radius, px: two digits fit; three or more get {@link #WIDE_BALLOON_R}. */
    private static final double BALLOON_R = 10;
    private static final double WIDE_BALLOON_R = 13;
    /** Notes (welds, junctions) get smaller balloons so errors and warnings stand out. */
    private static final double NOTE_BALLOON_R = 8;
    /** Height of the mark labels on the pieces, px on screen (the style sheet's font size). */
    static final int LABEL_PX = 11;
    /** Up to this many pieces every piece is labelled with its mark; beyond, one piece per mark. */
    static final int LABEL_EVERY_PIECE_UP_TO = 60;
    /** Ring drawn exactly at the finding's place, px. */
    private static final double RING_R = 5;
    /** Room kept between a balloon and the picture's edge, px. */
    private static final double EDGE_MARGIN_PX = 4;

    private SvgView() {
    }

    /**
     * @param lines the pieces to draw as polylines (world metres), one per entry of {@code owners}
     * @param ids prefix that makes element ids unique in a page with several drawings
     * @param markIndex colour index per mark
     * @param primary whether this is the first view (its markers carry the ids the table links to)
     */
    static String render(DrawingResult r, List<List<Vec3>> lines, List<PieceResult> owners, View view,
            UnitSystem units, String ids, Map<String, Integer> markIndex, boolean primary) {
        Vec3 cog = r.totals().centroidM() != null ? r.totals().centroidM() : r.totals().lengthCentroidM();
        double minU = Double.POSITIVE_INFINITY;
        double minV = Double.POSITIVE_INFINITY;
        double maxU = Double.NEGATIVE_INFINITY;
        double maxV = Double.NEGATIVE_INFINITY;
        // the view fits the geometry only: tens of thousands of notes, or a finding far from the wire,
        // must not shrink the drawing to a corner of a blank picture
        List<Vec3> all = new ArrayList<>();
        lines.forEach(all::addAll);
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
        // a drawing narrower than the fit box is centred in it
        double w = Math.max((maxU - minU) * k, FIT_W / 2) + 2 * PAD;
        double h = (maxV - minV) * k + 2 * PAD + SCALE_ROOM;
        double left = PAD + (w - 2 * PAD - (maxU - minU) * k) / 2;
        Frame f = new Frame(view, minU, maxV, k, left);

        StringBuilder body = new StringBuilder();
        pieces(body, lines, owners, f, units, markIndex);
        markLabels(body, lines, owners, f);
        if (cog != null && cog.isFinite()) {
            cog(body, r, cog, f, units, ids, view);
        }
        // balloons near the edge may reach past the padding: the picture grows to show them whole
        double[] reach = {0, 0, w, h};
        java.util.Set<Integer> grouped = new java.util.HashSet<>();
        for (org.linemass.reports.FindingGroups.Group g : org.linemass.reports.FindingGroups.of(r)) {
            if (g.count() > 1) {
                grouped.addAll(g.numbers());
            }
        }
        markers(body, r, f, ids, view, primary, reach, w, h, grouped, units);
        double x0 = reach[0];
        double y0 = reach[1];
        double vw = reach[2] - x0;
        double vh = reach[3] - y0;

        StringBuilder s = new StringBuilder();
        s.append("<svg class=\"view\" xmlns=\"http://www.w3.org/2000/svg\" viewBox=\"").append(num(x0)).append(' ')
                .append(num(y0)).append(' ').append(num(vw)).append(' ').append(num(vh)).append("\" width=\"")
                .append(num(vw)).append("\" height=\"").append(num(vh)).append("\" role=\"img\" aria-label=\"")
                .append(Html.escape(view.title)).append("\" data-px-per-m=\"").append(num(k))
                .append("\" data-units=\"").append(units.isImperial() ? "imperial" : "metric").append("\">\n");
        s.append("<rect class=\"paper\" x=\"-100000\" y=\"-100000\" width=\"200000\" height=\"200000\"/>\n");
        s.append(body);
        if (view != View.ISO) {
            // the isometric view foreshortens every axis: no single length per pixel holds in it
            scaleBar(s, units, k, x0, reach[3]);
        }
        s.append("</svg>\n");
        return s.toString();
    }

    private static void pieces(StringBuilder s, List<List<Vec3>> lines, List<PieceResult> owners, Frame f,
            UnitSystem units, Map<String, Integer> markIndex) {
        for (int i = 0; i < lines.size(); i++) {
            PieceResult p = owners.get(i);
            int idx = markIndex.getOrDefault(p.mark() == null ? "" : p.mark(), 0);
            s.append("<polyline class=\"piece\" data-piece=\"").append(p.id()).append("\" points=\"");
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
    }

    /**
     * The mark of each piece written beside it at a fixed screen size ({@value #LABEL_PX} px, kept
     * while zooming like the markers), halfway along its polyline; on a drawing of more
     * than {@value #LABEL_EVERY_PIECE_UP_TO} pieces only the first piece of each mark is labelled,
     * so the labels stay readable.
     */
    private static void markLabels(StringBuilder s, List<List<Vec3>> lines, List<PieceResult> owners, Frame f) {
        boolean every = lines.size() <= LABEL_EVERY_PIECE_UP_TO;
        java.util.Set<String> done = new java.util.HashSet<>();
        for (int i = 0; i < lines.size(); i++) {
            PieceResult p = owners.get(i);
            if (p.mark() == null || p.mark().isEmpty() || !every && !done.add(p.mark())) {
                continue;
            }
            double[] at = halfway(lines.get(i), f);
            if (at == null) {
                continue;
            }
            s.append("<g class=\"mark-label fixed\"");
            anchor(s, at[0], at[1]);
            s.append("><text x=\"4\" y=\"-4\">").append(Html.escape(p.mark())).append("</text></g>\n");
        }
    }

    /** The picture point halfway along a polyline (by its length in the picture), or null. */
    private static double[] halfway(List<Vec3> pts, Frame f) {
        double total = 0;
        for (int k = 1; k < pts.size(); k++) {
            total += Math.hypot(f.x(pts.get(k)) - f.x(pts.get(k - 1)), f.y(pts.get(k)) - f.y(pts.get(k - 1)));
        }
        if (!Double.isFinite(total)) {
            return null;
        }
        double left = total / 2;
        for (int k = 1; k < pts.size(); k++) {
            double x0 = f.x(pts.get(k - 1));
            double y0 = f.y(pts.get(k - 1));
            double x1 = f.x(pts.get(k));
            double y1 = f.y(pts.get(k));
            double d = Math.hypot(x1 - x0, y1 - y0);
            if (d >= left && d > 0) {
                return new double[] {x0 + (x1 - x0) * left / d, y0 + (y1 - y0) * left / d};
            }
            left -= d;
        }
        return new double[] {f.x(pts.get(0)), f.y(pts.get(0))};
    }

    private static void cog(StringBuilder s, DrawingResult r, Vec3 cog, Frame f, UnitSystem units, String ids,
            View view) {
        String what = r.totals().centroidM() != null ? "centre of gravity" : "length centroid (no mass known)";
        int extra = units.extraDecimalsFor(r.totals().lengthM());
        String at = "x " + units.longLength(cog.x(), extra) + ", y " + units.longLength(cog.y(), extra) + ", z "
                + units.longLength(cog.z(), extra) + " " + units.longUnit();
        s.append("<g class=\"cog fixed\" id=\"").append(ids).append("cog-").append(view.name().toLowerCase(Locale.ROOT))
                .append('"');
        anchor(s, f.x(cog), f.y(cog));
        s.append("><title>").append(Html.escape(what + ": " + at)).append("</title>")
                .append("<circle r=\"8\"/><path d=\"M0,0 h8 a8,8 0 0,0 -8,-8 z M0,0 h-8 a8,8 0 0,0 8,8 z\"/>")
                .append("<text class=\"cog-label\" x=\"11\" y=\"16\">CG</text></g>\n");
    }

    /**
     * Writes the markers; widens {@code reach} (min x, min y, max x, max y, picture px) to take in
     * every balloon shown in the first view with a margin. Markers are clustered as the page's
     * script clusters them at every zoom ({@link MarkerClusters}): the markers of a cell with more
     * one anchor are written hidden behind one count badge, so the picture reads without the script
     * (printed) too; a marker alone has its balloon up and to the right ({@link MarkerLayout#lone}).
     * A finding with alike ones ({@code grouped}) leaves its message to the findings table's group
     * row and gets a short tooltip, which keeps a drawing with many thousands of notes small.
     */
    private static void markers(StringBuilder s, DrawingResult r, Frame f, String ids, View view, boolean primary,
            double[] reach, double w, double h, java.util.Set<Integer> grouped, UnitSystem units) {
        List<Integer> numbers = new ArrayList<>();
        List<Finding> placed = new ArrayList<>();
        int n = 0;
        for (Finding fd : r.findings()) {
            n++;
            if (fd.atM() != null && fd.atM().isFinite()) {
                numbers.add(n);
                placed.add(fd);
            }
        }
        double[] xs = new double[placed.size()];
        double[] ys = new double[placed.size()];
        for (int i = 0; i < placed.size(); i++) {
            xs[i] = f.x(placed.get(i).atM());
            ys[i] = f.y(placed.get(i).atM());
        }
        MarkerClusters clusters = MarkerClusters.of(xs, ys);
        MarkerLayout.Offset[] offsets = new MarkerLayout.Offset[placed.size()];
        boolean[] hidden = new boolean[placed.size()];
        for (int[] cell : clusters.cells()) {
            if (cell.length > 1) {
                for (int i : cell) {
                    hidden[i] = true;
                    offsets[i] = MarkerLayout.lone();
                }
                continue;
            }
            offsets[cell[0]] = MarkerLayout.lone();
        }
        // notes first, errors last: later elements are drawn on top, so an error is never hidden by a note
        List<Integer> order = new ArrayList<>();
        for (int i = 0; i < placed.size(); i++) {
            order.add(i);
        }
        order.sort(Comparator.comparingInt((Integer i) -> placed.get(i).severity().ordinal()));
        for (int i : order) {
            Finding fd = placed.get(i);
            int num = numbers.get(i);
            MarkerLayout.Offset o = offsets[i];
            String marker = ids + "marker-" + num + (primary ? "" : "-" + view.name().toLowerCase(Locale.ROOT));
            boolean wide = Integer.toString(num).length() > 2;
            double br = fd.severity() == Severity.INFO ? (wide ? BALLOON_R : NOTE_BALLOON_R)
                    : wide ? WIDE_BALLOON_R : BALLOON_R;
            double margin = br + EDGE_MARGIN_PX;
            // only a shown marker on the drawing widens the picture to show its balloon whole; one outside
            // it is reached by panning, so it cannot push the drawing into a corner
            if (!hidden[i] && xs[i] >= 0 && xs[i] <= w && ys[i] >= 0 && ys[i] <= h) {
                reach[0] = Math.min(reach[0], xs[i] + o.dx() - margin);
                reach[1] = Math.min(reach[1], ys[i] + o.dy() - margin);
                reach[2] = Math.max(reach[2], xs[i] + o.dx() + margin);
                reach[3] = Math.max(reach[3], ys[i] + o.dy() + margin);
            }
            double len = Math.hypot(o.dx(), o.dy());
            double lead = Math.max(0, len - br) / Math.max(len, 1);
            s.append("<a class=\"marker fixed ").append(fd.severity().jsonName()).append("\" id=\"").append(marker)
                    .append("\" href=\"#").append(ids).append("finding-").append(num).append('"');
            anchor(s, xs[i], ys[i]);
            if (hidden[i]) {
                s.append(" display=\"none\"");
            }
            s.append("><title>").append(num).append(" (").append(fd.severity().jsonName()).append(", ")
                    .append(Html.escape(fd.kind())).append(')');
            if (!grouped.contains(num)) {
                s.append(": ").append(Html.escape(units.message(fd.message())));
            }
            s.append("</title><circle class=\"ring\" r=\"").append(num(RING_R)).append("\"/>")
                    .append("<line x1=\"0\" y1=\"0\" x2=\"").append(num(o.dx() * lead)).append("\" y2=\"")
                    .append(num(o.dy() * lead)).append("\"/><circle class=\"balloon\" cx=\"").append(num(o.dx()))
                    .append("\" cy=\"").append(num(o.dy())).append("\" r=\"").append(num(br))
                    .append("\"/><text x=\"").append(num(o.dx())).append("\" y=\"")
                    .append(num(o.dy() + (fd.severity() == Severity.INFO ? 3 : 4)))
                    .append("\">").append(num).append("</text></a>\n");
        }
        for (int[] cell : clusters.cells()) {
            if (cell.length > 1) {
                badge(s, cell, xs, ys, placed);
            }
        }
    }

    /**
     * The count badge of a cluster: a ring at its first anchor (the one the others lie within
     * {@value MarkerClusters#RADIUS_PX} px of) and the count on a leader, where a lone marker's balloon
     * would be, coloured by the most severe of them; the page's script replaces it with its own at
     * every zoom (class {@code cluster}).
     */
    private static void badge(StringBuilder s, int[] cell, double[] xs, double[] ys, List<Finding> placed) {
        Severity worst = Severity.INFO;
        for (int i : cell) {
            if (placed.get(i).severity().ordinal() < worst.ordinal()) {
                worst = placed.get(i).severity();
            }
        }
        String count = Integer.toString(cell.length);
        MarkerLayout.Offset o = MarkerLayout.lone();
        double bw = MarkerClusters.badgeWidth(cell.length);
        s.append("<g class=\"cluster fixed ").append(worst.jsonName()).append('"');
        anchor(s, xs[cell[0]], ys[cell[0]]);
        s.append("><title>").append(count).append(" findings here: click or zoom in to see them</title>")
                .append("<circle class=\"ring\" r=\"").append(num(RING_R)).append("\"/><line x1=\"0\" y1=\"0\" x2=\"")
                .append(num(o.dx())).append("\" y2=\"").append(num(o.dy())).append("\"/><rect x=\"")
                .append(num(o.dx() - bw / 2)).append("\" y=\"").append(num(o.dy() - 10)).append("\" width=\"")
                .append(num(bw)).append("\" height=\"20\" rx=\"10\"/><text x=\"").append(num(o.dx())).append("\" y=\"")
                .append(num(o.dy() + 4)).append("\">&times;").append(count).append("</text></g>\n");
    }

    /** transform and data attributes of a group drawn at screen size around picture point (x, y). */
    private static void anchor(StringBuilder s, double x, double y) {
        s.append(" data-x=\"").append(num(x)).append("\" data-y=\"").append(num(y)).append("\" transform=\"translate(")
                .append(num(x)).append(',').append(num(y)).append(")\"");
    }

    /** The scale bar at the bottom left of a picture whose view box starts at x0 and ends at bottom. */
    private static void scaleBar(StringBuilder s, UnitSystem units, double pxPerM, double x0, double bottom) {
        ScaleBar bar = ScaleBar.fitting(units, FIT_W / 5 / pxPerM);
        double px = bar.metres() * pxPerM;
        double y = bottom - 18;
        s.append("<g class=\"scale\"><path d=\"M").append(num(x0 + PAD)).append(',').append(num(y - 5))
                .append(" v5 h").append(num(px)).append(" v-5\"/><text x=\"").append(num(x0 + PAD + px + 6))
                .append("\" y=\"").append(num(y)).append("\">").append(bar.label()).append("</text></g>\n");
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

    /**
     * A scale bar's length: the largest 1-2-5 value not above the wanted length, in the long unit
     * (m, ft) from one long unit up, else in the short unit (mm, in), so a small part reads
     * "20 mm", not "0.02 m". The page's script repeats this rule when the picture is zoomed.
     */
    record ScaleBar(double metres, String label) {
        static ScaleBar fitting(UnitSystem units, double wantedM) {
            double longM = units.isImperial() ? 0.3048 : 1.0;
            double shortM = units.isImperial() ? 0.0254 : 0.001;
            if (wantedM >= longM) {
                double n = niceBelow(wantedM / longM);
                return new ScaleBar(n * longM, plain(n) + " " + units.longUnit());
            }
            double n = niceBelow(wantedM / shortM);
            return new ScaleBar(n * shortM, plain(n) + " " + units.shortUnit());
        }

        private static String plain(double v) {
            return new BigDecimal(Double.toString(v)).stripTrailingZeros().toPlainString();
        }
    }

    /** World to picture: u grows right, v grows up (picture y grows down). */
    private record Frame(View view, double minU, double maxV, double k, double left) {
        double x(Vec3 p) {
            return left + (view.u(p) - minU) * k;
        }

        double y(Vec3 p) {
            return PAD + (maxV - view.v(p)) * k;
        }
    }
}
