package org.linemass.reports.html;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;

class MarkerLayoutTest {

    /** Offsets are computed in doubles from a handful of sin/cos terms: far below a pixel. */
    private static final double TOL = 1e-9;
    /** Balloons are drawn with radius 10 px (13 for three digits): centres need 20 px between them. */
    private static final double BALLOON_DIAMETER_PX = 20;

    @Test
    void place_loneMarker_upAndRight() {
        List<MarkerLayout.Offset> o = MarkerLayout.place(new double[] {100}, new double[] {100});
        assertTrue(o.get(0).dx() > 0 && o.get(0).dy() < 0, "screen y grows down: up is negative");
        assertEquals(MarkerLayout.LONE_OFFSET_PX, Math.hypot(o.get(0).dx(), o.get(0).dy()), TOL);
    }

    @Test
    void place_coincidentFindings_balloonsDoNotOverlap() {
        for (int n : new int[] {2, 3, 12, 30}) {
            double[] xs = new double[n];
            double[] ys = new double[n];
            java.util.Arrays.fill(xs, 50);
            java.util.Arrays.fill(ys, 70);
            List<MarkerLayout.Offset> o = MarkerLayout.place(xs, ys);
            for (int i = 0; i < n; i++) {
                for (int j = i + 1; j < n; j++) {
                    double d = Math.hypot(o.get(i).dx() - o.get(j).dx(), o.get(i).dy() - o.get(j).dy());
                    assertTrue(d >= BALLOON_DIAMETER_PX, n + " markers: balloons " + i + " and " + j + " " + d + " px apart");
                }
            }
        }
    }

    @Test
    void place_nearbyFindings_fanAroundTheirCentre() {
        // two anchors 10 px apart share a fan: both balloons on one circle about their midpoint
        List<MarkerLayout.Offset> o = MarkerLayout.place(new double[] {0, 10}, new double[] {0, 0});
        double r0 = Math.hypot(0 + o.get(0).dx() - 5, o.get(0).dy());
        double r1 = Math.hypot(10 + o.get(1).dx() - 5, o.get(1).dy());
        assertEquals(r0, r1, TOL);
        // far-apart anchors are placed alone
        List<MarkerLayout.Offset> far = MarkerLayout.place(new double[] {0, 100}, new double[] {0, 0});
        assertEquals(far.get(0), far.get(1));
    }
}
