package org.linemass.reports.html;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.linemass.geometry.Vec3;

class ViewTest {

    /** Projected lengths are sums of a few hypot() terms: a few ulps of metres. */
    private static final double TOL = 1e-12;

    /** A half circle of radius r in the plane y = 0 (an arch standing up), sampled in n chords. */
    private static List<Vec3> arch(double r, int n) {
        List<Vec3> pts = new ArrayList<>();
        for (int i = 0; i <= n; i++) {
            double t = Math.PI * i / n;
            pts.add(new Vec3(r * Math.cos(t), 0, r * Math.sin(t)));
        }
        return pts;
    }

    @Test
    void choose_flatDrawing_planOnly() {
        List<List<Vec3>> lines = List.of(List.of(Vec3.ZERO, new Vec3(2, 1, 0)));
        assertEquals(List.of(View.PLAN), View.choose(new Vec3(2, 1, 0), lines));
    }

    @Test
    void choose_archInVerticalPlane_frontElevationFirst() {
        // seen from above the arch is a straight line of length 2r; from the front it is the whole
        // half circle (closed form: pi r for the curve, chords slightly less); from the side a line of length r
        List<List<Vec3>> lines = List.of(arch(1, 64));
        List<View> views = View.choose(new Vec3(2, 0, 1), lines);
        // plan and side boxes have zero area (the arch is edge-on); plan shows 2 m of wire, side 2 m too
        assertEquals(List.of(View.FRONT, View.PLAN), views, "no isometric: the y extent is zero");
        assertEquals(2.0, View.PLAN.projectedLength(lines), TOL);
        assertEquals(1.0 * 2, View.SIDE.projectedLength(lines), TOL);
    }

    @Test
    void choose_boxFrame_addsIsometric() {
        // the 12 edges of a 1 x 0.8 x 0.6 box: every extent at least 20 % of the largest
        double[] d = {1, 0.8, 0.6};
        List<List<Vec3>> lines = new ArrayList<>();
        for (int axis = 0; axis < 3; axis++) {
            for (int corner = 0; corner < 4; corner++) {
                double[] a = new double[3];
                int o1 = (axis + 1) % 3;
                int o2 = (axis + 2) % 3;
                a[o1] = (corner & 1) * d[o1];
                a[o2] = (corner >> 1) * d[o2];
                double[] b = a.clone();
                b[axis] = d[axis];
                lines.add(List.of(new Vec3(a[0], a[1], a[2]), new Vec3(b[0], b[1], b[2])));
            }
        }
        List<View> views = View.choose(new Vec3(1, 0.8, 0.6), lines);
        // boxes: plan 1 x 0.8, front 1 x 0.6, side 0.8 x 0.6 square metres;
        // plan shows 4*(1+0.8) = 7.2 m of wire, front 4*(1+0.6) = 6.4 m, side 4*(0.8+0.6) = 5.6 m
        assertEquals(List.of(View.PLAN, View.FRONT, View.ISO), views);
        assertEquals(7.2, View.PLAN.projectedLength(lines), TOL);
        assertEquals(0.8, View.PLAN.boxArea(lines), TOL);
    }

    @Test
    void choose_elevationOnlySlightlyLarger_planStaysFirst() {
        // a box frame 1 x 0.5 x 0.6: front box 0.6 m2 beats the plan's 0.5 m2, but not by the plan's weight 1.5
        List<List<Vec3>> lines = List.of(
                List.of(Vec3.ZERO, new Vec3(1, 0, 0), new Vec3(1, 0.5, 0), new Vec3(0, 0.5, 0), Vec3.ZERO),
                List.of(Vec3.ZERO, new Vec3(0, 0, 0.6)),
                List.of(new Vec3(1, 0.5, 0), new Vec3(1, 0.5, 0.6)));
        assertEquals(View.PLAN, View.choose(new Vec3(1, 0.5, 0.6), lines).get(0));
    }

    @Test
    void iso_projectsAxesAtThirtyDegrees() {
        // closed form of the isometric projection: each axis foreshortened to sqrt(2/3), x and y at
        // 30 degrees below the horizontal on either side, z straight up
        double f = Math.sqrt(2.0 / 3.0);
        Vec3 x = new Vec3(1, 0, 0);
        assertEquals(f * Math.cos(Math.toRadians(30)), View.ISO.u(x), TOL);
        assertEquals(-f * Math.sin(Math.toRadians(30)), View.ISO.v(x), TOL);
        assertEquals(0, View.ISO.u(new Vec3(0, 0, 1)), TOL);
        assertEquals(f, View.ISO.v(new Vec3(0, 0, 1)), TOL);
    }
}
