package org.linemass.reports.xlsx;

import java.util.ArrayList;
import java.util.List;
import org.linemass.reports.Report;
import org.linemass.reports.UnitSystem;

/**
 * The sheets {@code check --xlsx} writes, in tab order: about (drawings, units, completeness and
 * the caution), bill of materials, pieces, findings, layers and the bending schedule. With several drawings each table
 * starts with a {@code drawing} column, as the combined CSV files do. Callers may append further
 * sheets (cutting plan, bending schedule) to the returned list before writing.
 */
public final class CheckSheets {

    private CheckSheets() {
    }

    /** The sheets of {@code reports}, a fresh mutable list. */
    public static List<XlsxSheet> of(List<Report> reports, UnitSystem units) {
        if (reports.isEmpty()) {
            throw new IllegalArgumentException("no drawing to report");
        }
        List<XlsxSheet> sheets = new ArrayList<>();
        sheets.add(new AboutSheet(reports, units));
        sheets.add(new BomSheet(reports, units));
        sheets.add(new PiecesSheet(reports, units));
        sheets.add(new FindingsSheet(reports, units));
        sheets.add(new LayersSheet(reports, units));
        sheets.add(new ScheduleSheet(reports));
        return sheets;
    }

    /** The header with a leading {@code drawing} column when there are several drawings. */
    static List<String> header(List<Report> reports, List<String> columns) {
        List<String> h = new ArrayList<>();
        if (reports.size() > 1) {
            h.add("drawing");
        }
        h.addAll(columns);
        return h;
    }

    /** Starts a row with the drawing's file name when there are several drawings. */
    static SheetRows start(SheetRows rows, List<Report> reports, Report r) {
        if (reports.size() > 1) {
            rows.text(r.result().drawing().file());
        }
        return rows;
    }
}
