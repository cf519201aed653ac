/**
 * Spreadsheet (Office Open XML, .xlsx) reports for people: one workbook, one sheet per table,
 * numbers stored as typed numeric cells in the unit named in the column header, shown with the
 * same fixed decimals as the CSV files but kept at full precision. Text from the drawing is stored
 * as string cells, never as formulas.
 *
 * <p>To add a sheet, implement {@link org.linemass.reports.xlsx.XlsxSheet} (a name, a header and a
 * method that fills rows through {@link org.linemass.reports.xlsx.SheetRows}) and pass it to
 * {@link org.linemass.reports.xlsx.XlsxWorkbook#write} with the others; {@link
 * org.linemass.reports.xlsx.CheckSheets} builds the sheets of {@code check}.
 */
package org.linemass.reports.xlsx;
