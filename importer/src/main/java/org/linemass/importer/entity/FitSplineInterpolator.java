package org.linemass.importer.entity;

import org.linemass.geometry.Nurbs;
import org.linemass.geometry.Provenance;
import org.linemass.geometry.Vec3;

/**
 * The cubic a SPLINE given by fit points only stands for: the clamped C2 cubic B-spline through
 * the fit points Q0..Qn with knots at the cumulative chord lengths u0 = 0, uk = uk-1 + |Qk - Qk-1|
 * (interior knots simple, end knots fourfold). At an end with a tangent the first derivative with
 * respect to that chord-length parameter equals the unit tangent; at an end without one the
 * second derivative is zero (natural end). This is the convention the corpus manifest documents
 * for fit-point splines; The NURBS Book §9.2 gives the collocation equations. Consecutive equal fit
 * points are merged. The banded system (bandwidth 2) is solved by elimination without pivoting,
 * which is stable for B-spline collocation matrices (de Boor).
 */
final class FitSplineInterpolator {

    private static final int DEGREE = 3;

    private FitSplineInterpolator() {
    }

    static Nurbs interpolate(Vec3[] fitIn, Vec3 startTangent, Vec3 endTangent, Provenance p) throws EntitySkip {
        Vec3[] q = new Vec3[fitIn.length];
        int m = 0;
        for (Vec3 f : fitIn) {
            if (m == 0 || !f.equals(q[m - 1])) {
                q[m++] = f;
            }
        }
        if (m < 2) {
            throw new EntitySkip("fit points are all equal; no curve to interpolate");
        }
        int n = m - 1;
        double[] u = new double[m];
        for (int k = 1; k < m; k++) {
            u[k] = u[k - 1] + q[k].distance(q[k - 1]);
        }
        int nc = n + 3;
        double[] knots = new double[nc + DEGREE + 1];
        for (int i = 0; i < knots.length; i++) {
            int k = Math.min(Math.max(i - DEGREE, 0), n);
            knots[i] = u[k];
        }
        Vec3 d0 = unitOrNull(startTangent, "start");
        Vec3 dn = unitOrNull(endTangent, "end");
        double[][] band = new double[nc][5];
        Vec3[] rhs = new Vec3[nc];
        set(band, 0, 0, 1);
        rhs[0] = q[0];
        set(band, nc - 1, nc - 1, 1);
        rhs[nc - 1] = q[n];
        double[] kn = knots;
        if (d0 != null) {
            double f = DEGREE / (kn[4] - kn[1]);
            set(band, 1, 0, -f);
            set(band, 1, 1, f);
            rhs[1] = d0;
        } else {
            double a = 6 / (kn[4] - kn[2]);
            double f1 = 1 / (kn[4] - kn[1]);
            double f2 = 1 / (kn[5] - kn[2]);
            set(band, 1, 0, a * f1);
            set(band, 1, 1, -a * (f1 + f2));
            set(band, 1, 2, a * f2);
            rhs[1] = Vec3.ZERO;
        }
        int last = nc - 1;
        if (dn != null) {
            double f = DEGREE / (kn[last + DEGREE] - kn[last]);
            set(band, last - 1, last - 1, -f);
            set(band, last - 1, last, f);
            rhs[last - 1] = dn;
        } else {
            double a = 6 / (kn[last + 2] - kn[last]);
            double f1 = 1 / (kn[last + 3] - kn[last]);
            double f2 = 1 / (kn[last + 2] - kn[last - 1]);
            set(band, last - 1, last, a * f1);
            set(band, last - 1, last - 1, -a * (f1 + f2));
            set(band, last - 1, last - 2, a * f2);
            rhs[last - 1] = Vec3.ZERO;
        }
        double[] basis = new double[DEGREE + 1];
        for (int k = 1; k < n; k++) {
            int span = k + DEGREE;
            basisFunctions(span, u[k], knots, basis);
            for (int j = 0; j <= DEGREE; j++) {
                int col = span - DEGREE + j;
                if (basis[j] != 0) {
                    set(band, k + 1, col, basis[j]);
                }
            }
            rhs[k + 1] = q[k];
        }
        Vec3[] ctrl = solve(band, rhs);
        for (Vec3 c : ctrl) {
            if (!c.isFinite()) {
                throw new EntitySkip("fit points do not give a finite interpolating curve");
            }
        }
        return Nurbs.of(DEGREE, knots, ctrl, null, p);
    }

    private static Vec3 unitOrNull(Vec3 t, String which) throws EntitySkip {
        if (t == null) {
            return null;
        }
        double len = t.norm();
        if (!(len > 0)) {
            throw new EntitySkip(which + " tangent is zero");
        }
        return t.times(1 / len);
    }

    private static void set(double[][] band, int row, int col, double v) {
        int d = col - row + 2;
        if (d < 0 || d > 4) {
            throw new IllegalStateException("band index out of range: row " + row + ", column " + col);
        }
        band[row][d] = v;
    }

    /** The NURBS Book A2.2: the DEGREE + 1 non-zero basis functions at u in knot span {@code span}. */
    private static void basisFunctions(int span, double u, double[] knots, double[] out) {
        double[] left = new double[DEGREE + 1];
        double[] right = new double[DEGREE + 1];
        out[0] = 1;
        for (int j = 1; j <= DEGREE; j++) {
            left[j] = u - knots[span + 1 - j];
            right[j] = knots[span + j] - u;
            double saved = 0;
            for (int r = 0; r < j; r++) {
                double temp = out[r] / (right[r + 1] + left[j - r]);
                out[r] = saved + right[r + 1] * temp;
                saved = left[j - r] * temp;
            }
            out[j] = saved;
        }
    }

    /** Banded elimination without pivoting (bandwidth 2 on each side), then back substitution. */
    private static Vec3[] solve(double[][] band, Vec3[] rhs) throws EntitySkip {
        int n = rhs.length;
        double[][] b = new double[n][3];
        for (int i = 0; i < n; i++) {
            b[i][0] = rhs[i].x();
            b[i][1] = rhs[i].y();
            b[i][2] = rhs[i].z();
        }
        for (int k = 0; k < n; k++) {
            double pivot = band[k][2];
            if (pivot == 0 || !Double.isFinite(pivot)) {
                throw new EntitySkip("fit points give a singular interpolation system");
            }
            for (int i = k + 1; i <= Math.min(n - 1, k + 2); i++) {
                double f = band[i][k - i + 2] / pivot;
                if (f == 0) {
                    continue;
                }
                for (int j = k; j <= Math.min(n - 1, k + 2); j++) {
                    band[i][j - i + 2] -= f * band[k][j - k + 2];
                }
                for (int c = 0; c < 3; c++) {
                    b[i][c] -= f * b[k][c];
                }
            }
        }
        Vec3[] x = new Vec3[n];
        double[][] xs = new double[n][3];
        for (int i = n - 1; i >= 0; i--) {
            for (int c = 0; c < 3; c++) {
                double s = b[i][c];
                for (int j = i + 1; j <= Math.min(n - 1, i + 2); j++) {
                    s -= band[i][j - i + 2] * xs[j][c];
                }
                xs[i][c] = s / band[i][2];
            }
            x[i] = new Vec3(xs[i][0], xs[i][1], xs[i][2]);
        }
        return x;
    }
}
