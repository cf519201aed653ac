package org.linemass.reports.csv;

import java.io.IOException;
import java.io.Writer;
import java.util.List;

/** Writes rows of already-formatted cells as RFC 4180 records ending in "\n". */
public final class CsvTable {

    private final Writer out;
    private final int columns;

    /**
     * A table whose header is {@code columns}, preceded by a {@code drawing} column when the run
     * covers several drawings (the combined files name each row's drawing), followed by a
     * {@code status} column ({@link org.linemass.reports.DrawingOutcome#status()}).
     */
    public static CsvTable withDrawingAndStatusColumns(Writer out, boolean severalDrawings, List<String> columns)
            throws IOException {
        List<String> header = new java.util.ArrayList<>(columns.size() + 2);
        if (severalDrawings) {
            header.add("drawing");
            header.add("status");
        }
        header.addAll(columns);
        return new CsvTable(out, header);
    }

    /** A table whose header is {@code columns}, preceded by a {@code drawing} column when the run covers several drawings. */
    public static CsvTable withDrawingColumn(Writer out, boolean severalDrawings, List<String> columns) throws IOException {
        List<String> header = new java.util.ArrayList<>(columns.size() + 1);
        if (severalDrawings) {
            header.add("drawing");
        }
        header.addAll(columns);
        return new CsvTable(out, header);
    }

    public CsvTable(Writer out, List<String> header) throws IOException {
        this.out = out;
        this.columns = header.size();
        row(header);
    }

    /**
     * The one row of a drawing that failed: its file and status, empty cells, and with
     * {@code messageLast} its message in the last column.
     */
    void failed(org.linemass.reports.DrawingOutcome o, boolean messageLast) throws IOException {
        List<String> row = new java.util.ArrayList<>(List.of(CsvCell.text(o.file()), o.status()));
        while (row.size() < columns - 1) {
            row.add("");
        }
        row.add(messageLast ? CsvCell.text(o.error()) : "");
        row(row);
    }

    public void row(List<String> cells) throws IOException {
        if (cells.size() != columns) {
            throw new IllegalArgumentException("CSV row has " + cells.size() + " cells, header has " + columns);
        }
        StringBuilder sb = new StringBuilder();
        for (int i = 0; i < cells.size(); i++) {
            if (i > 0) {
                sb.append(',');
            }
            sb.append(CsvCell.quote(cells.get(i) == null ? "" : cells.get(i)));
        }
        sb.append('\n');
        out.write(sb.toString());
    }
}
