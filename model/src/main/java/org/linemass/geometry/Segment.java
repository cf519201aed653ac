package org.linemass.geometry;

/**
 * One exact parametric curve piece {@code C(t)}, {@code t} in [{@link #tStart()}, {@link #tEnd()}],
 * with {@code tStart < tEnd} except for a degenerate (zero-length) straight. Coordinates are in
 * whatever frame the owner says (block frame in the importer's model, world metres in the engine).
 * Immutable; every operation returns a new segment with the same provenance.
 */
public sealed interface Segment permits Straight, CircularArc, EllipticalArc, Nurbs {

    Vec3 point(double t);

    /** First derivative dC/dt. */
    Vec3 derivative(double t);

    /** Second derivative d²C/dt². */
    Vec3 secondDerivative(double t);

    double tStart();

    double tEnd();

    /** A box that contains the whole curve (tight for straights and arcs, the control hull for NURBS). */
    Box3 bounds();

    /** The image of this curve under an affine map (exact: arcs may become elliptical arcs). */
    Segment transformed(Affine map);

    /** The same point set traversed the other way. */
    Segment reversed();

    Provenance source();

    Segment withSource(Provenance source);

    /**
     * Parameters inside the open range where the curve is only piecewise smooth (NURBS knots);
     * integrators split there. Empty for analytic curves.
     */
    default double[] breakpoints() {
        return new double[0];
    }

    default Vec3 start() {
        return point(tStart());
    }

    default Vec3 end() {
        return point(tEnd());
    }

    /** Short name of the curve kind used in reports: line, circular_arc, ellipse_arc or spline. */
    String kind();
}
