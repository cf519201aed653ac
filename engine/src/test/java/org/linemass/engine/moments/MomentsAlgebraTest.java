package org.linemass.engine.moments;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.linemass.engine.integrate.StraightMoments;
import org.linemass.geometry.Provenance;
import org.linemass.geometry.Straight;
import org.linemass.geometry.Vec3;
import org.junit.jupiter.api.Test;

class MomentsAlgebraTest {

    private static final Provenance SRC = Provenance.of("t", "0", 0, "", "LINE");

    @Test
    void accumulator_millionPiecesOfARod_farFromOrigin() {
        // a 1 m rod at x = 1e6 m cut into 10^6 equal pieces; closed form for the whole rod:
        // L = 1, g = 1e6 + 0.5, C_xx = L^3/12 (thin rod, FACTS.md §5.2)
        double x0 = 1e6;
        int n = 1_000_000;
        MomentsAccumulator acc = new MomentsAccumulator();
        Moments naive = Moments.ZERO;
        for (int i = 0; i < n; i++) {
            Straight s = new Straight(new Vec3(x0 + (double) i / n, 0, 0), new Vec3(x0 + (double) (i + 1) / n, 0, 0),
                    SRC);
            Moments m = StraightMoments.of(s);
            acc.add(m);
            if (i < 1000) {
                naive = naive.plus(m);
            }
        }
        Moments r = acc.result();
        // coordinates near 1e6 carry 1.2e-10 m rounding each, so piece lengths are off by up to ~2e-10 relative
        // to 1e-6; the sum of 10^6 such lengths stays within about 1e-9 of 1
        assertEquals(1.0, r.mass(), 1e-9);
        assertEquals(x0 + 0.5, r.centroid().x(), 1e-9);
        assertEquals(1.0 / 12, r.covariance().xx(), 1e-9);
        assertEquals(n, acc.count());
    }

    @Test
    void minus_invertsPlus() {
        Moments a = StraightMoments.of(new Straight(new Vec3(0, 0, 0), new Vec3(3, 4, 0), SRC));
        Moments b = StraightMoments.of(new Straight(new Vec3(10, 0, 1), new Vec3(10, 2, 1), SRC));
        Moments back = a.plus(b).minus(b);
        assertEquals(a.mass(), back.mass(), 1e-14);
        assertTrue(a.centroid().closeTo(back.centroid(), 1e-13));
        assertEquals(0, a.covariance().minus(back.covariance()).maxAbs(), 1e-12);
        Moments none = a.minus(a);
        assertEquals(0, none.mass(), 0);
        assertThrows(IllegalArgumentException.class, () -> b.minus(a));
    }

    @Test
    void principalAxes_ofTiltedRod() {
        // thin rod of length 2 m along (1,1,1)/sqrt(3), 1 kg/m: principal moments 0, mL^2/12, mL^2/12
        // (FACTS.md §5.2), axis of the smallest along the rod
        Vec3 d = new Vec3(1, 1, 1).unit();
        Moments m = StraightMoments.of(new Straight(d.negate(), d, SRC));
        PrincipalAxes p = PrincipalAxes.of(m.inertia());
        double[] moments = p.moments();
        assertEquals(0, moments[0], 1e-14);
        assertEquals(2.0 * 4 / 12, moments[1], 1e-14);
        assertEquals(2.0 * 4 / 12, moments[2], 1e-14);
        assertEquals(1, Math.abs(p.axes()[0].dot(d)), 1e-12);
        // radius of gyration about a transverse axis: L / sqrt(12)
        assertEquals(2 / Math.sqrt(12), p.radiiOfGyration(m.mass())[2], 1e-14);
    }

    @Test
    void transformBySimilarity_scalesMassAndCovariance() {
        Moments m = StraightMoments.of(new Straight(Vec3.ZERO, new Vec3(1, 0, 0), SRC));
        org.linemass.geometry.Affine map = org.linemass.geometry.Affine.rotationZ(Math.PI / 2)
                .andThen(org.linemass.geometry.Affine.uniformScale(3));
        Moments t = m.transformedBySimilarity(map, 3);
        Moments direct = StraightMoments.of(new Straight(Vec3.ZERO, new Vec3(0, 3, 0), SRC));
        assertEquals(direct.mass(), t.mass(), 1e-15);
        assertTrue(direct.centroid().closeTo(t.centroid(), 1e-15));
        assertEquals(0, direct.covariance().minus(t.covariance()).maxAbs(), 1e-14);
    }
}
