package org.linemass.app;

import java.util.List;

/**
 * An aligned plain-text table for the listing commands: columns padded to their widest cell, the
 * flagged columns right-aligned, two spaces between columns, a dashed rule under the header,
 * trailing blanks stripped. Control characters in cells are shown as '?'.
 */
final class PlainTable {

    private PlainTable() {
    }

    static String render(String[] head, boolean[] right, List<String[]> rows) {
        int[] w = new int[head.length];
        for (int i = 0; i < head.length; i++) {
            w[i] = head[i].length();
        }
        String[][] cells = new String[rows.size()][];
        for (int r = 0; r < rows.size(); r++) {
            cells[r] = new String[head.length];
            for (int i = 0; i < head.length; i++) {
                String c = rows.get(r)[i];
                cells[r][i] = clean(c == null ? "" : c);
                w[i] = Math.max(w[i], cells[r][i].length());
            }
        }
        StringBuilder b = new StringBuilder();
        line(b, head, w, right);
        StringBuilder rule = new StringBuilder();
        for (int i = 0; i < w.length; i++) {
            rule.append(i == 0 ? "" : "  ").append("-".repeat(w[i]));
        }
        b.append(rule).append('\n');
        for (String[] c : cells) {
            line(b, c, w, right);
        }
        return b.toString();
    }

    private static void line(StringBuilder b, String[] c, int[] w, boolean[] right) {
        StringBuilder l = new StringBuilder();
        for (int i = 0; i < c.length; i++) {
            if (i > 0) {
                l.append("  ");
            }
            String pad = " ".repeat(w[i] - c[i].length());
            l.append(right[i] ? pad + c[i] : c[i] + pad);
        }
        b.append(l.toString().stripTrailing()).append('\n');
    }

    private static String clean(String s) {
        return s.codePoints().map(c -> Character.isISOControl(c) ? '?' : c)
                .collect(StringBuilder::new, StringBuilder::appendCodePoint, StringBuilder::append).toString();
    }
}
