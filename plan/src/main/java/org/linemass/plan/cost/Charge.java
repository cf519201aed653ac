package org.linemass.plan.cost;

import java.util.Arrays;
import java.util.Locale;
import java.util.Optional;

/**
 * What a unit price is paid for, with the name used in the price table's {@code charge} column
 * and the unit the quantity is counted in.
 */
public enum Charge {
    /** Material by mass, per kilogram. */
    PER_KG("per_kg", "kg"),
    /** One stock bar bought (optionally of one stock length only). */
    PER_BAR("per_bar", "bar"),
    /** One coil bought. */
    PER_COIL("per_coil", "coil"),
    /** One cut: every piece is cut once from its bar or coil. */
    PER_CUT("per_cut", "cut"),
    /** One bend made. */
    PER_BEND("per_bend", "bend"),
    /** One weld: a crossing or a T-junction the analysis found between pieces. */
    PER_WELD("per_weld", "weld");

    private final String tableName;
    private final String unit;

    Charge(String tableName, String unit) {
        this.tableName = tableName;
        this.unit = unit;
    }

    /** The name in the price table. */
    public String tableName() {
        return tableName;
    }

    /** The unit one quantity of this charge is counted in. */
    public String unit() {
        return unit;
    }

    /** The charge of a table name (case-insensitive), or empty. */
    public static Optional<Charge> of(String name) {
        String n = name.strip().toLowerCase(Locale.ROOT);
        return Arrays.stream(values()).filter(c -> c.tableName.equals(n)).findFirst();
    }

    /** The table names, for messages. */
    public static String names() {
        return String.join(", ", Arrays.stream(values()).map(Charge::tableName).toList());
    }
}
