package org.linemass.reports.cost;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.linemass.plan.cost.CostLine;
import org.linemass.plan.cost.JobCost;
import org.linemass.reports.plan.PlanTable;
import org.linemass.reports.plan.PlanTable.Num;

/**
 * The cost tables of a job: the cost lines (per drawing and mark: item, quantity, unit, unit
 * price, cost, formula, price source, missing price), the stock lines of a cutting plan, and the
 * totals (per drawing, the job, and one row per missing price). Quantities and prices are in SI
 * units (kg, m) whatever the report's unit system, as the price table is. Costs have two decimals.
 */
public final class CostTables {

    private CostTables() {
    }

    public static PlanTable lines(JobCost job) {
        List<List<Object>> rows = new ArrayList<>();
        for (CostLine l : job.lines()) {
            rows.add(row(l));
        }
        return new PlanTable("cost lines", header(job, "drawing", "mark"), rows);
    }

    public static PlanTable stock(JobCost job) {
        List<List<Object>> rows = new ArrayList<>();
        for (CostLine l : job.stock()) {
            rows.add(row(l));
        }
        return new PlanTable("stock cost", header(job, "drawing", "stock"), rows);
    }

    public static PlanTable totals(JobCost job) {
        List<List<Object>> rows = new ArrayList<>();
        boolean complete = job.complete();
        String note = complete ? "all lines priced" : "lower figure: some prices are missing";
        for (String d : job.drawings()) {
            rows.add(List.of("drawing", d, new Num(job.drawingTotal(d), 2), job.currency(), note));
        }
        rows.add(List.of("job", "", new Num(job.totalPriced(), 2), job.currency(), note));
        for (Map.Entry<String, Integer> e : job.missing().entrySet()) {
            rows.add(java.util.Arrays.asList("missing price", e.getKey(), null, job.currency(),
                    e.getValue() + (e.getValue() == 1 ? " line" : " lines") + " without cost"));
        }
        return new PlanTable("cost totals", List.of("scope", "name", "cost", "currency", "note"), rows);
    }

    private static List<String> header(JobCost job, String first, String second) {
        String cur = job.currency().isEmpty() ? "" : " [" + job.currency() + "]";
        return List.of(first, second, "section", "item", "quantity", "unit", "unit price" + cur, "cost" + cur,
                "formula", "price from", "missing price");
    }

    private static List<Object> row(CostLine l) {
        List<Object> r = new ArrayList<>();
        r.add(l.drawing());
        r.add(l.mark());
        r.add(l.section());
        r.add(l.item());
        boolean measured = l.unit().equals("kg") || l.unit().equals("m");
        r.add(Double.isFinite(l.quantity()) ? (measured ? new Num(l.quantity(), 3) : (Object) Math.round(l.quantity()))
                : null);
        r.add(l.unit());
        r.add(l.unitPrice() == null ? null : new Num(l.unitPrice(), 4));
        r.add(l.cost() == null ? null : new Num(l.cost(), 2));
        r.add(l.formula());
        r.add(l.source());
        r.add(l.missing());
        return r;
    }
}
