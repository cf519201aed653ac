package org.linemass.engine.piece;

import java.util.List;
import org.linemass.engine.result.Bend;
import org.linemass.geometry.Segment;

/**
 * One piece: its segments in order, each oriented so that one's end meets the next one's start
 * (within the join tolerance), on one layer; closed when the last end meets the first start.
 */
public record Piece(String layer, List<Segment> segments, boolean closed, List<Bend> bends) {

    public Piece {
        segments = List.copyOf(segments);
        bends = List.copyOf(bends);
    }
}
