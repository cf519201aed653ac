package org.linemass.reports.xlsx;

import org.dhatim.fastexcel.Worksheet;

/**
 * Writes the cells of one sheet row by row, left to right: {@link #text}, {@link #number},
 * {@link #integer} and {@link #blank} each fill the next cell, {@link #end} closes the row and
 * checks it has as many cells as the header. A null value gives an empty cell (never a zero).
 * Not thread-safe: one sheet is written by one thread.
 */
public final class SheetRows {

    private final Worksheet sheet;
    private final int columns;
    private int row;
    private int col;
    /** Characters of the widest cell written in each column, as shown. */
    private final int[] widest;

    SheetRows(Worksheet sheet, int columns, int firstRow) {
        this.sheet = sheet;
        this.columns = columns;
        this.row = firstRow;
        this.widest = new int[columns];
    }

    /** Characters of the widest cell written so far in column {@code c} (0 for none). */
    int widest(int c) {
        return widest[c];
    }

    private void seen(int length) {
        if (col < widest.length) {
            widest[col] = Math.max(widest[col], length);
        }
    }

    /** A string cell; null or empty gives an empty cell. */
    public SheetRows text(String value) {
        if (value != null && !value.isEmpty()) {
            sheet.value(row, col, value);
            seen(value.length());
        }
        col++;
        return this;
    }

    /**
     * A numeric cell shown with {@code decimals} decimals (the stored value keeps full precision);
     * null or a non-finite value gives an empty cell.
     */
    public SheetRows number(Double value, int decimals) {
        if (value != null && Double.isFinite(value)) {
            sheet.value(row, col, value);
            sheet.style(row, col).format(format(decimals)).set();
            seen(org.linemass.reports.UnitSystem.fixed(value, Math.max(0, decimals)).length());
        }
        col++;
        return this;
    }

    /** A whole-number cell. */
    public SheetRows integer(long value) {
        sheet.value(row, col, value);
        seen(Long.toString(value).length());
        col++;
        return this;
    }

    /** An empty cell. */
    public SheetRows blank() {
        col++;
        return this;
    }

    /** Ends the row; the cell count must equal the header's. */
    public void end() {
        if (col != columns) {
            throw new IllegalStateException("sheet '" + sheet.getName() + "' row " + (row + 1) + " has " + col
                    + " cells, header has " + columns);
        }
        row++;
        col = 0;
    }

    /** Rows written so far, header included. */
    int rowCount() {
        return row;
    }

    static String format(int decimals) {
        return decimals <= 0 ? "0" : "0." + "0".repeat(decimals);
    }
}
