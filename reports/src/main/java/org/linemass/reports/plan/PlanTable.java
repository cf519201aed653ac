package org.linemass.reports.plan;

import java.util.List;

/**
 * A table of the plan: a name, a header with units, and rows of cells, each a {@link String}, a
 * {@link Long}, a {@link Num} or null (empty).
 */
public record PlanTable(String name, List<String> header, List<List<Object>> rows) {

    /** A number shown with fixed decimals. */
    public record Num(double value, int decimals) {
    }

    public PlanTable {
        header = List.copyOf(header);
        rows = rows.stream().map(r -> java.util.Collections.unmodifiableList(new java.util.ArrayList<>(r))).toList();
        for (List<Object> r : rows) {
            if (r.size() != header.size()) {
                throw new IllegalArgumentException(name + ": a row of " + r.size() + " cells under " + header.size()
                        + " columns");
            }
        }
    }
}
