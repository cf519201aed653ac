package org.linemass.plan.cost;

import java.math.BigDecimal;
import java.util.Locale;

/** Fixed, locale-free number texts for cost formulas: quantities, unit prices and costs. */
final class Money {

    private Money() {
    }

    /** A unit price as written, with at least two decimals (0.035 stays 0.035, 2 becomes 2.00). */
    static String price(double p) {
        BigDecimal b = BigDecimal.valueOf(p).stripTrailingZeros();
        return b.setScale(Math.max(2, b.scale())).toPlainString();
    }

    /** A cost with two decimals. */
    static String cost(double c) {
        return String.format(Locale.ROOT, "%.2f", c);
    }

    /** A quantity: whole counts as integers, masses and lengths with three decimals. */
    static String quantity(double q, String unit) {
        return unit.equals("kg") || unit.equals("m") ? String.format(Locale.ROOT, "%.3f", q)
                : Long.toString(Math.round(q));
    }

    /** The unit as it reads after the quantity: counts other than one take an s (3 bends), kg and m do not. */
    static String plural(double q, String unit) {
        return unit.equals("kg") || unit.equals("m") || Math.round(q) == 1 ? unit : unit + "s";
    }
}
