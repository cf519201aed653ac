package org.linemass.reports.csv;

import java.util.ArrayList;
import java.util.List;

/** A strict RFC 4180 reader for tests: records end in "\n"; quoted fields may hold commas, quotes and line ends. */
final class CsvParse {

    private CsvParse() {
    }

    static List<List<String>> parse(String text) {
        List<List<String>> rows = new ArrayList<>();
        List<String> row = new ArrayList<>();
        StringBuilder f = new StringBuilder();
        boolean quoted = false;
        for (int i = 0; i < text.length(); i++) {
            char c = text.charAt(i);
            if (quoted) {
                if (c == '"') {
                    if (i + 1 < text.length() && text.charAt(i + 1) == '"') {
                        f.append('"');
                        i++;
                    } else {
                        quoted = false;
                    }
                } else {
                    f.append(c);
                }
            } else if (c == '"') {
                if (f.length() != 0) {
                    throw new IllegalArgumentException("quote inside an unquoted field at " + i);
                }
                quoted = true;
            } else if (c == ',') {
                row.add(f.toString());
                f.setLength(0);
            } else if (c == '\n') {
                row.add(f.toString());
                f.setLength(0);
                rows.add(row);
                row = new ArrayList<>();
            } else if (c == '\r') {
                throw new IllegalArgumentException("bare CR at " + i);
            } else {
                f.append(c);
            }
        }
        if (quoted || f.length() > 0 || !row.isEmpty()) {
            throw new IllegalArgumentException("last record not terminated");
        }
        return rows;
    }
}
