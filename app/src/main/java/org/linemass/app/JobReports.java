package org.linemass.app;

import java.io.IOException;
import java.io.PrintWriter;
import java.util.ArrayList;
import java.util.List;
import org.linemass.plan.JobPlan;
import org.linemass.plan.JobPlanner;
import org.linemass.plan.cost.Costing;
import org.linemass.plan.cost.JobCost;
import org.linemass.plan.cost.PriceTable;
import org.linemass.plan.cutting.CutSettings;
import org.linemass.plan.stock.StockTable;
import org.linemass.reports.Report;
import org.linemass.reports.UnitSystem;
import org.linemass.reports.cost.CostConsole;
import org.linemass.reports.cost.CostHtml;
import org.linemass.reports.cost.CostJson;
import org.linemass.reports.cost.CostTables;
import org.linemass.reports.json.JsonPart;
import org.linemass.reports.plan.PlanConsole;
import org.linemass.reports.plan.PlanCsv;
import org.linemass.reports.plan.PlanHtml;
import org.linemass.reports.plan.PlanJson;
import org.linemass.reports.plan.PlanSheets;
import org.linemass.reports.plan.PlanTable;
import org.linemass.reports.plan.PlanTables;
import org.linemass.reports.xlsx.XlsxSheet;

/**
 * The job-level reports of one {@code check} run: the cutting plan (when stock is given) and the
 * costs (when a price table is given), worked out once from all drawings, and their parts in every
 * format: HTML sections, JSON parts, workbook sheets, CSV files and console lines. Empty when
 * neither is asked for.
 */
final class JobReports {

    private final JobPlan plan;
    private final JobCost cost;
    private final List<PlanTable> planTables;
    private final PlanOptions options;

    private JobReports(JobPlan plan, JobCost cost, List<PlanTable> planTables, PlanOptions options) {
        this.plan = plan;
        this.cost = cost;
        this.planTables = planTables;
        this.options = options;
    }

    /** Plans and prices {@code reports}; {@code stock} and {@code prices} may be null (not asked for). */
    static JobReports of(List<Report> reports, StockTable stock, CutSettings settings, PriceTable prices,
            PlanOptions options, UnitSystem units) {
        var results = reports.stream().map(Report::result).toList();
        JobPlan plan = stock == null ? null : JobPlanner.plan(results, stock, settings);
        List<PlanTable> tables = List.of();
        if (plan != null) {
            PlanTables pt = new PlanTables(units);
            tables = List.of(pt.summary(plan), pt.order(plan), pt.patterns(plan));
        }
        JobCost cost = prices == null ? null : Costing.of(results, prices, plan);
        return new JobReports(plan, cost, tables, options);
    }

    /** The HTML sections after the drawing's own. */
    List<String> htmlSections() {
        List<String> s = new ArrayList<>();
        if (plan != null) {
            s.add(PlanHtml.section(planTables));
        }
        if (cost != null) {
            s.add(CostHtml.section(cost));
        }
        return s;
    }

    /** The job-level parts of the JSON report. */
    List<JsonPart> jsonParts() {
        List<JsonPart> p = new ArrayList<>();
        if (plan != null) {
            p.add(new PlanJson(plan));
        }
        if (cost != null) {
            p.add(new CostJson(cost));
        }
        return p;
    }

    /** The workbook sheets after the drawing sheets. */
    List<XlsxSheet> sheets() {
        List<XlsxSheet> s = new ArrayList<>();
        planTables.forEach(t -> s.add(PlanSheets.of(t)));
        if (cost != null) {
            s.add(PlanSheets.of(CostTables.totals(cost)));
            s.add(PlanSheets.of(CostTables.lines(cost)));
            if (!cost.stock().isEmpty()) {
                s.add(PlanSheets.of(CostTables.stock(cost)));
            }
        }
        return s;
    }

    /** Stages the plan and cost CSV files in {@code sink}. */
    void writeCsv(ReportFiles sink, List<Report> reports) throws IOException {
        if (plan != null) {
            sink.text(options.planCsv, reports, (r, w) -> PlanCsv.write(planTables.get(0), w), true);
            sink.text(options.orderCsv, reports, (r, w) -> PlanCsv.write(planTables.get(1), w), true);
            sink.text(options.cuttingCsv, reports, (r, w) -> PlanCsv.write(planTables.get(2), w), true);
        }
        if (cost != null) {
            sink.text(options.costs.costCsv, reports, (r, w) -> PlanCsv.write(CostTables.lines(cost), w), true);
            sink.text(options.costs.totalsCsv, reports, (r, w) -> PlanCsv.write(CostTables.totals(cost), w), true);
            sink.text(options.costs.stockCsv, reports, (r, w) -> PlanCsv.write(CostTables.stock(cost), w), true);
        }
    }

    /** Prints the plan and cost lines of the console summary. */
    void print(UnitSystem units, PrintWriter out) {
        if (plan != null) {
            PlanConsole.print(plan, units, out);
        }
        if (cost != null) {
            CostConsole.print(cost, out);
        }
    }
}
