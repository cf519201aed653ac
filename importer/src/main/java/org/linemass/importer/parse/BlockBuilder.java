package org.linemass.importer.parse;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import org.linemass.drawing.Block;
import org.linemass.drawing.Insert;
import org.linemass.geometry.Segment;
import org.linemass.geometry.Vec3;
import org.linemass.importer.entity.InsertSpec;

/** Accumulates one block definition while its entities are read. Not thread-safe. */
final class BlockBuilder {

    final String name;
    Vec3 basePoint;
    final List<Segment> segments = new ArrayList<>();
    final List<InsertSpec> insertSpecs = new ArrayList<>();
    final List<Insert> inserts = new ArrayList<>();
    final Map<String, Integer> curveCounts = new TreeMap<>();
    final Map<String, Integer> otherCounts = new TreeMap<>();

    BlockBuilder(String name, Vec3 basePoint) {
        this.name = name;
        this.basePoint = basePoint;
    }

    void countCurve(String type) {
        curveCounts.merge(type, 1, Integer::sum);
    }

    void countOther(String type) {
        otherCounts.merge(type, 1, Integer::sum);
    }

    Block build() {
        return new Block(name, basePoint, segments, inserts, curveCounts, otherCounts);
    }
}
