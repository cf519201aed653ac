package org.linemass.reports;

import java.util.Collection;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import org.linemass.engine.result.DrawingResult;
import org.linemass.geometry.Box3;
import org.linemass.geometry.Segment;
import org.linemass.geometry.Vec3;

/**
 * Builds the {@link Report#pieceShapes} of a result from the exact piece segments it carries by
 * piece id ({@link DrawingResult#pieceSegments}, world metres): each is sampled with
 * {@link ShapeSampler} to a chord tolerance of {@value #CHORD_SHARE} of the extent of all the
 * pieces, well below a pixel of the picture. Results without segments for a piece are drawn from
 * start to end by the writers. No number is computed from the samples.
 */
public final class PieceShapes {

    /** Chord tolerance as a share of the bounding-box diagonal (a 1000 px picture: 0.1 px). */
    static final double CHORD_SHARE = 1e-4;
    /** Chord tolerance for a drawing of no extent, metres. */
    private static final double MIN_CHORD_M = 1e-9;

    private PieceShapes() {
    }

    /** The sampled shape of every piece of {@code result} that has segments, by piece id. */
    public static Map<Integer, List<Vec3>> of(DrawingResult result) {
        Map<Integer, List<Segment>> byId = result.pieceSegments();
        double chord = Math.max(CHORD_SHARE * diagonal(byId.values()), MIN_CHORD_M);
        Map<Integer, List<Vec3>> shapes = new TreeMap<>();
        byId.forEach((id, segs) -> {
            if (!segs.isEmpty()) {
                shapes.put(id, ShapeSampler.sample(segs, chord));
            }
        });
        return shapes;
    }

    private static double diagonal(Collection<List<Segment>> pieces) {
        double[] lo = {Double.POSITIVE_INFINITY, Double.POSITIVE_INFINITY, Double.POSITIVE_INFINITY};
        double[] hi = {Double.NEGATIVE_INFINITY, Double.NEGATIVE_INFINITY, Double.NEGATIVE_INFINITY};
        for (List<Segment> p : pieces) {
            for (Segment s : p) {
                Box3 b = s.bounds();
                for (int a = 0; a < 3; a++) {
                    lo[a] = Math.min(lo[a], b.min().get(a));
                    hi[a] = Math.max(hi[a], b.max().get(a));
                }
            }
        }
        if (lo[0] > hi[0]) {
            return 0;
        }
        double d = new Vec3(hi[0] - lo[0], hi[1] - lo[1], hi[2] - lo[2]).norm();
        return Double.isFinite(d) ? d : 0;
    }
}
