package org.linemass.reports.xlsx;

import java.io.FilterOutputStream;
import java.io.IOException;
import java.io.OutputStream;
import java.util.HashSet;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import org.dhatim.fastexcel.Workbook;
import org.dhatim.fastexcel.Worksheet;

/**
 * Writes sheets into one .xlsx workbook on a stream, which stays open (so {@link
 * org.linemass.reports.io.AtomicWrite} can force it to disk). Each sheet gets a bold, frozen header
 * row with an auto-filter and columns wide enough for their titles. Sheet names must be unique
 * (case-insensitively, as spreadsheet programs require) and valid tab names.
 */
public final class XlsxWorkbook {

    /** Application name and version written into the document properties (version form XX.YYYY). */
    private static final String APPLICATION = "linemass";
    private static final String APP_VERSION = "0.1";
    /** Widest column set from a title, in characters (readability choice, no source). */
    private static final int MAX_WIDTH = 60;
    /** Narrowest column, in characters (readability choice, no source). */
    private static final int MIN_WIDTH = 8;

    private XlsxWorkbook() {
    }

    /** Writes {@code sheets} in order; at least one is needed. */
    public static void write(List<XlsxSheet> sheets, OutputStream out) throws IOException {
        if (sheets.isEmpty()) {
            throw new IllegalArgumentException("a workbook needs at least one sheet");
        }
        Set<String> names = new HashSet<>();
        for (XlsxSheet s : sheets) {
            checkName(s.name());
            if (!names.add(s.name().toLowerCase(Locale.ROOT))) {
                throw new IllegalArgumentException("two sheets are named '" + s.name() + "'");
            }
        }
        Workbook wb = new Workbook(new KeepOpen(out), APPLICATION, APP_VERSION);
        for (XlsxSheet s : sheets) {
            Worksheet ws = wb.newWorksheet(s.name());
            List<String> header = s.header();
            for (int c = 0; c < header.size(); c++) {
                ws.value(0, c, header.get(c));
                ws.style(0, c).bold().set();
            }
            SheetRows rows = new SheetRows(ws, header.size(), 1);
            s.fill(rows);
            // each column as wide as its header or its widest cell, whichever is wider, within bounds
            for (int c = 0; c < header.size(); c++) {
                int chars = Math.max(header.get(c).length(), rows.widest(c)) + 2;
                ws.width(c, Math.max(MIN_WIDTH, Math.min(MAX_WIDTH, chars)));
            }
            ws.freezePane(0, 1);
            ws.setAutoFilter(0, 0, header.size() - 1);
            ws.finish();
        }
        wb.finish();
        out.flush();
    }

    private static void checkName(String name) {
        if (name == null || name.isEmpty() || name.length() > 31 || name.matches(".*[:\\\\/?*\\[\\]].*")) {
            throw new IllegalArgumentException("not a valid sheet name: '" + name + "'");
        }
    }

    /** Lets the workbook close its zip stream without closing the caller's stream. */
    private static final class KeepOpen extends FilterOutputStream {
        KeepOpen(OutputStream out) {
            super(out);
        }

        @Override
        public void write(byte[] b, int off, int len) throws IOException {
            out.write(b, off, len);
        }

        @Override
        public void close() throws IOException {
            flush();
        }
    }
}
