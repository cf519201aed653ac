package org.linemass.engine.pieces.marks;

import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.RealMatrix;
import org.apache.commons.math3.linear.SingularValueDecomposition;

/**
 * Best-fit rigid motion of one point set onto another with the points in correspondence (Kabsch
 * 1976: R = V U^T from the SVD of the cross-covariance U S V^T, with the last axis flipped when
 * a proper rotation is required and det(V U^T) &lt; 0), and the largest distance left after it.
 */
final class RigidFit {

    private RigidFit() {
    }

    /**
     * Largest residual after moving {@code a} onto {@code b} (both n x 3, row i corresponding).
     *
     * @param allowMirror whether an improper orthogonal map (a mirror) may be used
     */
    static double maxDeviation(double[][] a, double[][] b, boolean allowMirror) {
        int n = a.length;
        double[] ca = centroid(a);
        double[] cb = centroid(b);
        double[][] h = new double[3][3];
        for (int i = 0; i < n; i++) {
            for (int r = 0; r < 3; r++) {
                double ar = a[i][r] - ca[r];
                for (int c = 0; c < 3; c++) {
                    h[r][c] += ar * (b[i][c] - cb[c]);
                }
            }
        }
        SingularValueDecomposition svd = new SingularValueDecomposition(new Array2DRowRealMatrix(h, false));
        RealMatrix u = svd.getU();
        RealMatrix v = svd.getV();
        RealMatrix rot = v.multiply(u.transpose());
        if (!allowMirror && det(rot) < 0) {
            RealMatrix flip = new Array2DRowRealMatrix(new double[][] {{1, 0, 0}, {0, 1, 0}, {0, 0, -1}}, false);
            rot = v.multiply(flip).multiply(u.transpose());
        }
        double[][] m = rot.getData();
        double worst = 0;
        for (int i = 0; i < n; i++) {
            double d2 = 0;
            for (int r = 0; r < 3; r++) {
                double x = cb[r] - b[i][r];
                for (int c = 0; c < 3; c++) {
                    x += m[r][c] * (a[i][c] - ca[c]);
                }
                d2 += x * x;
            }
            worst = Math.max(worst, d2);
        }
        return Math.sqrt(worst);
    }

    /** The mean of the points (each {x, y, z}). */
    static double[] centroid(double[][] p) {
        double[] c = new double[3];
        for (double[] q : p) {
            c[0] += q[0];
            c[1] += q[1];
            c[2] += q[2];
        }
        for (int r = 0; r < 3; r++) {
            c[r] /= p.length;
        }
        return c;
    }

    private static double det(RealMatrix m) {
        double[][] a = m.getData();
        return a[0][0] * (a[1][1] * a[2][2] - a[1][2] * a[2][1]) - a[0][1] * (a[1][0] * a[2][2] - a[1][2] * a[2][0])
                + a[0][2] * (a[1][0] * a[2][1] - a[1][1] * a[2][0]);
    }
}
