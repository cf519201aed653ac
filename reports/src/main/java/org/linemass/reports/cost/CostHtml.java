package org.linemass.reports.cost;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.linemass.plan.cost.JobCost;
import org.linemass.reports.plan.PlanHtml;

/** The "Costs" section of the HTML report: where the prices came from, what is missing, and the cost tables. */
public final class CostHtml {

    private CostHtml() {
    }

    public static String section(JobCost job) {
        List<String> notes = new ArrayList<>();
        notes.add("Prices from " + job.priceTable() + (job.currency().isEmpty() ? "" : ", in " + job.currency())
                + ". Each line is quantity x unit price; quantities in kg, m and counts.");
        if (job.complete()) {
            notes.add("Every line has a price.");
        } else {
            StringBuilder s = new StringBuilder("Missing prices (their lines have no cost; the totals are lower figures): ");
            int i = 0;
            for (Map.Entry<String, Integer> e : job.missing().entrySet()) {
                s.append(i++ == 0 ? "" : "; ").append(e.getKey());
            }
            notes.add(s.append('.').toString());
        }
        List<org.linemass.reports.plan.PlanTable> tables = new ArrayList<>();
        tables.add(CostTables.totals(job));
        tables.add(CostTables.lines(job));
        if (!job.stock().isEmpty()) {
            tables.add(CostTables.stock(job));
        }
        return PlanHtml.section("costs", "Costs", notes, tables);
    }
}
