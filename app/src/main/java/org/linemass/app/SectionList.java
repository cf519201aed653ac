package org.linemass.app;

import java.util.List;
import org.linemass.engine.section.Section;
import org.linemass.reports.UnitSystem;

/** Formats section rows as an aligned table, one line per section, its source last. */
final class SectionList {

    private SectionList() {
    }

    static String render(List<Section> rows, UnitSystem u, double perLong, String massPer) {
        String[] head = {"id", "mass per length [" + massPer + "]", "diameter [" + u.shortUnit() + "]", "material",
            "description", "source"};
        String[][] cells = new String[rows.size()][];
        int[] w = new int[head.length];
        for (int i = 0; i < head.length; i++) {
            w[i] = head[i].length();
        }
        for (int r = 0; r < rows.size(); r++) {
            Section s = rows.get(r);
            cells[r] = new String[] {s.id(), UnitSystem.fixed(s.kgPerM() * perLong, 4), u.shortLength(s.diameterM()),
                nz(s.material()), nz(s.description()), nz(s.source())};
            for (int i = 0; i < head.length; i++) {
                cells[r][i] = clean(cells[r][i]);
                w[i] = Math.max(w[i], cells[r][i].length());
            }
        }
        StringBuilder b = new StringBuilder();
        line(b, head, w);
        StringBuilder rule = new StringBuilder();
        for (int i = 0; i < w.length; i++) {
            rule.append(i == 0 ? "" : "  ").append("-".repeat(w[i]));
        }
        b.append(rule).append('\n');
        for (String[] c : cells) {
            line(b, c, w);
        }
        return b.toString();
    }

    private static void line(StringBuilder b, String[] c, int[] w) {
        StringBuilder l = new StringBuilder();
        for (int i = 0; i < c.length; i++) {
            if (i > 0) {
                l.append("  ");
            }
            boolean right = i == 1 || i == 2;
            String pad = " ".repeat(w[i] - c[i].length());
            l.append(right ? pad + c[i] : c[i] + pad);
        }
        b.append(l.toString().stripTrailing()).append('\n');
    }

    private static String nz(String s) {
        return s == null ? "" : s;
    }

    private static String clean(String s) {
        return s.codePoints().map(c -> Character.isISOControl(c) ? '?' : c)
                .collect(StringBuilder::new, StringBuilder::appendCodePoint, StringBuilder::append).toString();
    }
}
