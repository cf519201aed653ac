package org.linemass.plan.revision;

import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import org.linemass.engine.result.MarkResult;
import org.linemass.engine.result.PieceResult;
import org.linemass.plan.cost.CostLine;
import org.linemass.plan.cost.JobCost;

/**
 * The costs of both revisions for the comparison, each priced alone without a cutting plan
 * ({@link org.linemass.plan.cost.Costing}): a piece costs its mark's priced lines divided by the
 * mark's quantity (null when a line of the mark has no price); a section costs all its lines,
 * welds included (null when one has no price); the totals are the jobs' priced totals.
 */
public final class RevisionCost {

    private final JobCost a;
    private final JobCost b;
    private final Map<String, Double> pieceA;
    private final Map<String, Double> pieceB;

    public RevisionCost(JobCost a, List<MarkResult> marksA, JobCost b, List<MarkResult> marksB) {
        this.a = a;
        this.b = b;
        this.pieceA = perPiece(a, marksA);
        this.pieceB = perPiece(b, marksB);
    }

    /** The cost of one piece of revision A ({@code inB} false) or B; null when not fully priced. */
    public Double piece(PieceResult p, boolean inB) {
        return p == null ? Double.valueOf(0) : (inB ? pieceB : pieceA).get(p.mark());
    }

    /** The cost of a section's lines in one revision; null when one of them has no price. */
    public Double section(String section, boolean inB) {
        double sum = 0;
        for (CostLine l : (inB ? b : a).lines()) {
            if (Objects.equals(l.section(), section)) {
                if (!l.priced()) {
                    return null;
                }
                sum += l.cost();
            }
        }
        return sum;
    }

    /** The total of the priced lines of one revision. */
    public double total(boolean inB) {
        return (inB ? b : a).totalPriced();
    }

    /** True when every line of both revisions has a price. */
    public boolean complete() {
        return a.complete() && b.complete();
    }

    /** The currency of the price table. */
    public String currency() {
        return a.currency();
    }

    /** The missing prices of both revisions, each once. */
    public List<String> missing() {
        java.util.LinkedHashSet<String> m = new java.util.LinkedHashSet<>(a.missing().keySet());
        m.addAll(b.missing().keySet());
        return List.copyOf(m);
    }

    private static Map<String, Double> perPiece(JobCost job, List<MarkResult> marks) {
        Map<String, Double> sum = new HashMap<>();
        Map<String, Boolean> ok = new HashMap<>();
        for (CostLine l : job.lines()) {
            if (l.mark().isEmpty()) {
                continue;
            }
            ok.merge(l.mark(), l.priced(), Boolean::logicalAnd);
            if (l.priced()) {
                sum.merge(l.mark(), l.cost(), Double::sum);
            }
        }
        Map<String, Double> out = new HashMap<>();
        for (MarkResult m : marks) {
            if (Boolean.TRUE.equals(ok.get(m.mark()))) {
                out.put(m.mark(), sum.get(m.mark()) / m.quantity());
            }
        }
        return out;
    }
}
