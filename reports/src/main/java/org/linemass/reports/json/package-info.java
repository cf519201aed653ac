/**
 * The JSON report: the stable machine-readable contract, described by the JSON Schema resource
 * {@code org/linemass/reports/linemass-report.schema.json}. SI units throughout; null means "not
 * known", never zero.
 */
package org.linemass.reports.json;
