package org.linemass.engine.pieces.index;

import java.util.List;
import java.util.function.IntConsumer;
import org.linemass.geometry.Box3;
import org.linemass.geometry.Segment;
import org.locationtech.jts.geom.Envelope;
import org.locationtech.jts.index.strtree.STRtree;

/**
 * A static index of segment bounding boxes (a JTS STR-tree on the x-y extent, each box grown by a
 * margin) answering "which segments may come within the margin of this box". The z extent is
 * checked by the caller's exact test. Query cost is O(log n + k). JTS types stay inside.
 */
public final class SegmentIndex implements BoxIndex {

    private final STRtree tree;
    private final Box3[] boxes;

    /**
     * @param segments indexed by position
     * @param marginM every box is grown by this much (metres)
     */
    public SegmentIndex(List<? extends Segment> segments, double marginM) {
        this.tree = new STRtree();
        this.boxes = new Box3[segments.size()];
        for (int i = 0; i < boxes.length; i++) {
            Box3 b = segments.get(i).bounds().expandedBy(marginM);
            boxes[i] = b;
            tree.insert(new Envelope(b.min().x(), b.max().x(), b.min().y(), b.max().y()), i);
        }
        tree.build();
    }

    @Override
    public Box3 box(int i) {
        return boxes[i];
    }

    /** Visits every indexed segment whose grown box meets {@code box} (z included). */
    @Override
    public void query(Box3 box, IntConsumer visitor) {
        if (boxes.length == 0) {
            return;
        }
        Envelope e = new Envelope(box.min().x(), box.max().x(), box.min().y(), box.max().y());
        tree.query(e, item -> {
            int j = (Integer) item;
            Box3 b = boxes[j];
            if (b.min().z() <= box.max().z() && box.min().z() <= b.max().z()) {
                visitor.accept(j);
            }
        });
    }
}
