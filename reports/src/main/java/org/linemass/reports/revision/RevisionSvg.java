package org.linemass.reports.revision;

import java.util.ArrayList;
import java.util.List;
import org.linemass.engine.result.PieceResult;
import org.linemass.geometry.Vec3;
import org.linemass.plan.revision.ChangeKind;
import org.linemass.plan.revision.PieceChange;
import org.linemass.plan.revision.RevisionDiff;
import org.linemass.reports.Report;
import org.linemass.reports.UnitSystem;
import org.linemass.reports.html.Html;

/**
 * One SVG picture of both revisions: unchanged pieces grey, moved pieces blue, changed pieces
 * orange (each with its revision-A place dashed and faint), removed pieces red dashed (where they
 * were in A), added pieces green. The plan (looking down z) always, and the front elevation
 * (looking along y) when the drawings have height, each fitted to all pieces of both revisions;
 * lines keep their screen width at any zoom. Each piece has a tooltip with its change and marks.
 */
public final class RevisionSvg {

    private static final double FIT_W = 760;
    private static final double FIT_H = 460;
    private static final double PAD = 20;

    private RevisionSvg() {
    }

    /** The colour of each kind, for the picture and its legend. */
    static String colour(ChangeKind k) {
        return switch (k) {
            case UNCHANGED -> "#9a9a9a";
            case MOVED -> "#1f5fbf";
            case CHANGED -> "#d98200";
            case REMOVED -> "#c62828";
            case ADDED -> "#2e7d32";
        };
    }

    public static String render(RevisionDiff diff, Report a, Report b) {
        List<Line> lines = new ArrayList<>();
        // unchanged pieces first, so the changes are drawn over them
        for (PieceChange c : diff.changes()) {
            String tip = c.kind().label() + (c.a() != null ? ", A " + c.a().mark() : "")
                    + (c.b() != null ? ", B " + c.b().mark() : "")
                    + (c.changed().isEmpty() ? "" : ": " + String.join(", ", c.changed()));
            switch (c.kind()) {
                case UNCHANGED, ADDED -> lines.add(new Line(shape(b, c.b()), colour(c.kind()), false, false, tip));
                case REMOVED -> lines.add(new Line(shape(a, c.a()), colour(c.kind()), true, false, tip));
                case MOVED, CHANGED -> {
                    lines.add(new Line(shape(a, c.a()), colour(c.kind()), true, true, tip + " (place in A)"));
                    lines.add(new Line(shape(b, c.b()), colour(c.kind()), false, false, tip));
                }
                default -> throw new IllegalStateException("unknown change kind " + c.kind());
            }
        }
        lines.sort((x, y) -> Boolean.compare(!x.colour.equals(colour(ChangeKind.UNCHANGED)),
                !y.colour.equals(colour(ChangeKind.UNCHANGED))));
        double[] min = {Double.POSITIVE_INFINITY, Double.POSITIVE_INFINITY, Double.POSITIVE_INFINITY};
        double[] max = {Double.NEGATIVE_INFINITY, Double.NEGATIVE_INFINITY, Double.NEGATIVE_INFINITY};
        for (Line l : lines) {
            for (Vec3 p : l.points) {
                for (int k = 0; k < 3; k++) {
                    min[k] = Math.min(min[k], p.get(k));
                    max[k] = Math.max(max[k], p.get(k));
                }
            }
        }
        if (!(min[0] <= max[0])) {
            return "<p class=\"empty\">Nothing to draw: neither revision has pieces.</p>\n";
        }
        // the plan always; the front elevation too when the drawing has height
        StringBuilder all = new StringBuilder();
        all.append(view(lines, min, max, 0, 1, "plan (looking down z)"));
        double reach = Math.max(max[0] - min[0], max[1] - min[1]);
        if (max[2] - min[2] > 0.01 * reach) {
            all.append(view(lines, min, max, 0, 2, "front elevation (looking along y)"));
        }
        return all.toString();
    }

    private static String view(List<Line> lines, double[] min, double[] max, int uAxis, int vAxis, String title) {
        double du = Math.max(max[uAxis] - min[uAxis], 1e-3);
        double dv = Math.max(max[vAxis] - min[vAxis], 1e-3);
        double k = Math.min(FIT_W / du, FIT_H / dv);
        double w = du * k + 2 * PAD;
        double h = dv * k + 2 * PAD;
        StringBuilder s = new StringBuilder();
        s.append("<figure>\n<figcaption>").append(Html.escape(title)).append("</figcaption>\n");
        s.append("<svg class=\"revision\" xmlns=\"http://www.w3.org/2000/svg\" viewBox=\"0 0 ").append(num(w))
                .append(' ').append(num(h)).append("\" width=\"").append(num(w)).append("\" height=\"").append(num(h))
                .append("\">\n<rect x=\"0\" y=\"0\" width=\"").append(num(w)).append("\" height=\"").append(num(h))
                .append("\" fill=\"#ffffff\"/>\n");
        for (Line l : lines) {
            if (l.points.size() < 2) {
                continue;
            }
            s.append("<polyline fill=\"none\" vector-effect=\"non-scaling-stroke\" stroke=\"").append(l.colour)
                    .append("\" stroke-width=\"").append(l.faint ? "1.5" : "2.5").append('"');
            if (l.dashed) {
                s.append(" stroke-dasharray=\"6 4\"");
            }
            if (l.faint) {
                s.append(" stroke-opacity=\"0.55\"");
            }
            s.append(" points=\"");
            for (Vec3 p : l.points) {
                s.append(num(PAD + (p.get(uAxis) - min[uAxis]) * k)).append(',')
                        .append(num(PAD + (max[vAxis] - p.get(vAxis)) * k)).append(' ');
            }
            s.setLength(s.length() - 1);
            s.append("\"><title>").append(Html.escape(l.tip)).append("</title></polyline>\n");
        }
        s.append("</svg>\n</figure>\n");
        return s.toString();
    }

    /** The legend of the picture as HTML. */
    static String legend() {
        StringBuilder s = new StringBuilder("<p class=\"legend\">");
        for (ChangeKind kind : ChangeKind.values()) {
            s.append("<span style=\"color:").append(colour(kind)).append("\">&#9632; ").append(kind.label())
                    .append("</span> ");
        }
        return s.append("(dashed and faint: the place in revision A)</p>\n").toString();
    }

    private static List<Vec3> shape(Report r, PieceResult p) {
        List<Vec3> pts = r.shape(p.id());
        if (pts.size() < 2 && p.startM() != null && p.endM() != null) {
            return List.of(p.startM(), p.endM());
        }
        return pts;
    }

    private static String num(double v) {
        return UnitSystem.fixed(v, 2);
    }

    private record Line(List<Vec3> points, String colour, boolean dashed, boolean faint, String tip) {
    }
}
