package org.linemass.plan.cost;

/**
 * One priced quantity: in which drawing (empty for the stock of a job plan), which mark (empty for
 * the welds of a drawing and for stock), of which section (null: none), what is paid for
 * ({@code item}: {@code material}, {@code stock share}, {@code cuts}, {@code bends}, {@code welds},
 * {@code bars}, {@code coils}), how many units ({@code quantity} of {@code unit}), the unit price
 * and the cost, the formula as text and where the price came from ({@code source}, e.g.
 * {@code prices.csv line 4}). When a price is missing, {@code unitPrice} and {@code cost} are null
 * and {@code missing} says which price the table lacks; a cost is never made up as zero.
 */
public record CostLine(String drawing, String mark, String section, String item, double quantity, String unit,
        Double unitPrice, Double cost, String formula, String source, String missing) {

    /** True when the line has a cost. */
    public boolean priced() {
        return cost != null;
    }
}
