package org.linemass.plan.cost;

/**
 * One row of a price table: the charge, the section and material globs it applies to (empty
 * matches any, including a piece without a section), for {@link Charge#PER_BAR} optionally one
 * stock length in metres (null: any length), the price of one unit, and the table line it came
 * from (for the report: where a price came from).
 */
public record UnitPrice(Charge charge, String sectionPattern, String materialPattern, Double stockLengthM,
        double price, int line) {

    public UnitPrice {
        sectionPattern = sectionPattern == null ? "" : sectionPattern;
        materialPattern = materialPattern == null ? "" : materialPattern;
        if (!(price >= 0) || !Double.isFinite(price)) {
            throw new IllegalArgumentException("a unit price must be finite and not negative, got " + price);
        }
        if (stockLengthM != null && (!(stockLengthM > 0) || !Double.isFinite(stockLengthM))) {
            throw new IllegalArgumentException("a stock length must be positive, got " + stockLengthM + " m");
        }
    }
}
