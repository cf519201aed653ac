package org.linemass.engine.integrate;

import org.linemass.engine.moments.Moments;
import org.linemass.engine.moments.Sym3;
import org.linemass.geometry.CircularArc;
import org.linemass.geometry.Vec3;
import org.linemass.tolerance.Tolerances;

/**
 * Closed-form length moments of a circular arc (unit density), written in the frame of the arc's
 * bisector so that short arcs lose no digits. With half-sweep {@code a}, radius {@code R}, bisector
 * direction {@code e1} and in-plane normal {@code e2}: {@code L = 2 R a},
 * {@code g = c + R (sin a / a) e1} (centroid of a circular arc, r sin a / a: Beer and Johnston,
 * Vector Mechanics: Statics, Fig. 5.8B), and the central second moment
 * {@code C = R^3 [f1(a) e2 e2^T + f2(a) e1 e1^T]} with {@code f1 = a - sin a cos a} and
 * {@code f2 = a + sin a cos a - 2 sin^2 a / a}; both are summed from their Taylor series below
 * {@link Tolerances#ARC_SERIES_BELOW_RAD} to avoid the cancellation of the closed forms (f2 ~ 2a^5/45). The error
 * bound is {@link Tolerances#CLOSED_FORM_ROUNDING_ULPS} units of rounding times the length.
 */
public final class ArcMoments {

    private ArcMoments() {
    }

    public static Moments of(CircularArc arc) {
        double half = 0.5 * (arc.t1() - arc.t0());
        double mid = 0.5 * (arc.t0() + arc.t1());
        double r = arc.radius();
        Vec3 e1 = arc.u().times(Math.cos(mid)).plusScaled(arc.v(), Math.sin(mid));
        Vec3 e2 = arc.u().times(-Math.sin(mid)).plusScaled(arc.v(), Math.cos(mid));
        double length = 2 * r * half;
        Vec3 g = arc.centre().plusScaled(e1, r * sinc(half));
        double r3 = r * r * r;
        Sym3 c = Sym3.outer(e2).times(r3 * f1(half)).plus(Sym3.outer(e1).times(r3 * f2(half)));
        return new Moments(length, g, c, Tolerances.CLOSED_FORM_ROUNDING_ULPS * Math.ulp(1.0) * length);
    }

    /** sin(a)/a. */
    static double sinc(double a) {
        if (Math.abs(a) < Tolerances.SINC_SERIES_BELOW_RAD) {
            double a2 = a * a;
            return 1 - a2 / 6 + a2 * a2 / 120;
        }
        return Math.sin(a) / a;
    }

    /** a - sin(a) cos(a) = sum over k >= 1 of (-1)^(k+1) 2^(2k) a^(2k+1) / (2k+1)!. */
    static double f1(double a) {
        if (a >= Tolerances.ARC_SERIES_BELOW_RAD) {
            return a - 0.5 * Math.sin(2 * a);
        }
        double a2 = a * a;
        double term = a; // 2^(2k) a^(2k+1) / (2k+1)! at k = 0
        double sum = 0;
        for (int k = 1; k < 40; k++) {
            term *= 4 * a2 / ((2.0 * k) * (2.0 * k + 1));
            double t = (k % 2 == 1) ? term : -term;
            sum += t;
            if (Math.abs(t) <= Tolerances.SERIES_TERM_RELATIVE * Math.abs(sum)) {
                break;
            }
        }
        return sum;
    }

    /** a + sin(a) cos(a) - 2 sin^2(a) / a = sum over k >= 2 of (-1)^k 2^(2k) (2k - 2) a^(2k+1) / (2k+2)!. */
    static double f2(double a) {
        if (a >= Tolerances.ARC_SERIES_BELOW_RAD) {
            double s = Math.sin(a);
            return a + 0.5 * Math.sin(2 * a) - 2 * s * s / a;
        }
        double a2 = a * a;
        // p_k = 2^(2k) a^(2k+1) / (2k+2)!; p_1 = 4 a^3 / 24
        double p = 4 * a2 * a / 24;
        double sum = 0;
        for (int k = 2; k < 40; k++) {
            p *= 4 * a2 / ((2.0 * k + 1) * (2.0 * k + 2));
            double t = (k % 2 == 0 ? 1 : -1) * (2.0 * k - 2) * p;
            sum += t;
            if (Math.abs(t) <= Tolerances.SERIES_TERM_RELATIVE * Math.abs(sum)) {
                break;
            }
        }
        return sum;
    }
}
