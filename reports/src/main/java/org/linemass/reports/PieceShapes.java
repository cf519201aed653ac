package org.linemass.reports;

import java.util.ArrayDeque;
import java.util.Deque;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import org.linemass.engine.pieces.Piece;
import org.linemass.engine.result.DrawingResult;
import org.linemass.engine.result.PieceResult;
import org.linemass.engine.result.SourceRef;
import org.linemass.geometry.Box3;
import org.linemass.geometry.Segment;
import org.linemass.geometry.Vec3;

/**
 * Builds the {@link Report#pieceShapes} of a result from the engine's pieces (their segments in
 * world metres): each piece is matched to its {@link PieceResult} by layer, exact start and end
 * point and source entities (the engine copies these from the piece unchanged), then sampled with
 * {@link ShapeSampler} to a chord tolerance of {@value #CHORD_SHARE} of the drawing's extent, well
 * below a pixel of the picture. Pieces that match no result are left out; results without a piece
 * are drawn from start to end by the writers.
 */
public final class PieceShapes {

    /** Chord tolerance as a share of the bounding-box diagonal (a 1000 px picture: 0.1 px). */
    static final double CHORD_SHARE = 1e-4;
    /** Chord tolerance for a drawing of no extent, metres. */
    private static final double MIN_CHORD_M = 1e-9;

    private PieceShapes() {
    }

    /** The sampled shapes of {@code pieces} keyed by the id of the matching piece result. */
    public static Map<Integer, List<Vec3>> of(DrawingResult result, List<Piece> pieces) {
        Map<Key, Deque<Integer>> ids = new HashMap<>();
        for (PieceResult p : result.pieces()) {
            ids.computeIfAbsent(new Key(p.layer(), p.startM(), p.endM(), p.sources()), k -> new ArrayDeque<>())
                    .add(p.id());
        }
        double chord = Math.max(CHORD_SHARE * diagonal(pieces), MIN_CHORD_M);
        Map<Integer, List<Vec3>> shapes = new TreeMap<>();
        for (Piece piece : pieces) {
            if (piece.segments().isEmpty()) {
                continue;
            }
            List<Segment> segs = piece.segments();
            Key key = new Key(piece.layer(), segs.get(0).start(), segs.get(segs.size() - 1).end(),
                    segs.stream().map(s -> SourceRef.of(s.source())).toList());
            Deque<Integer> q = ids.get(key);
            if (q != null && !q.isEmpty()) {
                shapes.put(q.poll(), ShapeSampler.sample(segs, chord));
            }
        }
        return shapes;
    }

    private static double diagonal(List<Piece> pieces) {
        double[] lo = {Double.POSITIVE_INFINITY, Double.POSITIVE_INFINITY, Double.POSITIVE_INFINITY};
        double[] hi = {Double.NEGATIVE_INFINITY, Double.NEGATIVE_INFINITY, Double.NEGATIVE_INFINITY};
        for (Piece p : pieces) {
            for (Segment s : p.segments()) {
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

    private record Key(String layer, Vec3 start, Vec3 end, List<SourceRef> sources) {
    }
}
