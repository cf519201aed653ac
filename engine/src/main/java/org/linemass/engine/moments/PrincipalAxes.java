package org.linemass.engine.moments;

import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.EigenDecomposition;
import org.apache.commons.math3.linear.RealVector;
import org.linemass.geometry.Vec3;

/**
 * Principal moments and axes of an inertia-type tensor (e.g. {@link Moments#inertia()} scaled to
 * kg m^2): the eigenvalues in ascending order with unit eigenvectors forming a right-handed frame,
 * and the radii of gyration {@code sqrt(I_k / m)} for a given mass. Eigen-decomposition by Commons
 * Math ({@link EigenDecomposition}, symmetric case).
 *
 * @param moments the three principal moments, ascending
 * @param axes the matching unit axes ({@code axes[2] = axes[0] x axes[1]})
 */
public record PrincipalAxes(double[] moments, Vec3[] axes) {

    public PrincipalAxes {
        moments = moments.clone();
        axes = axes.clone();
    }

    /** The principal moments and axes of a symmetric tensor. */
    public static PrincipalAxes of(Sym3 tensor) {
        EigenDecomposition e = new EigenDecomposition(new Array2DRowRealMatrix(tensor.toMatrix()));
        double[] values = e.getRealEigenvalues();
        Integer[] order = {0, 1, 2};
        java.util.Arrays.sort(order, (a, b) -> Double.compare(values[a], values[b]));
        double[] sorted = new double[3];
        Vec3[] axes = new Vec3[3];
        for (int k = 0; k < 3; k++) {
            sorted[k] = values[order[k]];
            RealVector v = e.getEigenvector(order[k]);
            axes[k] = new Vec3(v.getEntry(0), v.getEntry(1), v.getEntry(2)).unit();
        }
        axes[2] = axes[0].cross(axes[1]).unit();
        return new PrincipalAxes(sorted, axes);
    }

    /** Radii of gyration {@code sqrt(I_k / mass)} for the principal moments (metres). */
    public double[] radiiOfGyration(double mass) {
        if (!(mass > 0)) {
            throw new IllegalArgumentException("radius of gyration needs a positive mass, got " + mass);
        }
        double[] r = new double[3];
        for (int k = 0; k < 3; k++) {
            r[k] = Math.sqrt(Math.max(0, moments[k]) / mass);
        }
        return r;
    }

    @Override
    public double[] moments() {
        return moments.clone();
    }

    @Override
    public Vec3[] axes() {
        return axes.clone();
    }
}
