package org.linemass.engine.pieces;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.linemass.engine.pieces.geom.Curves;
import org.linemass.engine.result.Finding;
import org.linemass.engine.result.FindingKind;
import org.linemass.geometry.EllipticalArc;
import org.linemass.geometry.Nurbs;
import org.linemass.geometry.Provenance;
import org.linemass.geometry.Segment;
import org.linemass.geometry.Vec3;

/**
 * Ellipses and splines drawn twice with a different parametrisation (started elsewhere and
 * reversed, split, or drawn as another kind of curve) are duplicates; invented shapes of an oval
 * mirror frame and a curved handrail.
 */
class CurveCoverTest {

    private static final String W = "WIRE";

    private static PieceAnalysis run(List<Segment> segs) {
        return PieceAnalyzer.analyze(segs, Fixtures.tol(), Fixtures.sections(W, Fixtures.WIRE_D4), false);
    }

    private static List<Finding> of(PieceAnalysis r, String kind) {
        return r.findings().stream().filter(f -> f.kind().equals(kind)).toList();
    }

    private static Provenance src(int line, String type) {
        return Provenance.of("t.dxf", W, line, Integer.toHexString(line), type);
    }

    @Test
    void fullEllipseDrawnAgainFromAnotherStartAndReversed_isOneDuplicateOfItsPerimeter() {
        double a = 0.1;
        double b = 0.05;
        EllipticalArc first = EllipticalArc.of(Vec3.ZERO, new Vec3(a, 0, 0), new Vec3(0, b, 0), 0, 2 * Math.PI,
                src(10, "ELLIPSE"));
        Segment again = EllipticalArc.of(Vec3.ZERO, new Vec3(a, 0, 0), new Vec3(0, b, 0), Math.PI / 3,
                Math.PI / 3 + 2 * Math.PI, src(11, "ELLIPSE")).reversed();
        PieceAnalysis r = run(List.of(again, first));
        List<Finding> d = of(r, FindingKind.DUPLICATE);
        assertEquals(1, d.size(), r.findings().toString());
        // Ramanujan's second approximation of the perimeter, relative error about 1e-10 at
        // h = ((a - b) / (a + b))^2 = 1/9 (well below the 1e-8 m allowed here)
        double h = Math.pow((a - b) / (a + b), 2);
        double perimeter = Math.PI * (a + b) * (1 + 3 * h / (10 + Math.sqrt(4 - 3 * h)));
        assertEquals(perimeter, d.get(0).sizeM(), 1e-8);
        assertEquals("b", d.get(0).entities().get(0).handle(), "the later copy (line 11) is removed");
        // mass counted twice: 4 mm steel wire, pi d^2 / 4 * 7850 kg/m (Fixtures.WIRE_D4)
        assertEquals(perimeter * Fixtures.WIRE_D4.kgPerM(), d.get(0).massKg(), 1e-8);
        assertEquals(1, r.pieces().size());
        assertTrue(r.pieces().get(0).closed());
    }

