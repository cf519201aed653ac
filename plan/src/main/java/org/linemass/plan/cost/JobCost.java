package org.linemass.plan.cost;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.linemass.engine.moments.CompensatedSum;

/**
 * The costs of a job: the mark and weld lines of every drawing, the stock lines of the cutting
 * plan (the cost of the stock bought per section and stock length; the marks' material lines are
 * shares of it, so stock lines are not added again), the currency and the price table's name.
 * Totals are sums of the priced lines; {@link #missing()} lists what the table lacks, and a total
 * with missing prices is a lower figure, which every report says.
 */
public record JobCost(List<CostLine> lines, List<CostLine> stock, String currency, String priceTable) {

    public JobCost {
        lines = List.copyOf(lines);
        stock = List.copyOf(stock);
    }

    /** Sum of the priced lines (stock lines excluded: they are in the marks' material). */
    public double totalPriced() {
        CompensatedSum s = new CompensatedSum();
        lines.stream().filter(CostLine::priced).forEach(l -> s.add(l.cost()));
        return s.value();
    }

    /** Sum of the priced lines of one drawing. */
    public double drawingTotal(String drawing) {
        CompensatedSum s = new CompensatedSum();
        lines.stream().filter(l -> l.priced() && l.drawing().equals(drawing)).forEach(l -> s.add(l.cost()));
        return s.value();
    }

    /** The drawings in the order of their first line. */
    public List<String> drawings() {
        return lines.stream().map(CostLine::drawing).distinct().toList();
    }

    /** Each missing price once, in the order met, with how many lines lack it. */
    public Map<String, Integer> missing() {
        Map<String, Integer> m = new LinkedHashMap<>();
        List<CostLine> all = new ArrayList<>(stock);
        all.addAll(lines);
        for (CostLine l : all) {
            if (l.missing() != null) {
                m.merge(l.missing(), 1, Integer::sum);
            }
        }
        return m;
    }

    /** True when every line has a price. */
    public boolean complete() {
        return missing().isEmpty();
    }
}
