package org.linemass.engine.result;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.linemass.engine.moments.Moments;
import org.linemass.engine.moments.Sym3;
import org.linemass.geometry.Vec3;
import org.junit.jupiter.api.Test;

class CombinedTotalsTest {

    /** Linear density of a 10 mm bar, kg/m (a sample value; any positive density shows the combination). */
    private static final double B10_KG_PER_M = 0.617;

    /** Moments of a thin straight rod of unit density: L, midpoint, (L/12) d d^T (Beer and Johnston, ch. 9). */
    private static Moments rod(Vec3 a, Vec3 b) {
        Vec3 d = b.minus(a);
        double l = d.norm();
        return new Moments(l, a.plus(b).times(0.5), Sym3.outer(d).times(l / 12.0), 0);
    }

    /** Sums of a few doubles of order 1: a few ulps (1e-15) are expected; 1e-12 leaves room. */
    private static final double TOL = 1e-12;

    private static Totals rodTotals(double y, Double kgPerM) {
        Moments m = rod(new Vec3(0, y, 0), new Vec3(1, y, 0));
        Moments mass = kgPerM == null ? null : m.scaledDensity(kgPerM);
        return new Totals(m.mass(), m.mass(), m.centroid(), m.inertia(), mass == null ? null : mass.mass(),
                mass == null ? null : mass.centroid(), mass == null ? null : mass.inertia(), kgPerM != null, 1e-15);
    }

    @Test
    void of_twoParallelRods_matchesParallelAxisClosedForm() {
        // closed form: rod of length 1 about its centre J = diag(0, 1/12, 1/12); parallel-axis rule with
        // offsets (0, +-0.5, 0) adds L(|d|^2 I - d d^T) = diag(0.25, 0, 0.25) for each rod
        Totals t = CombinedTotals.of(List.of(rodTotals(0, 1.0), rodTotals(1, 1.0)));
        assertEquals(2.0, t.lengthM(), TOL);
        assertTrue(t.lengthCentroidM().closeTo(new Vec3(0.5, 0.5, 0), TOL));
        Sym3 j = t.lengthInertiaM3();
        assertEquals(0.5, j.xx(), TOL);
        assertEquals(2.0 / 12.0, j.yy(), TOL);
        assertEquals(2.0 / 12.0 + 0.5, j.zz(), TOL);
        assertEquals(0.0, j.xy(), TOL);
        assertEquals(2.0, t.massKg(), TOL);
        assertTrue(t.massComplete());
        assertEquals(2e-15, t.errorBoundM(), 1e-30);
    }

    @Test
    void of_oneDrawingWithoutMass_givesPartialMassOfTheOther() {
        // the B10 bar: 0.617 kg/m (FACTS.md section 1.1)
        Totals t = CombinedTotals.of(List.of(rodTotals(0, B10_KG_PER_M), rodTotals(1, null)));
        assertEquals(B10_KG_PER_M, t.massKg(), TOL);
        assertFalse(t.massComplete());
        assertTrue(t.centroidM().closeTo(new Vec3(0.5, 0, 0), TOL));
        assertEquals(2.0, t.lengthM(), TOL);
    }

    @Test
    void of_noMassAnywhere_givesNullMass() {
        Totals t = CombinedTotals.of(List.of(rodTotals(0, null), rodTotals(1, null)));
        assertNull(t.massKg());
        assertNull(t.centroidM());
        assertNull(t.inertiaKgM2());
        assertFalse(t.massComplete());
    }

    @Test
    void covariance_isInverseOfInertiaForm() {
        Sym3 c = new Sym3(1, 0.2, -0.3, 2, 0.4, 3);
        Sym3 back = CombinedTotals.covariance(c.inertiaFromCovariance());
        assertEquals(c.xx(), back.xx(), TOL);
        assertEquals(c.yy(), back.yy(), TOL);
        assertEquals(c.zz(), back.zz(), TOL);
        assertEquals(c.xy(), back.xy(), TOL);
        assertEquals(c.xz(), back.xz(), TOL);
        assertEquals(c.yz(), back.yz(), TOL);
    }
}
