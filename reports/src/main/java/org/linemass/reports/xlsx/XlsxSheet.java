package org.linemass.reports.xlsx;

import java.util.List;

/**
 * One sheet of a workbook: its tab name (at most 31 characters, none of {@code : \ / ? * [ ]}),
 * its header row (units in brackets, as in the CSV files), and the rows under it. The header is
 * written in bold, frozen and given an auto-filter by {@link XlsxWorkbook}; {@link #fill} writes
 * the data rows, each exactly as many cells wide as the header.
 */
public interface XlsxSheet {

    /** The tab name. */
    String name();

    /** Column titles, with units in brackets. */
    List<String> header();

    /** Writes the data rows (the header is already there). */
    void fill(SheetRows rows);
}
