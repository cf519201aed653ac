package org.linemass.app;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.linemass.plan.cutting.CutSettings;
import org.linemass.plan.stock.PlanInputException;
import org.linemass.plan.stock.SectionStock;
import org.linemass.plan.stock.StockLength;
import org.linemass.plan.stock.StockTable;
import org.linemass.plan.stock.StockTableReader;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;

/**
 * The cutting plan options of {@code check}: where the stock comes from (a stock table, or one
 * set of stock lengths for every section), kerf, minimum offcut, the solver's time, and the plan
 * report files. A plan is made only when stock is given (here or in the section table).
 */
final class PlanOptions {

    @Mixin
    CostOptions costs = new CostOptions();

    @Mixin
    MarksFromOption marks = new MarksFromOption();

    @Option(names = "--stock-table", paramLabel = "CSV",
            description = "Stock per section: section,stock_lengths_mm,stock_counts,kerf_mm,min_offcut_mm,coil_kg "
                    + "(the same columns may also be in the section table).")
    Path stockTable;

    @Option(names = "--stock", paramLabel = "LENGTHS", split = ",", converter = Converters.Length.class,
            description = "Stock lengths for every section not in the stock table, e.g. 6m,12m.")
    List<Double> stock;

    @Option(names = "--kerf", paramLabel = "LENGTH", converter = Converters.Length.class,
            description = "Saw kerf or cut allowance per cut with --stock (default 0mm).")
    Double kerfM;

    @Option(names = "--min-offcut", paramLabel = "LENGTH", converter = Converters.Length.class,
            description = "Shortest offcut kept for reuse with --stock (default: none kept).")
    Double minOffcutM;

    @Option(names = "--plan-time", paramLabel = "SECONDS",
            description = "Solver time per section in seconds (default ${DEFAULT-VALUE}).")
    double planSeconds = 10;

    @Option(names = "--cutting-csv", paramLabel = "FILE", description = "Write the cutting patterns as CSV.")
    String cuttingCsv;

    @Option(names = "--order-csv", paramLabel = "FILE", description = "Write the order list (stock per section) as CSV.")
    String orderCsv;

    @Option(names = "--plan-csv", paramLabel = "FILE",
            description = "Write the plan summary (bought, used, waste, bound, gap per section) as CSV.")
    String planCsv;

    /** {@code inputs} with the stock and price tables added, so no report overwrites them. */
    org.linemass.reports.io.ProtectedFiles protect(org.linemass.reports.io.ProtectedFiles inputs) {
        if (stockTable != null) {
            inputs.add(stockTable, "stock table");
        }
        if (costs.priceTable != null) {
            inputs.add(costs.priceTable, "price table");
        }
        if (marks.file() != null) {
            inputs.add(marks.file(), "earlier revision");
        }
        return inputs;
    }

    /** Every report file of the plan and cost options. */
    List<String> targets() {
        List<String> t = planTargets();
        t.addAll(costs.targets());
        return t;
    }

    /** The report files of the cutting plan. */
    List<String> planTargets() {
        List<String> t = new ArrayList<>();
        for (String s : new String[] {cuttingCsv, orderCsv, planCsv}) {
            if (s != null) {
                t.add(s);
            }
        }
        return t;
    }

    CutSettings settings() throws InputProblem {
        if (!(planSeconds > 0) || planSeconds > 86_400) {
            throw new InputProblem("--plan-time must be between 0 and 86400 seconds, got " + planSeconds);
        }
        return new CutSettings(CutSettings.DEFAULT.resolutionM(), Math.max(1, (long) (planSeconds * 1000)));
    }

    /**
     * The stock of the run, or null when none is given and no plan report is asked for: a catch-all
     * row from --stock, then the stock columns of the section table ({@code sectionTable}, may be
     * null), then the stock table's rows, so that the more particular source wins.
     */
    StockTable table(Path sectionTable) throws InputProblem, IOException {
        List<SectionStock> rows = new ArrayList<>();
        if (stock != null) {
            rows.add(new SectionStock("*", stock.stream().map(l -> new StockLength(l, null)).toList(),
                    kerfM == null ? 0 : kerfM, minOffcutM == null ? 0 : minOffcutM, null));
        }
        if (sectionTable != null) {
            try {
                rows.addAll(StockTableReader.readColumns(sectionTable).rows());
            } catch (PlanInputException e) {
                throw new InputProblem(e.getMessage());
            }
        }
        if (stockTable != null) {
            try {
                rows.addAll(StockTableReader.read(stockTable).rows());
            } catch (PlanInputException e) {
                throw new InputProblem(e.getMessage());
            }
        }
        if (rows.isEmpty()) {
            if (planTargets().isEmpty()) {
                return null;
            }
            throw new InputProblem("--cutting-csv, --order-csv and --plan-csv need --stock, --stock-table or "
                    + "stock columns in the section table");
        }
        return new StockTable(rows);
    }
}
