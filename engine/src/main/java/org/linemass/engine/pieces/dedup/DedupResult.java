package org.linemass.engine.pieces.dedup;

import java.util.List;
import org.linemass.engine.result.Finding;
import org.linemass.geometry.Segment;

/**
 * The segments to build pieces from (each drawn material counted once), for each of them the
 * position of the input segment it came from ({@code origin}), the sub-curves removed because
 * they were drawn before (with the removed copy's provenance), and the findings. The origin
 * array is copied in and handed out as is (callers read it once and must not change it).
 */
public record DedupResult(List<Segment> kept, int[] origin, List<Segment> removed, List<Finding> findings) {

    public DedupResult {
        kept = List.copyOf(kept);
        origin = origin.clone();
        removed = List.copyOf(removed);
        findings = List.copyOf(findings);
    }
}
