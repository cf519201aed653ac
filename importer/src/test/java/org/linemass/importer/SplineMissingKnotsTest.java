package org.linemass.importer;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;
import java.util.function.Function;
import java.util.stream.Collectors;
import org.apache.commons.math3.analysis.integration.IterativeLegendreGaussIntegrator;
import org.junit.jupiter.api.Test;
import org.linemass.drawing.Drawing;
import org.linemass.drawing.ImportNote;
import org.linemass.geometry.Nurbs;
import org.linemass.geometry.Segment;
import org.linemass.geometry.Vec3;

/**
 * SPLINEs written without knots (testdata/importer/spline_missing_knots.dxf, parts of a wire shelf:
 * see the folder's README) get the clamped uniform knot vector and a warning note; knots that are
 * declared but missing or inconsistent stay errors.
 */
class SplineMissingKnotsTest {

    /** Closed forms evaluated in double precision on coordinates below 1000: a few ulps. */
    private static final double CLOSE = 1e-12;
    /**
     * Lengths by quadrature (the test helper's composite 12-point Gauss rule, Commons Math's
     * iterative Legendre-Gauss rule below) of polynomial speeds on one span: both converge to far
     * better than 1e-9 relative, so this is the comparison tolerance, relative to the length.
     */
    private static final double QUADRATURE_REL = 1e-9;

    private static final String FILE = "spline_missing_knots.dxf";

    private static Drawing shelf() throws Exception {
        return DxfImporter.read(SharedFiles.testdata().resolve(FILE), ImportOptions.DEFAULTS);
    }

    private static Map<String, Segment> byHandle(Drawing d) {
        return d.modelSpace().segments().stream()
                .collect(Collectors.toMap(s -> s.source().handle(), Function.identity()));
    }

    private static ImportNote note(Drawing d, String handle) {
        return d.notes().stream().filter(n -> n.handle().equals(handle)).findFirst()
                .orElseThrow(() -> new AssertionError("no note for handle " + handle + ": " + d.notes()));
    }

    @Test
    void degree1ThreePoints_isThePolylineThroughThem() throws Exception {
        Nurbs n = (Nurbs) byHandle(shelf()).get("51");
        // clamped uniform, degree 1, 3 control points: 0, 0, 1/2, 1, 1 (definition of the clamped vector)
        assertArrayEquals(new double[] {0, 0, 0.5, 1, 1}, n.knots(), CLOSE);
        assertTrue(Vec3.of(300, 400, 0).closeTo(n.point(0.5), CLOSE), "passes through the middle point");
        // closed form: |(300, 400)| + |(0, 300)| = 500 + 300
        double length = LineIntegrals.of(List.of(n)).length;
        assertEquals(800, length, 800 * QUADRATURE_REL);
    }

    @Test
    void degree2ThreePoints_isTheQuadraticBezier() throws Exception {
        Nurbs n = (Nurbs) byHandle(shelf()).get("52");
        assertArrayEquals(new double[] {0, 0, 0, 1, 1, 1}, n.knots(), CLOSE);
        // closed form, Bernstein form of P0 (0,0), P1 (1,1), P2 (2,0): B(t) = (2t, 2t(1 - t))
        for (int i = 0; i <= 8; i++) {
            double t = i / 8.0;
            assertTrue(Vec3.of(2 * t, 2 * t * (1 - t), 0).closeTo(n.point(t), CLOSE), "t = " + t);
        }
        // closed form: B'(t) = (2, 2 - 4t), |B'| = 2 sqrt(1 + (1 - 2t)^2); with u = 1 - 2t (dt = -du/2)
        // L = integral_{-1}^{1} sqrt(1 + u^2) du = 2 integral_0^1 sqrt(1 + u^2) du
        //   = [u sqrt(1 + u^2) + asinh u]_0^1 = sqrt(2) + ln(1 + sqrt(2)) = 2.2955871493926...
        double expected = Math.sqrt(2) + Math.log(1 + Math.sqrt(2));
        assertEquals(expected, LineIntegrals.of(List.of(n)).length, expected * QUADRATURE_REL);
    }

