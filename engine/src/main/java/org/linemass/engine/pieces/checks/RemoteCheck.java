package org.linemass.engine.pieces.checks;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import org.linemass.engine.pieces.geom.Curves;
import org.linemass.engine.result.Finding;
import org.linemass.engine.result.FindingKind;
import org.linemass.engine.result.Severity;
import org.linemass.geometry.Box3;
import org.linemass.geometry.Provenance;
import org.linemass.geometry.Segment;
import org.linemass.geometry.Vec3;
import org.linemass.tolerance.Tolerances;

/**
 * Finds {@code remote_entity} (warning): an entity, or a small cluster of them, far from the rest
 * of the model, as a stray line left a kilometre or a light year away by a slip of the mouse or a
 * mistyped coordinate.
 *
 * <p>The main body is grown from the segment nearest the coordinate-wise median of the segments'
 * box centres: every segment whose box lies within {@link Tolerances#REMOTE_GAP_FACTOR} times the
 * body's size (its box diagonal, at least {@link Tolerances#REMOTE_MIN_SIZE_M}) of the body's box
 * joins it, and the scan repeats with the grown box until nothing more joins. Whatever is left
 * outside is remote; remote segments within the same rule of one another form one cluster,
 * reported as one finding with its distance from the main body (the gap between the two boxes),
 * its entities and its length.
 *
 * <p>A remote entity is still weighed and joined like any other: it is material drawn in the
 * drawing, and dropping it silently would change the mass. No tolerance depends on it (tolerances
 * come from the settings and from the coordinates at each place, {@link Tolerances#noiseAt}).
 * Cost: O(n) per scan, at most {@value #MAX_ROUNDS} scans, and O(n log n) for the clusters; at most
 * {@value #MAX_FINDINGS} findings, the rest counted in the last one.
 */
public final class RemoteCheck {

    /**
     * Scans of the growing body: each scan takes in everything within reach of the body so far, so
     * ordinary drawings need two (one that takes everything, one that finds nothing more); 64 allows
     * for entities at distances growing a thousandfold from scan to scan.
     */
    static final int MAX_ROUNDS = 64;

    /** Remote clusters reported one by one; more are summed up in the last finding. */
    public static final int MAX_FINDINGS = 50;

    /** Entities named in one finding. */
    static final int MAX_NAMED = 10;

    private RemoteCheck() {
    }

    /** The findings for {@code world} (world coordinates, metres); empty when nothing lies far away. */
    public static List<Finding> check(List<Segment> world) {
        int n = world.size();
        if (n < 2) {
            return List.of();
        }
        double[][] lo = new double[n][];
        double[][] hi = new double[n][];
        int finite = 0;
        boolean[] in = new boolean[n];
        for (int i = 0; i < n; i++) {
            Box3 b = world.get(i).bounds();
            lo[i] = new double[] {b.min().x(), b.min().y(), b.min().z()};
            hi[i] = new double[] {b.max().x(), b.max().y(), b.max().z()};
            boolean ok = !b.isEmpty();
            for (int a = 0; a < 3 && ok; a++) {
                ok = Double.isFinite(lo[i][a]) && Double.isFinite(hi[i][a]);
            }
            in[i] = ok;
            finite += ok ? 1 : 0;
        }
        if (finite < 2) {
            return List.of();
        }
        int seed = medianSegment(lo, hi, in);
        boolean[] grown = grow(lo, hi, in, seed);
        if (grown == null) {
            return List.of();
        }
        System.arraycopy(grown, 0, in, 0, n);
        List<Integer> remote = new ArrayList<>();
        Box3 body = Box3.EMPTY;
        for (int i = 0; i < n; i++) {
            boolean ok = Double.isFinite(lo[i][0]) && Double.isFinite(lo[i][1]) && Double.isFinite(lo[i][2])
                    && Double.isFinite(hi[i][0]) && Double.isFinite(hi[i][1]) && Double.isFinite(hi[i][2]);
            if (in[i]) {
                body = body.including(vec(lo[i])).including(vec(hi[i]));
            } else if (ok) {
                remote.add(i);
            }
        }
        if (remote.isEmpty() || body.isEmpty()) {
            return List.of();
        }
        return findings(world, lo, hi, remote, body);
    }