    @Test
    void splineDrawnWholeAndAgainAsTwoHalves_countsItOnce() {
        // a cubic Bezier handrail curve and its two halves by de Casteljau at t = 1/2 (the halves
        // trace exactly the whole), so the removed length is the whole length
        Vec3 p0 = new Vec3(0, 0, 0);
        Vec3 p1 = new Vec3(0.1, 0.15, 0);
        Vec3 p2 = new Vec3(0.25, -0.05, 0);
        Vec3 p3 = new Vec3(0.3, 0.1, 0);
        Vec3 p01 = p0.plus(p1).times(0.5);
        Vec3 p12 = p1.plus(p2).times(0.5);
        Vec3 p23 = p2.plus(p3).times(0.5);
        Vec3 p012 = p01.plus(p12).times(0.5);
        Vec3 p123 = p12.plus(p23).times(0.5);
        Vec3 mid = p012.plus(p123).times(0.5);
        double[] bezier = {0, 0, 0, 0, 1, 1, 1, 1};
        Nurbs whole = Nurbs.of(3, bezier, new Vec3[] {p0, p1, p2, p3}, null, src(10, "SPLINE"));
        Nurbs left = Nurbs.of(3, bezier, new Vec3[] {p0, p01, p012, mid}, null, src(11, "SPLINE"));
        Nurbs right = Nurbs.of(3, bezier, new Vec3[] {p3, p23, p123, mid}, null, src(12, "SPLINE"));
        PieceAnalysis r = run(List.of(right, whole, left));
        List<Finding> d = of(r, FindingKind.DUPLICATE);
        assertEquals(2, d.size(), r.findings().toString());
        double wholeLength = Curves.length(whole);
        // whole = sum of parts; the quadrature error of each length is far below 1e-9 m
        assertEquals(wholeLength, d.get(0).sizeM() + d.get(1).sizeM(), 1e-9);
        assertEquals(1, r.pieces().size());
        assertEquals(wholeLength, r.pieces().get(0).segments().stream().mapToDouble(Curves::length).sum(), 0.0);
        assertEquals("a", r.pieces().get(0).segments().get(0).source().handle(), "the whole (line 10) stays");
    }

    @Test
    void quarterEllipseDrawnAgainAsARationalSpline_isADuplicate() {
        // a quarter ellipse is exactly the rational quadratic Bezier with control points (a, 0),
        // (a, b), (0, b) and weights 1, sqrt(2)/2, 1 (the affine image of the quarter circle)
        double a = 0.12;
        double b = 0.07;
        EllipticalArc quarter = EllipticalArc.of(Vec3.ZERO, new Vec3(a, 0, 0), new Vec3(0, b, 0), 0, Math.PI / 2,
                src(10, "ELLIPSE"));
        Nurbs spline = Nurbs.of(2, new double[] {0, 0, 0, 1, 1, 1},
                new Vec3[] {new Vec3(a, 0, 0), new Vec3(a, b, 0), new Vec3(0, b, 0)},
                new double[] {1, Math.sqrt(0.5), 1}, src(11, "SPLINE"));
        PieceAnalysis r = run(List.of(spline, quarter));
        List<Finding> d = of(r, FindingKind.DUPLICATE);
        assertEquals(1, d.size(), r.findings().toString());
        assertEquals(1, r.pieces().size());
        assertEquals(1, r.removed().size());
        // both are the same curve: the size is the quarter perimeter either way (quadrature, 1e-9 m)
        assertEquals(Curves.length(quarter), d.get(0).sizeM(), 1e-9);
    }

    @Test
    void splineWithTheSameEndsBulgingHalfAMillimetreAway_isNotADuplicate() {
        // same ends, the middle control points moved 0.5 mm off: the curves part by up to
        // 0.75 * 0.5 = 0.375 mm (Bezier middle point = (P0 + 3 P1 + 3 P2 + P3) / 8), above the
        // 0.1 mm join tolerance
        double[] bezier = {0, 0, 0, 0, 1, 1, 1, 1};
        Vec3 p0 = Vec3.ZERO;
        Vec3 p3 = new Vec3(0.3, 0, 0);
        Nurbs one = Nurbs.of(3, bezier, new Vec3[] {p0, new Vec3(0.1, 0.05, 0), new Vec3(0.2, 0.05, 0), p3}, null,
                src(10, "SPLINE"));
        Nurbs two = Nurbs.of(3, bezier, new Vec3[] {p0, new Vec3(0.1, 0.0505, 0), new Vec3(0.2, 0.0505, 0), p3}, null,
                src(11, "SPLINE"));
        PieceAnalysis r = run(List.of(one, two));
        assertEquals(List.of(), of(r, FindingKind.DUPLICATE));
        assertEquals(List.of(), r.removed());
    }
}
