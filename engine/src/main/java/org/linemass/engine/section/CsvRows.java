package org.linemass.engine.section;

import java.io.BufferedReader;
import java.io.IOException;
import java.nio.charset.CharacterCodingException;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;

/**
 * A small CSV reader for the section, material and assignment tables: comma-separated, fields may
 * be enclosed in double quotes (a doubled quote inside stands for one), blank lines and lines
 * starting with {@code #} are skipped, the first remaining line is the header (names compared
 * without case and surrounding spaces). Each row keeps its 1-based line number for messages.
 * Errors are IllegalArgumentException with the line number; callers add the file name.
 */
final class CsvRows {

    /** One data row. */
    record Row(int line, Map<String, String> values) {

        /** The trimmed value of a column, empty when the column is absent or blank. */
        Optional<String> get(String column) {
            String v = values.get(column);
            return v == null || v.isBlank() ? Optional.empty() : Optional.of(v.trim());
        }

        String require(String column) {
            return get(column).orElseThrow(() -> new IllegalArgumentException(
                    "line " + line + ": column " + column + " is empty"));
        }

        double number(String column) {
            String v = require(column);
            try {
                double d = Double.parseDouble(v);
                if (!Double.isFinite(d)) {
                    throw new NumberFormatException();
                }
                return d;
            } catch (NumberFormatException e) {
                String hint = v.matches("[+-]?\\d+,\\d+") ? " (write decimals with a point: " + v.replace(',', '.')
                        + ")" : "";
                throw new IllegalArgumentException("line " + line + ": column " + column + " is not a number: " + v
                        + hint);
            }
        }

        double positive(String column) {
            double d = number(column);
            if (!(d > 0)) {
                throw new IllegalArgumentException("line " + line + ": column " + column + " must be positive, got "
                        + values.get(column).trim());
            }
            return d;
        }
    }

    private final List<String> header;
    private final List<Row> rows;

    private CsvRows(List<String> header, List<Row> rows) {
        this.header = header;
        this.rows = rows;
    }

    List<String> header() {
        return header;
    }

    List<Row> rows() {
        return rows;
    }

    boolean has(String column) {
        return header.contains(column);
    }

    static CsvRows read(BufferedReader in) throws IOException {
        List<String> header = null;
        List<Row> rows = new ArrayList<>();
        String text;
        int line = 0;
        while ((text = readLine(in)) != null) {
            line++;
            if (line == 1 && text.startsWith("\uFEFF")) {
                text = text.substring(1);
            }
            if (text.isBlank() || text.stripLeading().startsWith("#")) {
                continue;
            }
            List<String> fields = split(text, line);
            if (header == null) {
                if (fields.size() == 1 && (text.indexOf(';') >= 0 || text.indexOf('\t') >= 0)) {
                    String sep = text.indexOf(';') >= 0 ? "';'" : "tabs";
                    throw new IllegalArgumentException("line " + line + ": the columns are separated by " + sep
                            + ", not commas (a spreadsheet saved with a comma-decimal setting?); save it as CSV with "
                            + "',' between columns and '.' in decimals");
                }
                header = fields.stream().map(f -> f.trim().toLowerCase(Locale.ROOT)).toList();
                continue;
            }
            if (fields.size() > header.size()) {
                boolean decimalComma = false;
                for (int i = 0; i + 1 < fields.size(); i++) {
                    decimalComma |= fields.get(i).trim().matches("[+-]?\\d+") && fields.get(i + 1).matches("\\d+\\s*");
                }
                throw new IllegalArgumentException("line " + line + ": " + fields.size() + " fields but the header has "
                        + header.size() + (decimalComma ? " (a decimal comma? write decimals with a point, or quote "
                        + "the field)" : ""));
            }
            Map<String, String> values = new HashMap<>();
            for (int i = 0; i < fields.size(); i++) {
                values.put(header.get(i), fields.get(i));
            }
            rows.add(new Row(line, values));
        }
        if (header == null) {
            throw new IllegalArgumentException("no header row");
        }
        return new CsvRows(header, rows);
    }

    /**
     * One line; a byte sequence that is not UTF-8 becomes an IllegalArgumentException with a plain
     * message (the decoder's own, "Input length = 1", says nothing). No line number: the reader
     * decodes ahead of the line it returns.
     */
    private static String readLine(BufferedReader in) throws IOException {
        try {
            return in.readLine();
        } catch (CharacterCodingException e) {
            throw new IllegalArgumentException("not UTF-8 text (malformed byte sequence); save the file as UTF-8", e);
        }
    }

    static List<String> split(String text, int line) {
        List<String> out = new ArrayList<>();
        StringBuilder cur = new StringBuilder();
        boolean quoted = false;
        for (int i = 0; i < text.length(); i++) {
            char c = text.charAt(i);
            if (quoted) {
                if (c == '"') {
                    if (i + 1 < text.length() && text.charAt(i + 1) == '"') {
                        cur.append('"');
                        i++;
                    } else {
                        quoted = false;
                    }
                } else {
                    cur.append(c);
                }
            } else if (c == '"') {
                quoted = true;
            } else if (c == ',') {
                out.add(cur.toString());
                cur.setLength(0);
            } else {
                cur.append(c);
            }
        }
        if (quoted) {
            throw new IllegalArgumentException("line " + line + ": unterminated quoted field");
        }
        out.add(cur.toString());
        return out;
    }
}