    /** The finite segment whose box centre is nearest the coordinate-wise median of all box centres. */
    private static int medianSegment(double[][] lo, double[][] hi, boolean[] in) {
        int m = 0;
        for (boolean b : in) {
            m += b ? 1 : 0;
        }
        double[] median = new double[3];
        for (int a = 0; a < 3; a++) {
            double[] c = new double[m];
            int k = 0;
            for (int i = 0; i < in.length; i++) {
                if (in[i]) {
                    c[k++] = 0.5 * lo[i][a] + 0.5 * hi[i][a];
                }
            }
            Arrays.sort(c);
            median[a] = c[m / 2];
        }
        int best = -1;
        double bestD = Double.POSITIVE_INFINITY;
        for (int i = 0; i < in.length; i++) {
            if (!in[i]) {
                continue;
            }
            double d = 0;
            for (int a = 0; a < 3; a++) {
                double c = 0.5 * lo[i][a] + 0.5 * hi[i][a] - median[a];
                d = Math.max(d, Math.abs(c));
            }
            if (d < bestD) {
                bestD = d;
                best = i;
            }
        }
        return best;
    }

    /**
     * The main body grown from {@code seed}: every segment whose box lies within the reach of the
     * body's box (Euclidean gap between the boxes) joins it, the box grows, and the scan repeats
     * until nothing joins. Null when that takes more than {@value #MAX_ROUNDS} scans (entities spread
     * at ever growing distances: no body to speak of, nothing reported).
     */
    private static boolean[] grow(double[][] lo, double[][] hi, boolean[] candidate, int seed) {
        boolean[] body = new boolean[candidate.length];
        body[seed] = true;
        double[] bmin = lo[seed].clone();
        double[] bmax = hi[seed].clone();
        for (int round = 0; round < MAX_ROUNDS; round++) {
            double reach = Tolerances.REMOTE_GAP_FACTOR * Math.max(diagonal(bmin, bmax), Tolerances.REMOTE_MIN_SIZE_M);
            double[] nmin = bmin.clone();
            double[] nmax = bmax.clone();
            boolean added = false;
            for (int i = 0; i < candidate.length; i++) {
                if (candidate[i] && !body[i] && boxGap(bmin, bmax, lo[i], hi[i]) <= reach) {
                    body[i] = true;
                    include(nmin, nmax, lo[i], hi[i]);
                    added = true;
                }
            }
            if (!added) {
                return body;
            }
            bmin = nmin;
            bmax = nmax;
        }
        return null;
    }

    private static void include(double[] bmin, double[] bmax, double[] l, double[] h) {
        for (int a = 0; a < 3; a++) {
            bmin[a] = Math.min(bmin[a], l[a]);
            bmax[a] = Math.max(bmax[a], h[a]);
        }
    }

    private static double diagonal(double[] bmin, double[] bmax) {
        // hypot: no overflow of the squares for coordinates near the limit of the importer
        return Math.hypot(Math.hypot(bmax[0] - bmin[0], bmax[1] - bmin[1]), bmax[2] - bmin[2]);
    }

    private static Vec3 vec(double[] v) {
        return new Vec3(v[0], v[1], v[2]);
    }

