package org.linemass.drawing;

import java.util.List;
import java.util.Map;
import org.linemass.geometry.PackedSegments;
import org.linemass.geometry.Segment;
import org.linemass.geometry.Vec3;

/**
 * A block definition (model space is the block named {@link Drawing#MODEL_SPACE}): the wire
 * segments drawn in it, in block coordinates, the inserts it contains, and per DXF type the number
 * of entities it holds directly that carry wire geometry ({@code curveEntityCounts}, POLYLINE split
 * into POLYLINE2D and POLYLINE3D) and that do not ({@code otherEntityCounts}). The segments are
 * held as {@link PackedSegments}: a large block costs about half the bytes of its DXF text.
 */
public record Block(String name, Vec3 basePoint, List<Segment> segments, List<Insert> inserts,
        Map<String, Integer> curveEntityCounts, Map<String, Integer> otherEntityCounts) {

    public Block {
        segments = PackedSegments.copyOf(segments);
        inserts = List.copyOf(inserts);
        curveEntityCounts = Map.copyOf(curveEntityCounts);
        otherEntityCounts = Map.copyOf(otherEntityCounts);
    }
}
