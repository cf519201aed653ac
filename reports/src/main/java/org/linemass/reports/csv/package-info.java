/**
 * CSV reports for spreadsheets: bill of materials, pieces and findings. RFC 4180 quoting, "\n"
 * line ends, Locale.ROOT numbers, units in the header names, and text cells from the drawing
 * guarded against formula injection ({@link org.linemass.reports.csv.CsvCell}).
 */
package org.linemass.reports.csv;
