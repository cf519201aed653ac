/**
 * The cutting plan and order list in every format: {@link org.linemass.reports.plan.PlanTables}
 * builds the tables once as typed cells, and {@link org.linemass.reports.plan.PlanCsv},
 * {@link org.linemass.reports.plan.PlanSheets} and {@link org.linemass.reports.plan.PlanHtml}
 * render them as CSV, spreadsheet sheets and an HTML section.
 */
package org.linemass.reports.plan;
