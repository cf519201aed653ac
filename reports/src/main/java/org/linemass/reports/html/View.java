package org.linemass.reports.html;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import org.linemass.geometry.Vec3;

/**
 * A parallel projection of world points onto a picture plane: plan (x right, y up), front
 * elevation (x right, z up), side elevation (y right, z up) or an isometric view from the front
 * right, above (x and y at 30 degrees to the horizontal, z up).
 *
 * <p>{@link #choose} picks the views for a drawing. A flat drawing (height, the z extent, at most
 * {@value #THIRD_DIMENSION_SHARE} of its largest horizontal extent) gets the plan only. A
 * three-dimensional one gets the two orthographic views whose pictures are largest (the area of
 * the projected bounding box, the plan's weighted by {@value #PLAN_PREFERENCE}: a view that sees
 * the drawing edge-on, like an arch in a vertical plane seen from above, is a thin strip), ties broken by the wire shown (the sum of projected
 * segment lengths), then plan before front before side; the isometric view comes as well when all three
 * extents are at least {@value #SOLID_SHARE} of the largest (a cage, a chair: no single pair of
 * orthographic views shows how the parts sit together).
 */
enum View {
    PLAN("Plan view (looking down, x to the right, y up)", new Vec3(1, 0, 0), new Vec3(0, 1, 0)),
    FRONT("Front elevation (x to the right, z up)", new Vec3(1, 0, 0), new Vec3(0, 0, 1)),
    SIDE("Side elevation (y to the right, z up)", new Vec3(0, 1, 0), new Vec3(0, 0, 1)),
    ISO("Isometric view (from the front right, above; z up)", new Vec3(1, 1, 0).times(1 / Math.sqrt(2)),
            new Vec3(-1, 1, 2).times(1 / Math.sqrt(6)));

    /** Share of the horizontal extent above which a drawing counts as three-dimensional (common practice, no source). */
    static final double THIRD_DIMENSION_SHARE = 0.01;
    /** Share of the largest extent that every extent must reach for the isometric view (chosen by eye, no source). */
    static final double SOLID_SHARE = 0.2;

    /**
     * The plan's picture area counts this much more: drawings are made and read in plan, so an
     * elevation comes first only when it is clearly larger, like an arch standing up (chosen by eye, no source).
     */
    static final double PLAN_PREFERENCE = 1.5;

    final String title;
    private final Vec3 right;
    private final Vec3 up;

    View(String title, Vec3 right, Vec3 up) {
        this.title = title;
        this.right = right;
        this.up = up;
    }

    double u(Vec3 p) {
        return p.dot(right);
    }

    double v(Vec3 p) {
        return p.dot(up);
    }

    /** Sum of the projected lengths of the polylines' segments in this view (metres). */
    double projectedLength(List<List<Vec3>> lines) {
        double sum = 0;
        for (List<Vec3> line : lines) {
            for (int i = 1; i < line.size(); i++) {
                double du = u(line.get(i)) - u(line.get(i - 1));
                double dv = v(line.get(i)) - v(line.get(i - 1));
                double d = Math.hypot(du, dv);
                if (Double.isFinite(d)) {
                    sum += d;
                }
            }
        }
        return sum;
    }

    /** Area of the bounding box of the polylines' points in this view, square metres. */
    double boxArea(List<List<Vec3>> lines) {
        double minU = Double.POSITIVE_INFINITY;
        double minV = Double.POSITIVE_INFINITY;
        double maxU = Double.NEGATIVE_INFINITY;
        double maxV = Double.NEGATIVE_INFINITY;
        for (List<Vec3> line : lines) {
            for (Vec3 p : line) {
                if (p.isFinite()) {
                    minU = Math.min(minU, u(p));
                    maxU = Math.max(maxU, u(p));
                    minV = Math.min(minV, v(p));
                    maxV = Math.max(maxV, v(p));
                }
            }
        }
        return minU > maxU ? 0 : (maxU - minU) * (maxV - minV);
    }

    /**
     * The views to draw, first the main one.
     *
     * @param extent max - min per axis of the drawing, metres
     * @param lines the pieces as polylines (world metres)
     */
    static List<View> choose(Vec3 extent, List<List<Vec3>> lines) {
        double horizontal = Math.max(extent.x(), extent.y());
        if (!(extent.z() > THIRD_DIMENSION_SHARE * horizontal && extent.z() > 0)) {
            return List.of(PLAN);
        }
        List<View> ortho = new ArrayList<>(List.of(PLAN, FRONT, SIDE));
        // stable sort: on a full tie the plan, then the front elevation, stays first
        ortho.sort(Comparator.comparingDouble((View v) -> -v.boxArea(lines) * (v == PLAN ? PLAN_PREFERENCE : 1))
                .thenComparingDouble(v -> -v.projectedLength(lines)));
        List<View> views = new ArrayList<>(ortho.subList(0, 2));
        double largest = Math.max(horizontal, extent.z());
        double smallest = Math.min(Math.min(extent.x(), extent.y()), extent.z());
        if (smallest >= SOLID_SHARE * largest) {
            views.add(ISO);
        }
        return views;
    }
}
