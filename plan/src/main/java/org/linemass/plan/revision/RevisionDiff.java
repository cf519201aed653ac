package org.linemass.plan.revision;

import java.util.EnumMap;
import java.util.List;
import java.util.Map;

/**
 * The comparison of revision A with revision B: one {@link PieceChange} per piece (every piece of
 * A and of B appears exactly once), ordered by kind and then by place, and the tolerance used.
 */
public record RevisionDiff(String fileA, String fileB, MatchTolerance tolerance, List<PieceChange> changes) {

    public RevisionDiff {
        changes = List.copyOf(changes);
    }

    /** How many pieces of each kind. */
    public Map<ChangeKind, Integer> counts() {
        Map<ChangeKind, Integer> m = new EnumMap<>(ChangeKind.class);
        for (ChangeKind k : ChangeKind.values()) {
            m.put(k, 0);
        }
        changes.forEach(c -> m.merge(c.kind(), 1, Integer::sum));
        return m;
    }

    /** True when every piece is unchanged. */
    public boolean same() {
        return changes.stream().allMatch(c -> c.kind() == ChangeKind.UNCHANGED);
    }
}
