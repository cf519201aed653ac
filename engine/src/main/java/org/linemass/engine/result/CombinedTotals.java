package org.linemass.engine.result;

import java.util.List;
import org.linemass.engine.moments.Moments;
import org.linemass.engine.moments.Sym3;
import org.linemass.geometry.Vec3;

/**
 * Totals of several drawings taken together, as if they were one drawing in one world frame.
 * Centroids and second moments combine by the parallel-axis rule ({@link Moments#plus}); the
 * inertia-form tensors J of the results are turned back into covariances with
 * {@code C = (trace(J)/2) I - J} (since {@code J = trace(C) I - C}). Mass values are combined over
 * the drawings that have a mass; the combined mass is complete only when every drawing's is.
 * An empty list gives zero length and null mass. This is the engine's moment algebra, so the
 * writers print combined totals without doing any of it themselves
 * ({@link DrawingResult#combinedTotals}).
 */
public final class CombinedTotals {

    private CombinedTotals() {
    }

    /** The combined totals of {@code parts}. */
    public static Totals of(List<Totals> parts) {
        Moments length = Moments.ZERO;
        Moments mass = Moments.ZERO;
        double drawn = 0;
        boolean anyMass = false;
        boolean massComplete = !parts.isEmpty();
        boolean inertiaKnown = true;
        for (Totals t : parts) {
            drawn += t.drawnLengthM();
            if (t.lengthM() > 0) {
                length = length.plus(new Moments(t.lengthM(), orZero(t.lengthCentroidM()),
                        covariance(t.lengthInertiaM3()), t.errorBoundM()));
            } else {
                length = length.plus(new Moments(0, Vec3.ZERO, Sym3.ZERO, t.errorBoundM()));
            }
            if (t.massKg() == null) {
                massComplete = false;
                continue;
            }
            massComplete &= t.massComplete();
            anyMass = true;
            if (t.massKg() > 0) {
                inertiaKnown &= t.inertiaKgM2() != null;
                mass = mass.plus(new Moments(t.massKg(), orZero(t.centroidM()), covariance(t.inertiaKgM2()), 0));
            }
        }
        Vec3 lengthCentroid = length.mass() > 0 ? length.centroid() : null;
        Sym3 lengthInertia = length.mass() > 0 ? length.inertia() : Sym3.ZERO;
        Double massKg = anyMass ? mass.mass() : null;
        Vec3 centroid = anyMass && mass.mass() > 0 ? mass.centroid() : null;
        Sym3 inertia = anyMass && mass.mass() > 0 && inertiaKnown ? mass.inertia() : null;
        return new Totals(length.mass(), drawn, lengthCentroid, lengthInertia, massKg, centroid, inertia,
                massComplete && anyMass, length.errorBound());
    }

    /** The covariance C with {@code trace(C) I - C = j}; zero for null. */
    static Sym3 covariance(Sym3 j) {
        if (j == null) {
            return Sym3.ZERO;
        }
        double half = 0.5 * j.trace();
        return new Sym3(half - j.xx(), -j.xy(), -j.xz(), half - j.yy(), -j.yz(), half - j.zz());
    }

    private static Vec3 orZero(Vec3 v) {
        return v == null ? Vec3.ZERO : v;
    }
}
