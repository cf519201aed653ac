package org.linemass.plan.revision;

import java.util.List;
import org.linemass.engine.result.PieceResult;

/**
 * One piece of the comparison: its kind, the piece in revision A ({@code a}, null when added) and
 * in revision B ({@code b}, null when removed), how far its centroid moved (metres; 0 without a
 * partner) and, for a changed piece, what changed ({@code length}, {@code section}, {@code bends},
 * {@code shape}; empty otherwise).
 */
public record PieceChange(ChangeKind kind, PieceResult a, PieceResult b, double moveM, List<String> changed) {

    public PieceChange {
        changed = List.copyOf(changed);
        if ((a == null && kind != ChangeKind.ADDED) || (b == null && kind != ChangeKind.REMOVED)) {
            throw new IllegalArgumentException(kind + " needs the piece of both revisions it applies to");
        }
    }

    /** The section in B, else in A (null: none). */
    public String section() {
        return b != null ? b.section() : a.section();
    }

    /** Mass in B less mass in A, kg (a missing piece counts 0); null when a mass is unknown. */
    public Double massChangeKg() {
        Double ma = a == null ? Double.valueOf(0) : a.massKg();
        Double mb = b == null ? Double.valueOf(0) : b.massKg();
        return ma == null || mb == null ? null : mb - ma;
    }
}