    /** Remote segments in clusters (single linkage under the same rule), one finding per cluster. */
    private static List<Finding> findings(List<Segment> world, double[][] lo, double[][] hi, List<Integer> remote,
            Box3 body) {
        remote.sort(Comparator.comparingDouble(i -> lo[i][0]));
        List<List<Integer>> clusters = new ArrayList<>();
        List<double[][]> boxes = new ArrayList<>();
        for (int i : remote) {
            int joined = -1;
            // the last few clusters are the only ones the sweep along x can still reach
            for (int c = clusters.size() - 1; c >= Math.max(0, clusters.size() - 8) && joined < 0; c--) {
                double[][] b = boxes.get(c);
                double reach = Tolerances.REMOTE_GAP_FACTOR * Math.max(diagonal(b[0], b[1]),
                        Tolerances.REMOTE_MIN_SIZE_M);
                if (boxGap(b[0], b[1], lo[i], hi[i]) <= reach) {
                    joined = c;
                }
            }
            if (joined < 0) {
                clusters.add(new ArrayList<>());
                boxes.add(new double[][] {lo[i].clone(), hi[i].clone()});
                joined = clusters.size() - 1;
            }
            clusters.get(joined).add(i);
            include(boxes.get(joined)[0], boxes.get(joined)[1], lo[i], hi[i]);
        }
        double[] bmin = {body.min().x(), body.min().y(), body.min().z()};
        double[] bmax = {body.max().x(), body.max().y(), body.max().z()};
        double bodySize = diagonal(bmin, bmax);
        List<Finding> out = new ArrayList<>();
        for (int c = 0; c < clusters.size(); c++) {
            double[][] b = boxes.get(c);
            if (c == MAX_FINDINGS - 1 && clusters.size() > MAX_FINDINGS) {
                int rest = 0;
                for (int k = c; k < clusters.size(); k++) {
                    rest += clusters.get(k).size();
                }
                Vec3 at = centre(b);
                out.add(Findings.of(FindingKind.REMOTE_ENTITY, Severity.WARNING,
                        Double.isFinite(at.x()) && Double.isFinite(at.y()) && Double.isFinite(at.z()) ? at : null,
                        null, null, List.of(),
                        null, String.format(Locale.ROOT, "%d more clusters of segments (%d segments) lie far from the"
                                + " rest of the drawing; they are weighed like the rest: delete or move them if they"
                                + " are not part of the model.", clusters.size() - c, rest)));
                break;
            }
            List<Provenance> named = new ArrayList<>();
            double length = 0;
            for (int i : clusters.get(c)) {
                Provenance p = world.get(i).source();
                if (!named.contains(p) && named.size() < MAX_NAMED) {
                    named.add(p);
                }
                length += Curves.length(world.get(i));
            }
            long entities = clusters.get(c).stream().map(i -> world.get(i).source()).distinct().count();
            double gap = boxGap(bmin, bmax, b[0], b[1]);
            Vec3 at = centre(b);
            if (!Double.isFinite(gap) || !Double.isFinite(length) || !Double.isFinite(bodySize)
                    || !Double.isFinite(at.x()) || !Double.isFinite(at.y()) || !Double.isFinite(at.z())) {
                continue; // beyond the range of numbers: the overflow check reports such a layer
            }
            String who = entities == 1 ? named.get(0).describe() + " lies"
                    : entities + " entities (" + String.join(", ", named.stream().map(Provenance::describe).toList())
                            + (entities > named.size() ? ", ..." : "") + ") lie";
            out.add(Findings.of(FindingKind.REMOTE_ENTITY, Severity.WARNING, at, gap,
                    world.get(clusters.get(c).get(0)).source().layer(), named, null,
                    String.format(Locale.ROOT, "%s %s away from the rest of the drawing (which is %s across): "
                            + "probably drawn there by mistake. Its %s of wire is weighed and joined like the rest;"
                            + " delete or move it if it is not part of the model.", who, distance(gap),
                            distance(bodySize), distance(length))));
        }
        return out;
    }

    private static Vec3 centre(double[][] b) {
        return new Vec3(0.5 * b[0][0] + 0.5 * b[1][0], 0.5 * b[0][1] + 0.5 * b[1][1], 0.5 * b[0][2] + 0.5 * b[1][2]);
    }

    /** Euclidean distance between two boxes (0 when they touch or overlap). */
    static double boxGap(double[] amin, double[] amax, double[] bmin, double[] bmax) {
        double[] d = new double[3];
        for (int a = 0; a < 3; a++) {
            d[a] = Math.max(0, Math.max(bmin[a] - amax[a], amin[a] - bmax[a]));
        }
        return Math.hypot(Math.hypot(d[0], d[1]), d[2]);
    }

    /** A distance in metres with three significant figures, e.g. {@code 1.00e+06 m}, or {@code 0.950 m}. */
    static String distance(double m) {
        if (m >= 1e4 || m > 0 && m < 1e-3) {
            return String.format(Locale.ROOT, "%.3g m", m);
        }
        return String.format(Locale.ROOT, "%.3f m", m);
    }
}
