package org.linemass.engine.testing;

import java.util.ArrayList;
import java.util.List;
import org.linemass.engine.Analyzer;
import org.linemass.engine.piece.Piece;
import org.linemass.engine.pieces.PieceAnalysis;
import org.linemass.engine.result.Finding;
import org.linemass.engine.result.FindingKind;
import org.linemass.engine.result.Severity;
import org.linemass.engine.result.SourceRef;
import org.linemass.geometry.Segment;
import org.linemass.geometry.Straight;

/** Small stand-ins for the piece stage, enough to exercise the analyzer's assembly. */
public final class SimpleStages {

    private SimpleStages() {
    }

    /** Every segment its own piece, nothing removed, every piece its own group. */
    public static final Analyzer.PieceStage EACH_SEGMENT = (world, tol, sections, mirror) -> {
        List<Piece> pieces = new ArrayList<>();
        List<List<Integer>> groups = new ArrayList<>();
        for (Segment s : world) {
            groups.add(List.of(pieces.size()));
            pieces.add(new Piece(s.source().layer(), List.of(s), false, List.of()));
        }
        return new PieceAnalysis(pieces, List.of(), List.of(), groups);
    };

    /**
     * Chains segments in list order while each starts where the previous ended (within the join
     * tolerance); removes straights identical to an earlier one (either direction) with a duplicate
     * finding; groups pieces of one layer whose lengths agree to the group tolerance (test only: the
     * real stage verifies shape).
     */
    public static final Analyzer.PieceStage CHAIN = (world, tol, sections, mirror) -> {
        List<Segment> kept = new ArrayList<>();
        List<Segment> removed = new ArrayList<>();
        List<Finding> findings = new ArrayList<>();
        for (Segment s : world) {
            boolean dup = s instanceof Straight a && kept.stream().anyMatch(k -> k instanceof Straight b
                    && ((a.a().equals(b.a()) && a.b().equals(b.b())) || (a.a().equals(b.b()) && a.b().equals(b.a()))));
            if (dup) {
                removed.add(s);
                findings.add(new Finding(FindingKind.DUPLICATE, Severity.ERROR, s.start(), ((Straight) s).length(),
                        s.source().layer(), List.of(SourceRef.of(s.source())), null, "drawn twice"));
            } else {
                kept.add(s);
            }
        }
        List<Piece> pieces = new ArrayList<>();
        List<Segment> run = new ArrayList<>();
        for (Segment s : kept) {
            if (!run.isEmpty() && (!run.get(run.size() - 1).end().closeTo(s.start(), tol.joinM())
                    || !run.get(0).source().layer().equals(s.source().layer()))) {
                pieces.add(piece(run, tol.joinM()));
                run = new ArrayList<>();
            }
            run.add(s);
        }
        if (!run.isEmpty()) {
            pieces.add(piece(run, tol.joinM()));
        }
        List<List<Integer>> groups = new ArrayList<>();
        boolean[] used = new boolean[pieces.size()];
        for (int i = 0; i < pieces.size(); i++) {
            if (used[i]) {
                continue;
            }
            List<Integer> g = new ArrayList<>(List.of(i));
            used[i] = true;
            for (int j = i + 1; j < pieces.size(); j++) {
                if (!used[j] && pieces.get(j).layer().equals(pieces.get(i).layer())
                        && Math.abs(length(pieces.get(j)) - length(pieces.get(i))) <= tol.groupM()) {
                    g.add(j);
                    used[j] = true;
                }
            }
            groups.add(g);
        }
        return new PieceAnalysis(pieces, findings, removed, groups);
    };

    private static Piece piece(List<Segment> run, double join) {
        boolean closed = run.size() > 1 && run.get(run.size() - 1).end().closeTo(run.get(0).start(), join);
        return new Piece(run.get(0).source().layer(), run, closed, List.of());
    }

    private static double length(Piece p) {
        double l = 0;
        for (Segment s : p.segments()) {
            l += s instanceof Straight st ? st.length() : s.start().distance(s.end());
        }
        return l;
    }
}
