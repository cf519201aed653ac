package org.linemass.engine.pieces.marks;

import java.util.List;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.RealMatrix;
import org.apache.commons.math3.linear.SingularValueDecomposition;
import org.linemass.tolerance.Tolerances;

/** The geometric test of {@link Grouper}: one piece's samples against another's starts and directions. */
final class Congruence {

    /** Height of the lift point off a planar piece, in piece lengths (any size of that order works). */
    static final double LIFT_FRACTION = 0.5;

    private Congruence() {
    }

    /** Samples of a group leader: from its start (open) or first run start (closed), forward. */
    static double[][] reference(PieceShape s) {
        double start = s.closed() ? s.runStarts().get(0) : 0;
        return s.samples(start, Grouper.samplesFor(s), false);
    }

    static boolean matches(PieceShape lead, double[][] leadSamples, PieceShape other, double tol, boolean mirror) {
        int n = leadSamples.length;
        if (Grouper.samplesFor(other) != n) {
            return false;
        }
        // with mirror grouping every orthogonal map is allowed and the lift would only add the
        // out-of-plane wobble of a nearly planar piece to the residual
        double[] na = mirror ? null : planeNormal(leadSamples, tol);
        double[] nb = na == null ? null : planeNormal(other.samples(0, n, false), tol);
        boolean planar = na != null && nb != null;
        double lift = LIFT_FRACTION * lead.length();
        double[][] a = planar ? lifted(leadSamples, na, lift) : leadSamples;
        List<Double> starts = other.closed() ? other.runStarts() : List.of(0.0);
        int tries = Math.min(starts.size(), Grouper.MAX_LOOP_STARTS);
        for (int k = 0; k < tries; k++) {
            for (boolean reverse : new boolean[] {false, true}) {
                double[][] b = other.samples(starts.get(k), n, reverse);
                if (planar) {
                    b = lifted(b, nb, lift);
                }
                if (RigidFit.maxDeviation(a, b, mirror) <= tol) {
                    return true;
                }
            }
        }
        return false;
    }

    /**
     * The canonical unit normal of the plane the samples lie in, or null when they do not lie in
     * one plane within {@code tol} or lie on one line within {@code tol}. The plane is the total
     * least-squares fit (smallest singular vector of the centred samples' scatter matrix); the
     * normal's sign makes its largest-magnitude component positive, components within
     * {@link Tolerances#NORMAL_TIE} of the largest counting as tied and then z before y before x (so a
     * drawing in plan gets +z).
     */
    static double[] planeNormal(double[][] p, double tol) {
        double[] c = RigidFit.centroid(p);
        double[][] m = new double[3][3];
        for (double[] q : p) {
            for (int r = 0; r < 3; r++) {
                for (int k = 0; k < 3; k++) {
                    m[r][k] += (q[r] - c[r]) * (q[k] - c[k]);
                }
            }
        }
        RealMatrix u = new SingularValueDecomposition(new Array2DRowRealMatrix(m, false)).getU();
        double[] axis = u.getColumn(0);
        double[] normal = u.getColumn(2);
        double off = 0;
        double wide = 0;
        for (double[] q : p) {
            double[] d = {q[0] - c[0], q[1] - c[1], q[2] - c[2]};
            off = Math.max(off, Math.abs(dot(d, normal)));
            double along = dot(d, axis);
            wide = Math.max(wide, Math.sqrt(Math.max(0, dot(d, d) - along * along)));
        }
        if (off > tol || !(wide > tol)) {
            return null;
        }
        double big = Math.max(Math.abs(normal[0]), Math.max(Math.abs(normal[1]), Math.abs(normal[2])));
        int lead = 0;
        for (int k = 2; k >= 0; k--) {
            if (Math.abs(normal[k]) >= big - Tolerances.NORMAL_TIE) {
                lead = k;
                break;
            }
        }
        if (normal[lead] < 0) {
            for (int k = 0; k < 3; k++) {
                normal[k] = -normal[k];
            }
        }
        return normal;
    }

    private static double dot(double[] a, double[] b) {
        return a[0] * b[0] + a[1] * b[1] + a[2] * b[2];
    }

    /** The samples plus one point {@code h} along {@code normal} from their centroid. */
    private static double[][] lifted(double[][] p, double[] normal, double h) {
        double[] c = RigidFit.centroid(p);
        double[][] out = java.util.Arrays.copyOf(p, p.length + 1);
        out[p.length] = new double[] {c[0] + h * normal[0], c[1] + h * normal[1], c[2] + h * normal[2]};
        return out;
    }
}
