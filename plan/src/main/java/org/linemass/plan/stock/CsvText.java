package org.linemass.plan.stock;

import java.io.IOException;
import java.io.StringReader;
import java.util.Locale;
import java.util.Map;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVRecord;

/**
 * The CSV dialect of the plan's input tables (stock, prices): RFC 4180 with a header row, names
 * compared without case, fields trimmed, blank lines and lines starting with {@code #} skipped;
 * and the line a record starts on, for messages. For one thread at a time (a parser and its
 * cursor belong to one read).
 */
public final class CsvText {

    private static final CSVFormat FORMAT = CSVFormat.RFC4180.builder().setHeader().setSkipHeaderRecord(true)
            .setCommentMarker('#').setIgnoreEmptyLines(true).setTrim(true).setIgnoreHeaderCase(true)
            .setAllowMissingColumnNames(true).get();

    private final String text;
    private long scanned;
    private long line = 1;

    private CsvText(String text) {
        this.text = text;
    }

    /** A reader of {@code text} (a leading byte-order mark is dropped). */
    public static CsvText of(String text) {
        return new CsvText(text.startsWith("\uFEFF") ? text.substring(1) : text);
    }

    /** A parser over the text; IOException (and UncheckedIOException while iterating) for malformed CSV. */
    public CSVParser parser() throws IOException {
        return CSVParser.builder().setReader(new StringReader(text)).setFormat(FORMAT).get();
    }

    /** The 1-based line {@code r} starts on; records must be asked for in order (the text is scanned once). */
    public long lineOf(CSVRecord r) {
        int end = (int) Math.min(r.getCharacterPosition(), text.length());
        // the parser's position may be at blank or comment lines it skipped before the record
        while (end < text.length()) {
            int nl = text.indexOf('\n', end);
            String ahead = text.substring(end, nl < 0 ? text.length() : nl);
            if (nl < 0 || !(ahead.isBlank() || ahead.startsWith("#"))) {
                break;
            }
            end = nl + 1;
        }
        for (long i = scanned; i < end; i++) {
            if (text.charAt((int) i) == '\n') {
                line++;
            }
        }
        scanned = Math.max(scanned, end);
        return line;
    }

    /** The trimmed value of a column (any case), empty when the column is absent or the row short. */
    public static String cell(CSVRecord r, String column) {
        for (Map.Entry<String, Integer> e : r.getParser().getHeaderMap().entrySet()) {
            if (e.getKey() != null && e.getKey().toLowerCase(Locale.ROOT).equals(column)) {
                return e.getValue() < r.size() ? r.get(e.getValue()) : "";
            }
        }
        return "";
    }

    /** True when the header names {@code column} (any case). */
    public static boolean has(CSVParser p, String column) {
        return p.getHeaderMap().keySet().stream().anyMatch(h -> h != null && h.equalsIgnoreCase(column));
    }
}
