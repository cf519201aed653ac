package org.linemass.engine.integrate;

import org.linemass.engine.moments.Moments;
import org.linemass.engine.moments.Sym3;
import org.linemass.geometry.Straight;
import org.linemass.geometry.Vec3;
import org.linemass.tolerance.Tolerances;

/**
 * Closed-form length moments of a straight segment (unit density): {@code L = |b - a|},
 * {@code g = (a + b) / 2}, {@code C = (L / 12)(b - a)(b - a)^T} (thin rod, e.g. Beer and Johnston,
 * Vector Mechanics, ch. 9). The error bound is {@link Tolerances#CLOSED_FORM_ROUNDING_ULPS} units of double rounding times
 * the length. A zero-length segment has mass 0 at its point.
 */
public final class StraightMoments {

    private StraightMoments() {
    }

    public static Moments of(Straight s) {
        Vec3 d = s.b().minus(s.a());
        double length = d.norm();
        Vec3 g = s.a().plusScaled(d, 0.5);
        if (length == 0) {
            return new Moments(0, g, Sym3.ZERO, 0);
        }
        return new Moments(length, g, Sym3.outer(d).times(length / 12), Tolerances.CLOSED_FORM_ROUNDING_ULPS * Math.ulp(1.0) * length);
    }
}
