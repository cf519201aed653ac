package org.linemass.engine.pieces.index;

import java.util.List;
import java.util.function.IntConsumer;
import org.linemass.geometry.Box3;
import org.linemass.geometry.Segment;

/**
 * An index over segments derived from indexed ones (kept whole, trimmed or split, each inside its
 * origin's box), answered through the origin's index, so one STR-tree serves every stage.
 * {@code origin[k]} is the indexed segment that derived segment k came from.
 */
public final class DerivedIndex implements BoxIndex {

    private final BoxIndex base;
    private final Box3[] boxes;
    private final int[] first;
    private final int[] derived;

    public DerivedIndex(BoxIndex base, int baseCount, List<? extends Segment> segments, int[] origin,
            double marginM) {
        this.base = base;
        int n = segments.size();
        this.boxes = new Box3[n];
        this.first = new int[baseCount + 1];
        this.derived = new int[n];
        for (int k = 0; k < n; k++) {
            boxes[k] = segments.get(k).bounds().expandedBy(marginM);
            first[origin[k] + 1]++;
        }
        for (int i = 0; i < baseCount; i++) {
            first[i + 1] += first[i];
        }
        int[] fill = java.util.Arrays.copyOf(first, baseCount);
        for (int k = 0; k < n; k++) {
            derived[fill[origin[k]]++] = k;
        }
    }

    /** Visits the derived segments of indexed segment {@code i}. */
    public void derivedOf(int i, IntConsumer visitor) {
        for (int j = first[i]; j < first[i + 1]; j++) {
            visitor.accept(derived[j]);
        }
    }

    @Override
    public Box3 box(int i) {
        return boxes[i];
    }

    @Override
    public void query(Box3 box, IntConsumer visitor) {
        base.query(box, i -> {
            for (int j = first[i]; j < first[i + 1]; j++) {
                int k = derived[j];
                if (boxes[k].intersects(box)) {
                    visitor.accept(k);
                }
            }
        });
    }
}
