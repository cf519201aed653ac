package org.linemass.importer.parse;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeMap;
import org.linemass.drawing.Block;
import org.linemass.drawing.Insert;
import org.linemass.geometry.PackedSegments;
import org.linemass.geometry.Vec3;
import org.linemass.importer.entity.InsertSpec;

/** Accumulates one block definition while its entities are read. Not thread-safe. */
final class BlockBuilder {

    final String name;
    Vec3 basePoint;
    /** Packed as they arrive: the model of a large block never exists as one object per segment. */
    final PackedSegments.Builder segments = new PackedSegments.Builder();
    final List<InsertSpec> insertSpecs = new ArrayList<>();
    final List<Insert> inserts = new ArrayList<>();
    /** Layers of this block's own entities that were read as wire (before layer-0 inheritance). */
    final Set<String> wireLayers = new HashSet<>();
    /** Entities that cannot be weighed, per own layer and type (see {@link NotWeighed}). */
    final Map<String, Map<String, Integer>> notWeighed = new TreeMap<>();
    private final Map<String, int[]> curveCounts = new HashMap<>();
    private final Map<String, int[]> otherCounts = new HashMap<>();

    BlockBuilder(String name, Vec3 basePoint) {
        this.name = name;
        this.basePoint = basePoint;
    }

    /** The counter of the last type counted: most files repeat a few types, so this skips the map. */
    private String lastCurveType;
    private int[] lastCurveCount;

    void countCurve(String type) {
        if (type != lastCurveType) {
            lastCurveCount = curveCounts.computeIfAbsent(type, k -> new int[1]);
            lastCurveType = type;
        }
        lastCurveCount[0]++;
    }

    void countOther(String type) {
        otherCounts.computeIfAbsent(type, k -> new int[1])[0]++;
    }

    Block build() {
        return new Block(name, basePoint, segments.build(), inserts, frozen(curveCounts), frozen(otherCounts));
    }

    private static Map<String, Integer> frozen(Map<String, int[]> counts) {
        Map<String, Integer> m = new TreeMap<>();
        counts.forEach((k, v) -> m.put(k, v[0]));
        return m;
    }
}
