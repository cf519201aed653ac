package org.linemass.engine.pieces.index;

import java.util.function.IntConsumer;
import org.linemass.geometry.Box3;

/** Candidate search over numbered segments by their (grown) bounding boxes. */
public interface BoxIndex {

    /** The grown box of segment {@code i}. */
    Box3 box(int i);

    /** Visits every segment whose grown box meets {@code box}. */
    void query(Box3 box, IntConsumer visitor);
}
