package org.linemass.reports.cost;

import java.io.PrintWriter;
import java.util.Map;
import org.linemass.plan.cost.JobCost;
import org.linemass.reports.UnitSystem;

/** A few lines of the costs for the terminal: totals per drawing and job, and each missing price. */
public final class CostConsole {

    private CostConsole() {
    }

    public static void print(JobCost job, PrintWriter out) {
        String cur = job.currency().isEmpty() ? "" : " " + job.currency();
        out.println("costs (prices from " + job.priceTable() + "):");
        if (job.drawings().size() > 1) {
            for (String d : job.drawings()) {
                out.println("  " + d + ": " + UnitSystem.fixed(job.drawingTotal(d), 2) + cur);
            }
        }
        out.println("  job total " + UnitSystem.fixed(job.totalPriced(), 2) + cur
                + (job.complete() ? "" : " (lower figure: prices are missing)"));
        for (Map.Entry<String, Integer> e : job.missing().entrySet()) {
            out.println("  missing price: " + e.getKey() + " (" + e.getValue()
                    + (e.getValue() == 1 ? " line" : " lines") + " without cost)");
        }
        out.flush();
    }
}
