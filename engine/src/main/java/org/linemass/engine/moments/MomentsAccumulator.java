package org.linemass.engine.moments;

import org.linemass.geometry.Vec3;

/**
 * Sums many {@link Moments} with compensated (Kahan-Babuska-Neumaier) summation, so that adding a
 * million segment moments loses no more accuracy than adding a handful.
 *
 * <p>Algorithm: every added item is written about a fixed reference point {@code r0} (the centroid
 * of the first item with mass, which lies inside the data): the accumulator keeps compensated sums
 * of {@code m}, {@code m (g - r0)} and {@code C + m (g - r0)(g - r0)^T}; {@link #result()} moves
 * back to the centroid by the parallel-axis rule. Because {@code r0} lies among the items, the final
 * subtraction loses at most a few bits, unlike raw moments about a far-away origin. Error bounds
 * are summed (also compensated). Items of zero mass contribute their covariance and error bound.
 *
 * <p>Not thread-safe: confine an instance to one thread, or give each thread its own and combine
 * their results with {@link Moments#plus}.
 */
public final class MomentsAccumulator {

    private final CompensatedSum mass = new CompensatedSum();
    private final CompensatedSum[] first = {new CompensatedSum(), new CompensatedSum(), new CompensatedSum()};
    private final CompensatedSum[] second = new CompensatedSum[6];
    private final CompensatedSum error = new CompensatedSum();
    private Vec3 reference;
    private long count;

    public MomentsAccumulator() {
        for (int i = 0; i < 6; i++) {
            second[i] = new CompensatedSum();
        }
    }

    /** Adds one item; returns this accumulator. */
    public MomentsAccumulator add(Moments m) {
        count++;
        error.add(m.errorBound());
        Sym3 c = m.covariance();
        if (m.mass() == 0) {
            addSecond(c);
            return this;
        }
        if (reference == null) {
            reference = m.centroid();
        }
        Vec3 d = m.centroid().minus(reference);
        double w = m.mass();
        mass.add(w);
        first[0].add(w * d.x());
        first[1].add(w * d.y());
        first[2].add(w * d.z());
        addSecond(c.plus(Sym3.outer(d).times(w)));
        return this;
    }

    /** Adds every item of {@code other} (its current result) to this one. */
    public MomentsAccumulator addAll(MomentsAccumulator other) {
        count += other.count - 1;
        return add(other.result());
    }

    private void addSecond(Sym3 c) {
        second[0].add(c.xx());
        second[1].add(c.xy());
        second[2].add(c.xz());
        second[3].add(c.yy());
        second[4].add(c.yz());
        second[5].add(c.zz());
    }

    /** Number of items added so far. */
    public long count() {
        return count;
    }

    /** The combined moments of every item added so far ({@link Moments#ZERO} when none had mass). */
    public Moments result() {
        double m = mass.value();
        Sym3 s = new Sym3(second[0].value(), second[1].value(), second[2].value(), second[3].value(),
                second[4].value(), second[5].value());
        if (reference == null || m == 0) {
            return new Moments(0, reference == null ? Vec3.ZERO : reference, s, error.value());
        }
        Vec3 d = new Vec3(first[0].value() / m, first[1].value() / m, first[2].value() / m);
        Sym3 c = s.minus(Sym3.outer(d).times(m));
        return new Moments(m, reference.plus(d), c, error.value());
    }
}
