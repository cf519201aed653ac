package org.linemass.reports.console;

import java.util.ArrayList;
import java.util.List;

/**
 * A plain-text table: columns padded to their widest cell, numeric columns right-aligned, two
 * spaces between columns, a dashed rule under the header. Control characters in cells (from
 * drawing names) are replaced by '?', so a layer name cannot move the cursor or inject colour.
 */
final class TextTable {

    private final List<String> header;
    private final boolean[] numeric;
    private final List<List<String>> rows = new ArrayList<>();

    TextTable(List<String> header, boolean... numeric) {
        if (numeric.length != header.size()) {
            throw new IllegalArgumentException("alignment flags " + numeric.length + " for " + header.size() + " columns");
        }
        this.header = List.copyOf(header);
        this.numeric = numeric.clone();
    }

    void add(List<String> cells) {
        if (cells.size() != header.size()) {
            throw new IllegalArgumentException("row of " + cells.size() + " cells for " + header.size() + " columns");
        }
        List<String> clean = new ArrayList<>();
        for (String c : cells) {
            clean.add(clean(c));
        }
        rows.add(clean);
    }

    boolean isEmpty() {
        return rows.isEmpty();
    }

    /** The table as lines ending in "\n", each line prefixed with {@code indent}. */
    String render(String indent) {
        return render(indent, Integer.MAX_VALUE);
    }

    /**
     * As {@link #render(String)}, but a last (text) column wider than {@code lastWidth} characters
     * is wrapped at spaces onto continuation lines aligned under that column.
     */
    String render(String indent, int lastWidth) {
        int[] width = new int[header.size()];
        int last = width.length - 1;
        for (int i = 0; i < width.length; i++) {
            width[i] = header.get(i).length();
            for (List<String> r : rows) {
                width[i] = Math.max(width[i], r.get(i).length());
            }
        }
        width[last] = Math.max(header.get(last).length(), Math.min(width[last], Math.max(lastWidth, 10)));
        StringBuilder sb = new StringBuilder();
        line(sb, indent, header, width);
        StringBuilder rule = new StringBuilder();
        for (int i = 0; i < width.length; i++) {
            rule.append(i == 0 ? "" : "  ").append("-".repeat(width[i]));
        }
        sb.append(indent).append(rule).append('\n');
        int lastStart = 0;
        for (int i = 0; i < last; i++) {
            lastStart += width[i] + 2;
        }
        for (List<String> r : rows) {
            List<String> parts = wrap(r.get(last), width[last]);
            List<String> first = new ArrayList<>(r);
            first.set(last, parts.get(0));
            line(sb, indent, first, width);
            for (String more : parts.subList(1, parts.size())) {
                sb.append(indent).append(" ".repeat(lastStart)).append(more).append('\n');
            }
        }
        return sb.toString();
    }

    /** Splits text into lines of at most {@code width} characters at spaces (longer words are cut). */
    static List<String> wrap(String text, int width) {
        List<String> out = new ArrayList<>();
        String rest = text;
        while (rest.length() > width) {
            int cut = rest.lastIndexOf(' ', width);
            if (cut <= 0) {
                cut = width;
            }
            out.add(rest.substring(0, cut).stripTrailing());
            rest = rest.substring(cut).stripLeading();
        }
        out.add(rest);
        return out;
    }

    private void line(StringBuilder sb, String indent, List<String> cells, int[] width) {
        StringBuilder l = new StringBuilder(indent);
        for (int i = 0; i < cells.size(); i++) {
            if (i > 0) {
                l.append("  ");
            }
            String c = cells.get(i);
            String pad = " ".repeat(width[i] - c.length());
            l.append(numeric[i] ? pad + c : c + pad);
        }
        sb.append(l.toString().stripTrailing()).append('\n');
    }

    static String clean(String s) {
        if (s == null) {
            return "";
        }
        StringBuilder b = new StringBuilder(s.length());
        for (int i = 0; i < s.length(); i++) {
            char c = s.charAt(i);
            b.append(Character.isISOControl(c) ? '?' : c);
        }
        return b.toString();
    }
}
