package org.linemass.reports.csv;

/**
 * One CSV cell as text. {@link #text} is for strings that came from a drawing or a user file: a
 * value starting with {@code = + - @}, a tab or a carriage return gets a leading single quote so
 * a spreadsheet shows it as text instead of running it as a formula. {@link #quote} applies
 * RFC 4180: a field containing a comma, quote, CR or LF is enclosed in double quotes with inner
 * quotes doubled. Numbers written by the writers themselves are not guarded (a negative
 * coordinate must stay a number).
 */
public final class CsvCell {

    private CsvCell() {
    }

    /** A text cell from untrusted input, guarded against formula injection; null gives "". */
    public static String text(String value) {
        if (value == null || value.isEmpty()) {
            return "";
        }
        char c = value.charAt(0);
        if (c == '=' || c == '+' || c == '-' || c == '@' || c == '\t' || c == '\r') {
            return "'" + value;
        }
        return value;
    }

    /** The field as written to the file, quoted when RFC 4180 requires it. */
    public static String quote(String field) {
        boolean needs = field.indexOf(',') >= 0 || field.indexOf('"') >= 0 || field.indexOf('\n') >= 0
                || field.indexOf('\r') >= 0;
        return needs ? '"' + field.replace("\"", "\"\"") + '"' : field;
    }
}
