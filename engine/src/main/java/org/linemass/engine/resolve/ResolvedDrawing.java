package org.linemass.engine.resolve;

import java.util.List;
import java.util.Optional;
import org.linemass.engine.result.EntityCounts;
import org.linemass.geometry.Segment;

/**
 * A drawing brought to world metres.
 *
 * @param metresPerUnit the drawing unit in metres used for the conversion
 * @param layers per-layer length moments (unit density) and segment counts of the counted layers,
 *     in world metres, raw (duplicates counted as drawn)
 * @param entities entity counts after block expansion
 * @param worldSegments the expanded world segments of the counted layers, empty when there are more
 *     than the limit
 * @param expandedSegments number of world segments the counted layers expand to (saturating)
 * @param extentM diagonal of the world bounding box of the counted geometry (estimated from the
 *     moments when the segments were not expanded)
 * @param incompleteReasons what was left out of the totals, one sentence each
 * @param coincident segments that block copies place more than once on exactly the same curve; only
 *     the first copy is in {@code worldSegments}, while {@code layers} still counts every copy
 */
public record ResolvedDrawing(double metresPerUnit, LayerTotals layers, EntityCounts entities,
        Optional<List<Segment>> worldSegments, long expandedSegments, double extentM,
        List<String> incompleteReasons, List<Coincident> coincident) {

    public ResolvedDrawing {
        worldSegments = worldSegments.map(List::copyOf);
        incompleteReasons = List.copyOf(incompleteReasons);
        coincident = List.copyOf(coincident);
    }

    /**
     * One segment placed {@code copies} times in exactly the same place (world metres).
     *
     * @param kept the copy kept for joining and checks
     * @param copies how many copies lie there in all, at least 2
     */
    public record Coincident(Segment kept, long copies) {
    }

    /** True when the segments were too many to expand ({@link #worldSegments()} is empty). */
    public boolean limitReached() {
        return worldSegments.isEmpty();
    }
}
