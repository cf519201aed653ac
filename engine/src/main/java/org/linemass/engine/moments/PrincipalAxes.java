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

    /**
     * The principal moments and axes of a symmetric tensor.
     *
     * @throws IllegalArgumentException when an entry is not finite or the decomposition does not
     *         converge (see {@link #tryOf})
     */
    public static PrincipalAxes of(Sym3 tensor) {
        return tryOf(tensor).orElseThrow(() -> new IllegalArgumentException(
                "principal axes of a tensor with non-finite entries or too far out of scale: " + tensor));
    }

    /**
     * The principal moments and axes, or empty when an entry is not finite or the iteration does
     * not converge. When the iteration does not converge on the tensor as given (entries near the
     * double range, as placed copies of huge drawings give), it is tried once more on the tensor
     * divided by its largest entry and the moments multiplied back.
     */
    public static java.util.Optional<PrincipalAxes> tryOf(Sym3 tensor) {
        double[][] m = tensor.toMatrix();
        double scale = 0;
        for (double[] row : m) {
            for (double x : row) {
                if (!Double.isFinite(x)) {
                    return java.util.Optional.empty();
                }
                scale = Math.max(scale, Math.abs(x));
            }
        }
        EigenDecomposition e = decompose(m);
        if (e == null && scale > 0) {
            // out of scale for the iteration: decompose the tensor divided by its largest entry
            for (double[] row : m) {
                for (int j = 0; j < row.length; j++) {
                    row[j] /= scale;
                }
            }
            e = decompose(m);
        } else {
            scale = 1;
        }
        if (e == null) {
            return java.util.Optional.empty();
        }
        double[] values = e.getRealEigenvalues().clone();
        for (int k = 0; k < values.length; k++) {
            values[k] *= scale;
        }
        Integer[] order = {0, 1, 2};
        java.util.Arrays.sort(order, (a, b) -> Double.compare(values[a], values[b]));
        double[] sorted = new double[3];
        Vec3[] axes = new Vec3[3];
        for (int k = 0; k < 3; k++) {
            sorted[k] = values[order[k]];
            RealVector v = e.getEigenvector(order[k]);
            Vec3 axis = new Vec3(v.getEntry(0), v.getEntry(1), v.getEntry(2));
            if (!Double.isFinite(sorted[k]) || !axis.isFinite() || !(axis.norm() > 0)) {
                return java.util.Optional.empty(); // the iteration ran out of range
            }
            axes[k] = axis.unit();
        }
        Vec3 third = axes[0].cross(axes[1]);
        if (!third.isFinite() || !(third.norm() > 0)) {
            return java.util.Optional.empty();
        }
        axes[2] = third.unit();
        for (int k = 0; k < 3; k++) {
            if (!Double.isFinite(sorted[k]) || !axes[k].isFinite()) {
                return java.util.Optional.empty();
            }
        }
        return java.util.Optional.of(new PrincipalAxes(sorted, axes));
    }

    private static EigenDecomposition decompose(double[][] m) {
        try {
            return new EigenDecomposition(new Array2DRowRealMatrix(m));
        } catch (org.apache.commons.math3.exception.MathIllegalStateException ex) {
            return null;
        }
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
