package org.linemass.engine.pieces.join;

import java.util.List;
import org.linemass.engine.result.Finding;
import org.linemass.geometry.Vec3;

/**
 * The runs, the {@code branch} and {@code joined_across_gap} findings, and per end (numbered
 * {@code 2i} / {@code 2i+1} for input segment i) whether it is free (alone at its node: nothing
 * else within the join tolerance), its point, and the chain each segment belongs to. The arrays are
 * handed out as is, not copied (they can hold millions of entries): callers must not change them.
 */
public record JoinResult(List<Chain> chains, List<Finding> findings, boolean[] freeEnd, Vec3[] endPoint,
        int[] chainOfSegment) {

    public JoinResult {
        chains = List.copyOf(chains);
        findings = List.copyOf(findings);
    }
}
