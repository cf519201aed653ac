/**
 * Costs in every format: {@link org.linemass.reports.cost.CostTables} builds the cost tables
 * once as typed cells (rendered as CSV, sheets and HTML by the plan table writers),
 * {@link org.linemass.reports.cost.CostConsole} prints the totals and the missing prices, and
 * {@link org.linemass.reports.cost.CostJson} writes the {@code costs} object of the JSON report.
 */
package org.linemass.reports.cost;
