package org.linemass.engine.integrate;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;
import org.junit.jupiter.api.Test;
import org.linemass.engine.moments.Moments;
import org.linemass.geometry.Nurbs;
import org.linemass.geometry.Vec3;

/**
 * Lengths of rational splines with extreme weights against arbitrary-precision reference values
 * (rational-splines.csv, computed by rational_splines.py beside it with mpmath at 80 digits): the
 * reported error bound must hold, and must not be a refusal in disguise.
 */
class RationalSplineReferenceTest {

    /** Target relative error passed to the integrator. */
    private static final double REL = 1e-10;

    /**
     * Allowance on top of the reported bound: the reference is exact to 25 digits, but its parse to a
     * double and the double control points and weights of the spline differ from the decimal ones by
     * a unit of double rounding each, which moves the length by a few units of 1e-16 relative.
     */
    private static final double REPRESENTATION = 1e-15;

    /**
     * The bound must be useful, not a blanket: at most 100 times the target (the integrator's bound
     * is its estimate, at least the target; graded pieces may add their rounding terms).
     */
    private static final double USEFUL_BOUND = 100 * REL;

    /**
     * Centroids: the integrator controls first moments to the target relative to the segment's
     * extent (errorNorm); 1e-8 of the 20 mm extent leaves room for 100 times the target.
     */
    private static final double CENTROID_TOL = 1e-8 * 20;

    record Row(String name, Nurbs spline, double length, double cx, double cy) {
        @Override
        public String toString() {
            return name;
        }
    }

    static Stream<Row> rows() throws IOException {
        List<Row> rows = new ArrayList<>();
        try (InputStream in = RationalSplineReferenceTest.class.getResourceAsStream("rational-splines.csv");
                BufferedReader r = new BufferedReader(new InputStreamReader(in, StandardCharsets.UTF_8))) {
            String line;
            boolean header = true;
            while ((line = r.readLine()) != null) {
                if (line.startsWith("#")) {
                    continue;
                }
                if (header) {
                    header = false;
                    continue;
                }
                String[] c = line.split(",");
                double[] knots = numbers(c[2]);
                double[] xy = numbers(c[3]);
                Vec3[] pts = new Vec3[xy.length / 2];
                for (int i = 0; i < pts.length; i++) {
                    pts[i] = new Vec3(xy[2 * i], xy[2 * i + 1], 0);
                }
                Nurbs n = Nurbs.of(Integer.parseInt(c[1]), knots, pts, numbers(c[4]), TestCurves.SRC);
                rows.add(new Row(c[0], n, Double.parseDouble(c[5]), Double.parseDouble(c[6]),
                        Double.parseDouble(c[7])));
            }
        }
        assertTrue(rows.size() >= 13, "reference rows read: " + rows.size());
        return rows.stream();
    }

    private static double[] numbers(String cell) {
        return Arrays.stream(cell.trim().split(" ")).mapToDouble(Double::parseDouble).toArray();
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("rows")
    void lengthMoments_extremeWeights_boundHoldsAgainstReference(Row row) {
        Moments m = MomentIntegrator.lengthMoments(row.spline(), REL);
        double error = Math.abs(m.mass() - row.length());
        assertTrue(error <= m.errorBound() + REPRESENTATION * row.length(),
                row + ": length " + m.mass() + ", reference " + row.length() + ", error " + error + " > bound "
                        + m.errorBound());
        assertTrue(m.errorBound() <= USEFUL_BOUND * row.length(), row + ": bound " + m.errorBound());
        assertEquals(row.cx(), m.centroid().x(), CENTROID_TOL, row + " centroid x");
        assertEquals(row.cy(), m.centroid().y(), CENTROID_TOL, row + " centroid y");
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("rows")
    void lengthMoments_reversedOrScaledWeights_sameLength(Row row) {
        Nurbs n = row.spline();
        Moments m = MomentIntegrator.lengthMoments(n, REL);
        Moments back = MomentIntegrator.lengthMoments(n.reversed(), REL);
        double[] w = n.weights();
        for (int i = 0; i < w.length; i++) {
            w[i] *= 1e-30;
        }
        Moments scaled = MomentIntegrator.lengthMoments(Nurbs.of(n.degree(), n.knots(), n.controlPoints(), w,
                n.source()), REL);
        // both are within their bounds of the same length
        assertEquals(m.mass(), back.mass(), m.errorBound() + back.errorBound(), row + " reversed");
        assertEquals(m.mass(), scaled.mass(), m.errorBound() + scaled.errorBound(), row + " weights x 1e-30");
    }

    @Test
    void curve_extremeWeight_endsStayApart() {
        // the quadratic (0,0)-(10,10)-(20,0) with middle weight 1e50: its ends are its end points
        Nurbs n = Nurbs.of(2, new double[] {0, 0, 0, 1, 1, 1},
                new Vec3[] {new Vec3(0, 0, 0), new Vec3(10, 10, 0), new Vec3(20, 0, 0)},
                new double[] {1, 1e50, 1}, TestCurves.SRC);
        assertEquals(0, n.start().minus(new Vec3(0, 0, 0)).norm(), 0);
        assertEquals(0, n.end().minus(new Vec3(20, 0, 0)).norm(), 0);
        assertTrue(MomentIntegrator.stronglyWeighted(n));
        assertFalse(MomentIntegrator.stronglyWeighted(Nurbs.of(2, new double[] {0, 0, 0, 1, 1, 1},
                new Vec3[] {new Vec3(0, 0, 0), new Vec3(10, 10, 0), new Vec3(20, 0, 0)},
                new double[] {1, Math.sqrt(0.5), 1}, TestCurves.SRC)), "a quarter circle's weights");
    }

    @Test
    void of_weightRatioBeyondLimit_refusedWithMessage() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> Nurbs.of(2,
                new double[] {0, 0, 0, 1, 1, 1},
                new Vec3[] {new Vec3(0, 0, 0), new Vec3(10, 10, 0), new Vec3(20, 0, 0)},
                new double[] {1e-60, 1e60, 1}, TestCurves.SRC));
        assertTrue(e.getMessage().contains("weights differ by more than a factor 1.0E100"), e.getMessage());
    }

    @Test
    void bracketed_lengthOutsideChordAndPolygon_boundWidened() {
        // chords 10, polygon 12: a length of 13 is at most 3 off, 9 at most 3 off
        assertEquals(3, MomentIntegrator.bracketed(13, 1e-9, 10, 12), 1e-9);
        assertEquals(3, MomentIntegrator.bracketed(9, 1e-9, 10, 12), 1e-9);
        assertEquals(1e-9, MomentIntegrator.bracketed(11, 1e-9, 10, 12), 0);
    }
}
