package org.linemass.reports.console;

import java.util.ArrayList;
import java.util.List;

/**
 * A plain-text table: columns padded to their widest cell (at most {@link #MAX_PAD} characters),
 * numeric columns right-aligned, two
 * spaces between columns, a dashed rule under the header. Control characters in cells (from
 * drawing names) are replaced by '?', so a layer name cannot move the cursor or inject colour.
 */
final class TextTable {

    /**
     * Columns before the last are padded to at most this many characters: a longer cell (a layer named with 100,000
     * letters) is written in full and pushes the rest of its own row along, instead of widening every
     * row of the table to its length (which made a 150 KB drawing print 335 MB).
     */
    static final int MAX_PAD = 64;

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
                // the last column is not padded, only wrapped (below)
                width[i] = Math.max(width[i], i == last ? r.get(i).length() : Math.min(r.get(i).length(), MAX_PAD));
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

    /** Narrowest last column kept beside the others; narrower, it goes on lines of its own. */
    static final int MIN_LAST_BESIDE = 40;

    /**
     * The table fitted to a terminal {@code columns} characters wide: the last (text) column wraps at
     * {@code maxLast} characters or at what the other columns leave of the width, whichever is less;
     * when they leave less than {@value #MIN_LAST_BESIDE}, the last column is written under each row,
     * indented by four more spaces and wrapped at the full width. Lines of the other columns may
     * still pass the width when those columns alone are wider.
     */
    String renderFitting(String indent, int maxLast, int columns) {
        int n = header.size();
        int last = n - 1;
        int lastStart = 0;
        for (int i = 0; i < last; i++) {
            int w = header.get(i).length();
            for (List<String> r : rows) {
                w = Math.max(w, r.get(i).length());
            }
            lastStart += w + 2;
        }
        int room = columns - 1 - indent.length() - lastStart;
        if (room >= MIN_LAST_BESIDE) {
            return render(indent, Math.min(maxLast, room));
        }
        boolean[] firstNumeric = java.util.Arrays.copyOf(numeric, last);
        TextTable head = new TextTable(header.subList(0, last), firstNumeric);
        rows.forEach(r -> head.rows.add(r.subList(0, last)));
        String[] lines = head.render(indent).split("\n", -1);
        StringBuilder sb = new StringBuilder();
        sb.append(lines[0]).append('\n').append(lines[1]).append('\n');
        String under = indent + "    ";
        int wrapAt = Math.max(MIN_LAST_BESIDE, columns - 1 - under.length());
        for (int k = 0; k < rows.size(); k++) {
            sb.append(lines[k + 2]).append('\n');
            for (String part : wrap(rows.get(k).get(last), wrapAt)) {
                sb.append(under).append(part).append('\n');
            }
        }
        return sb.toString();
    }

    /** Splits text into lines of at most {@code width} characters at spaces (longer words are cut). */
    static List<String> wrap(String text, int width) {
        return org.linemass.reports.Words.wrap(text, width);
    }

    private void line(StringBuilder sb, String indent, List<String> cells, int[] width) {
        StringBuilder l = new StringBuilder(indent);
        for (int i = 0; i < cells.size(); i++) {
            if (i > 0) {
                l.append("  ");
            }
            String c = cells.get(i);
            String pad = " ".repeat(Math.max(0, width[i] - c.length()));
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
