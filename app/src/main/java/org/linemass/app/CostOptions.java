package org.linemass.app;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.linemass.plan.stock.PlanInputException;
import org.linemass.plan.cost.PriceTable;
import org.linemass.plan.cost.PriceTableReader;
import picocli.CommandLine.Option;

/**
 * The cost options of {@code check} (mixed into {@link PlanOptions}): the price table and the
 * cost report files. Costs are worked out only when a price table is given.
 */
final class CostOptions {

    @Option(names = "--price-table", paramLabel = "CSV",
            description = "Unit prices: charge (per_kg, per_bar, per_coil, per_cut, per_bend, per_weld), section, "
                    + "material, stock_length_mm, unit_price, currency.")
    Path priceTable;

    @Option(names = "--cost-csv", paramLabel = "FILE",
            description = "Write the cost lines (per mark and drawing, with their formulas) as CSV.")
    String costCsv;

    @Option(names = "--cost-totals-csv", paramLabel = "FILE",
            description = "Write the cost totals (per drawing, job, missing prices) as CSV.")
    String totalsCsv;

    @Option(names = "--stock-cost-csv", paramLabel = "FILE",
            description = "Write the cost of the stock of the cutting plan as CSV.")
    String stockCsv;

    List<String> targets() {
        List<String> t = new ArrayList<>();
        for (String s : new String[] {costCsv, totalsCsv, stockCsv}) {
            if (s != null) {
                t.add(s);
            }
        }
        return t;
    }

    /** The price table, or null when none is given; cost reports without one are refused. */
    PriceTable prices() throws InputProblem, IOException {
        if (priceTable == null) {
            if (!targets().isEmpty()) {
                throw new InputProblem("--cost-csv, --cost-totals-csv and --stock-cost-csv need --price-table");
            }
            return null;
        }
        try {
            return PriceTableReader.read(priceTable);
        } catch (PlanInputException e) {
            throw new InputProblem(e.getMessage());
        }
    }
}
