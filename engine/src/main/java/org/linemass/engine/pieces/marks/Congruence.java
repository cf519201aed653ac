package org.linemass.engine.pieces.marks;

import java.util.List;

/** The geometric test of {@link Grouper}: one piece's samples against another's starts and directions. */
final class Congruence {

    /** Height of the lift point above a flat piece, in piece lengths (any size of that order works). */
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
        boolean flat = flatInPlan(leadSamples, tol) && flatInPlan(other.samples(0, n, false), tol);
        double lift = LIFT_FRACTION * lead.length();
        double[][] a = flat ? lifted(leadSamples, lift) : leadSamples;
        List<Double> starts = other.closed() ? other.runStarts() : List.of(0.0);
        int tries = Math.min(starts.size(), Grouper.MAX_LOOP_STARTS);
        for (int k = 0; k < tries; k++) {
            for (boolean reverse : new boolean[] {false, true}) {
                double[][] b = other.samples(starts.get(k), n, reverse);
                if (flat) {
                    b = lifted(b, lift);
                }
                if (RigidFit.maxDeviation(a, b, mirror) <= tol) {
                    return true;
                }
            }
        }
        return false;
    }

    /** Every sample at one height (within tol) and not all on one line. */
    static boolean flatInPlan(double[][] p, double tol) {
        double z = p[0][2];
        for (double[] q : p) {
            if (Math.abs(q[2] - z) > tol) {
                return false;
            }
        }
        double[] a = p[0];
        double[] far = a;
        double best = -1;
        for (double[] q : p) {
            double d = Math.hypot(q[0] - a[0], q[1] - a[1]);
            if (d > best) {
                best = d;
                far = q;
            }
        }
        double dx = far[0] - a[0];
        double dy = far[1] - a[1];
        double len = Math.hypot(dx, dy);
        if (!(len > 0)) {
            return false;
        }
        for (double[] q : p) {
            double off = Math.abs((q[0] - a[0]) * dy - (q[1] - a[1]) * dx) / len;
            if (off > tol) {
                return true;
            }
        }
        return false;
    }

    /** The samples plus one point {@code h} above their centroid. */
    private static double[][] lifted(double[][] p, double h) {
        double[] c = new double[3];
        for (double[] q : p) {
            c[0] += q[0];
            c[1] += q[1];
            c[2] += q[2];
        }
        double[][] out = java.util.Arrays.copyOf(p, p.length + 1);
        out[p.length] = new double[] {c[0] / p.length, c[1] / p.length, c[2] / p.length + h};
        return out;
    }
}
