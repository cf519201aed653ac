package org.linemass.engine.pieces.join;

import java.util.List;
import org.linemass.geometry.Segment;

/**
 * One run of joined segments, oriented so each one's end meets the next one's start; closed when
 * the last end meets the first start. {@code indices} are positions in the joiner's input list,
 * {@code firstEnd}/{@code lastEnd} the end numbers ({@code 2i} start, {@code 2i+1} end of input
 * segment i) where an open run begins and stops (-1 for a closed run).
 */
public record Chain(List<Segment> segments, List<Integer> indices, boolean closed, int firstEnd, int lastEnd) {

    public Chain {
        segments = List.copyOf(segments);
        indices = List.copyOf(indices);
    }
}
