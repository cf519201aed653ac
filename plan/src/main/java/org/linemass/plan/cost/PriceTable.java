package org.linemass.plan.cost;

import java.util.List;
import java.util.Optional;
import org.linemass.plan.stock.StockTable;

/**
 * Unit prices in file order, the currency they are in (may be empty: the table named none) and
 * the table's file name. {@link #find} returns the last row that applies, so a general row first
 * and particular rows after it behave as a user expects (as in the stock table).
 */
public record PriceTable(List<UnitPrice> rows, String currency, String fileName) {

    /** Two stock lengths closer than this (metres) are the same length: 0.5 mm, below any saw's accuracy. */
    public static final double SAME_STOCK_LENGTH_M = 0.0005;

    public PriceTable {
        rows = List.copyOf(rows);
        currency = currency == null ? "" : currency;
    }

    /**
     * The price of {@code charge} for a section (null: no section) of a material (may be empty),
     * for {@link Charge#PER_BAR} of the given stock length (ignored for other charges).
     */
    public Optional<UnitPrice> find(Charge charge, String section, String material, double stockLengthM) {
        UnitPrice found = null;
        for (UnitPrice p : rows) {
            if (p.charge() == charge && applies(p.sectionPattern(), section) && applies(p.materialPattern(), material)
                    && (charge != Charge.PER_BAR || p.stockLengthM() == null
                            || Math.abs(p.stockLengthM() - stockLengthM) <= SAME_STOCK_LENGTH_M)) {
                found = p;
            }
        }
        return Optional.ofNullable(found);
    }

    private static boolean applies(String pattern, String name) {
        if (pattern.isEmpty()) {
            return true;
        }
        return name != null && StockTable.matches(pattern.toLowerCase(java.util.Locale.ROOT),
                name.toLowerCase(java.util.Locale.ROOT));
    }
}
