package org.linemass.reports;

import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import org.linemass.engine.result.DrawingResult;
import org.linemass.geometry.Vec3;

/**
 * What the writers print for one drawing: the engine's result plus, for pictures, a sampled
 * centre-line polyline per piece id (world metres), made from the result itself by {@link #of}. Pieces without a shape are drawn from their
 * start to their end point; an empty map is allowed.
 */
public record Report(DrawingResult result, Map<Integer, List<Vec3>> pieceShapes) {

    public Report {
        if (result == null) {
            throw new IllegalArgumentException("report needs a drawing result, got null");
        }
        Map<Integer, List<Vec3>> copy = new TreeMap<>();
        pieceShapes.forEach((id, pts) -> copy.put(id, List.copyOf(pts)));
        pieceShapes = java.util.Collections.unmodifiableMap(copy);
    }

    /** The report of a result: its pieces' shapes sampled from the segments it carries ({@link PieceShapes}). */
    public static Report of(DrawingResult result) {
        return new Report(result, PieceShapes.of(result));
    }

    /** The shape of one piece, or an empty list when none was supplied. */
    public List<Vec3> shape(int pieceId) {
        return pieceShapes.getOrDefault(pieceId, List.of());
    }
}
