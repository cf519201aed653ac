package org.linemass.engine.moments;

import org.linemass.geometry.Affine;
import org.linemass.geometry.Vec3;
import org.linemass.tolerance.Tolerances;

/**
 * The moments of a curve with linear density λ: {@code mass = ∫ λ ds} (the length when λ = 1),
 * {@code centroid = (1/mass) ∫ λ r ds} and the central second moment (covariance)
 * {@code covariance = ∫ λ (r - g)(r - g)^T ds}. {@code errorBound} bounds the absolute error of
 * {@code mass}. Central moments are kept (never raw moments about a far origin) so that
 * combination stays accurate. {@link #ZERO} has mass 0 and is the identity of {@link #plus}.
 */
public record Moments(double mass, Vec3 centroid, Sym3 covariance, double errorBound) {

    public static final Moments ZERO = new Moments(0, Vec3.ZERO, Sym3.ZERO, 0);

    /** Combination by the parallel-axis rule: {@code C = Ca + Cb + (ma mb / m)(gb - ga)(gb - ga)^T}. */
    public Moments plus(Moments o) {
        if (o.mass == 0) {
            return new Moments(mass, centroid, covariance.plus(o.covariance), errorBound + o.errorBound);
        }
        if (mass == 0) {
            return new Moments(o.mass, o.centroid, covariance.plus(o.covariance), errorBound + o.errorBound);
        }
        double m = mass + o.mass;
        Vec3 d = o.centroid.minus(centroid);
        Vec3 g = centroid.plusScaled(d, o.mass / m);
        Sym3 c = covariance.plus(o.covariance).plus(Sym3.outer(d).times(mass * o.mass / m));
        return new Moments(m, g, c, errorBound + o.errorBound);
    }

    /** The same moments for a density multiplied by {@code lambda} (kg/m for length moments). */
    public Moments scaledDensity(double lambda) {
        return new Moments(mass * lambda, centroid, covariance.times(lambda), errorBound * Math.abs(lambda));
    }

    /**
     * The moments of the image of the curve under a similarity {@code x' = s Q x + t} for a density
     * fixed per unit length: {@code m' = s m}, {@code g' = s Q g + t}, {@code C' = s^3 Q C Q^T};
     * the error bound scales with s and gains {@link Tolerances#TRANSFORM_ROUNDING} of the new mass for the rounding of the map.
     *
     * @param map a similarity (the caller checks with {@link Affine#similarityScale})
     * @param scale its scale s
     */
    public Moments transformedBySimilarity(Affine map, double scale) {
        double[] m = map.linearRowMajor();
        double[] q = new double[9];
        for (int i = 0; i < 9; i++) {
            q[i] = m[i] / scale;
        }
        double newMass = mass * scale;
        return new Moments(newMass, map.apply(centroid), covariance.rotated(q).times(scale * scale * scale),
                errorBound * scale + Tolerances.TRANSFORM_ROUNDING * Math.abs(newMass));
    }

    /**
     * The moments of the material left when {@code o} (a part of this curve) is taken away: the
     * inverse of {@link #plus}, {@code m = ma - mb}, {@code g = (ma ga - mb gb) / m},
     * {@code C = Ca - Cb - (ma mb / m)(gb - ga)(gb - ga)^T}. Error bounds add (removal is not
     * exact either). Removing everything, to within rounding ({@link Tolerances#REMOVAL_SLACK} relative plus
     * both error bounds), gives a zero-mass result at this centroid.
     *
     * @throws IllegalArgumentException when {@code o} has clearly more mass than this
     */
    public Moments minus(Moments o) {
        if (o.mass == 0) {
            return new Moments(mass, centroid, covariance.minus(o.covariance), errorBound + o.errorBound);
        }
        double m = mass - o.mass;
        double slack = Tolerances.REMOVAL_SLACK * Math.max(Math.abs(mass), Math.abs(o.mass)) + errorBound + o.errorBound;
        if (m <= slack) {
            if (m < -slack) {
                throw new IllegalArgumentException("cannot remove mass " + o.mass + " from mass " + mass);
            }
            return new Moments(0, centroid, Sym3.ZERO, errorBound + o.errorBound);
        }
        Vec3 d = o.centroid.minus(centroid);
        Vec3 g = centroid.plusScaled(d, -o.mass / m);
        Sym3 c = covariance.minus(o.covariance).minus(Sym3.outer(d).times(mass * o.mass / m));
        return new Moments(m, g, c, errorBound + o.errorBound);
    }

    /** Second moment about the centroid in inertia form: {@code trace(C) I - C}. */
    public Sym3 inertia() {
        return covariance.inertiaFromCovariance();
    }
}