    @Test
    void degree3FourPoints_matchesTheBezierArcLengthIntegral() throws Exception {
        Nurbs n = (Nurbs) byHandle(shelf()).get("53");
        assertArrayEquals(new double[] {0, 0, 0, 0, 1, 1, 1, 1}, n.knots(), CLOSE);
        Vec3[] p = {Vec3.of(0, 0, 0), Vec3.of(100, 150, 0), Vec3.of(250, -50, 20), Vec3.of(300, 100, 0)};
        // closed form: cubic Bezier B(t) = sum C(3,i) t^i (1-t)^(3-i) P_i (Bernstein form)
        for (int i = 0; i <= 8; i++) {
            double t = i / 8.0;
            double s = 1 - t;
            Vec3 b = p[0].times(s * s * s).plus(p[1].times(3 * t * s * s)).plus(p[2].times(3 * t * t * s))
                    .plus(p[3].times(t * t * t));
            assertTrue(b.closeTo(n.point(t), 1e-9), "t = " + t + ": " + b + " vs " + n.point(t));
        }
        // reference: Commons Math iterative Legendre-Gauss integration of |B'(t)| with the Bezier
        // derivative B'(t) = 3[(1-t)^2 (P1 - P0) + 2t(1-t) (P2 - P1) + t^2 (P3 - P2)]
        Vec3 d0 = p[1].minus(p[0]);
        Vec3 d1 = p[2].minus(p[1]);
        Vec3 d2 = p[3].minus(p[2]);
        IterativeLegendreGaussIntegrator quad = new IterativeLegendreGaussIntegrator(8, 1e-14, 1e-14);
        double expected = quad.integrate(10_000, t -> d0.times(3 * (1 - t) * (1 - t)).plus(d1.times(6 * t * (1 - t)))
                .plus(d2.times(3 * t * t)).norm(), 0, 1);
        assertEquals(expected, LineIntegrals.of(List.of(n)).length, expected * QUADRATURE_REL);
    }

    @Test
    void missingKnots_warningNamesFileLineHandleAndLayer() throws Exception {
        Drawing d = shelf();
        ImportNote w = note(d, "52");
        assertEquals("warning", w.severity());
        assertEquals("knots_assumed", w.kind());
        assertTrue(w.file().endsWith(FILE), w.file());
        assertEquals(55, w.line(), "line of the SPLINE's 0 group in the fragment");
        assertEquals("SPLINE", w.entityType());
        assertEquals("SHELF_HOOK", w.layer());
        assertTrue(w.message().contains("no knots") && w.message().contains("clamped uniform knot vector"),
                w.message());
        assertEquals(19, note(d, "51").line());
        assertEquals("warning", note(d, "53").severity());
    }

    @Test
    void closedFlagWithoutKnots_isOpenClampedAndSaysSo() throws Exception {
        Drawing d = shelf();
        Nurbs n = (Nurbs) byHandle(d).get("55");
        // closed form: three sides of the 10 x 10 square, the clamped curve does not close
        assertEquals(30, LineIntegrals.of(List.of(n)).length, 30 * QUADRATURE_REL);
        assertTrue(note(d, "55").message().contains("closed/periodic flag (group code 70 = 9) is not applied"),
                note(d, "55").message());
    }

    @Test
    void declaredButMissingOrInconsistentKnots_remainErrors() throws Exception {
        Drawing d = shelf();
        Map<String, Segment> s = byHandle(d);
        assertTrue(!s.containsKey("54") && !s.containsKey("56"), s.keySet().toString());
        ImportNote bad = note(d, "54");
        assertEquals("error", bad.severity());
        assertEquals("has 4 knots; 3 control points of degree 2 need 6", bad.message());
        assertEquals("declares 3 knots but has 0", note(d, "56").message());
        assertTrue(d.incomplete());
        assertEquals(4, s.size(), "51, 52, 53 and 55 converted");
    }
}
