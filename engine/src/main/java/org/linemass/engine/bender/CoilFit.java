package org.linemass.engine.bender;

import java.util.List;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.ArrayRealVector;
import org.apache.commons.math3.linear.EigenDecomposition;
import org.apache.commons.math3.linear.LUDecomposition;
import org.apache.commons.math3.linear.RealVector;
import org.apache.commons.math3.linear.SingularMatrixException;
import org.linemass.geometry.Vec3;

/**
 * Fits a coil to points and unit tangents sampled along a curved run. The axis: the plane normal of
 * a planar run; otherwise the direction in which the tangents do not vary (the eigenvector of the
 * tangents' covariance with the smallest eigenvalue: a helix's tangents sweep a cone about its
 * axis), oriented so the run winds positively about it. The points projected on the plane across the
 * axis get an algebraic least-squares circle (I. Kasa, "A circle fitting procedure and its error
 * analysis", IEEE Trans. Instrum. Meas. 25, 1976); turns are the winding angle about its centre over
 * 2 pi, the mean diameter twice the mean distance from the axis, the pitch the axial advance per turn.
 * Null when the points do not define a circle (collinear, fewer than three).
 */
final class CoilFit {

    /** The fitted coil. */
    record Fit(Vec3 axis, double turns, double pitchM, double meanDiameterM) {
    }

    private CoilFit() {
    }

    static Fit fit(List<Vec3> points, List<Vec3> tangents, Vec3 planeNormal) {
        int n = points.size();
        if (n < 3) {
            return null;
        }
        Vec3 axis = planeNormal != null ? planeNormal : helixAxis(tangents);
        if (axis == null) {
            return null;
        }
        Vec3 e1 = anyPerpendicular(axis);
        Vec3 e2 = axis.cross(e1);
        Vec3 o = points.get(0);
        double[] x = new double[n];
        double[] y = new double[n];
        double[][] a = new double[3][3];
        double[] b = new double[3];
        for (int i = 0; i < n; i++) {
            Vec3 d = points.get(i).minus(o);
            x[i] = d.dot(e1);
            y[i] = d.dot(e2);
            double[] row = {x[i], y[i], 1};
            double rhs = -(x[i] * x[i] + y[i] * y[i]);
            for (int r = 0; r < 3; r++) {
                for (int c = 0; c < 3; c++) {
                    a[r][c] += row[r] * row[c];
                }
                b[r] += row[r] * rhs;
            }
        }
        RealVector sol;
        try {
            sol = new LUDecomposition(new Array2DRowRealMatrix(a, false)).getSolver().solve(new ArrayRealVector(b));
        } catch (SingularMatrixException e) {
            return null;
        }
        double cx = -sol.getEntry(0) / 2;
        double cy = -sol.getEntry(1) / 2;
        if (!Double.isFinite(cx) || !Double.isFinite(cy)) {
            return null;
        }
        double winding = 0;
        double radiusSum = 0;
        for (int i = 0; i < n; i++) {
            double ux = x[i] - cx;
            double uy = y[i] - cy;
            radiusSum += Math.hypot(ux, uy);
            if (i + 1 < n) {
                double vx = x[i + 1] - cx;
                double vy = y[i + 1] - cy;
                winding += Math.atan2(ux * vy - uy * vx, ux * vx + uy * vy);
            }
        }
        if (winding < 0) {
            axis = axis.negate();
            winding = -winding;
        }
        double turns = winding / (2 * Math.PI);
        double advance = Math.abs(points.get(n - 1).minus(o).dot(axis));
        double pitch = turns > 0 ? advance / turns : 0;
        return new Fit(axis, turns, pitch, 2 * radiusSum / n);
    }

    /** The unit direction across which the tangents vary least; null when they do not vary. */
    private static Vec3 helixAxis(List<Vec3> tangents) {
        int n = tangents.size();
        Vec3 mean = Vec3.ZERO;
        for (Vec3 t : tangents) {
            mean = mean.plus(t);
        }
        mean = mean.times(1.0 / n);
        double[][] m = new double[3][3];
        for (Vec3 t : tangents) {
            double[] d = t.minus(mean).toArray();
            for (int r = 0; r < 3; r++) {
                for (int c = 0; c < 3; c++) {
                    m[r][c] += d[r] * d[c];
                }
            }
        }
        EigenDecomposition eig = new EigenDecomposition(new Array2DRowRealMatrix(m, false));
        int best = 0;
        for (int i = 1; i < 3; i++) {
            if (eig.getRealEigenvalue(i) < eig.getRealEigenvalue(best)) {
                best = i;
            }
        }
        RealVector v = eig.getEigenvector(best);
        Vec3 axis = new Vec3(v.getEntry(0), v.getEntry(1), v.getEntry(2));
        double norm = axis.norm();
        return norm > 0 && Double.isFinite(norm) ? axis.times(1 / norm) : null;
    }

    /** A unit vector perpendicular to the unit vector {@code a}. */
    static Vec3 anyPerpendicular(Vec3 a) {
        Vec3 trial = Math.abs(a.x()) < 0.9 ? Vec3.X : Vec3.Y;
        return trial.minus(a.times(trial.dot(a))).unit();
    }
}
