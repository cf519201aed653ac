package org.linemass.reports.revision;

import java.io.PrintWriter;
import java.util.List;
import java.util.Map;
import org.linemass.plan.revision.ChangeKind;
import org.linemass.plan.revision.RevisionCost;
import org.linemass.plan.revision.RevisionDiff;
import org.linemass.reports.Caution;
import org.linemass.reports.UnitSystem;
import org.linemass.reports.plan.PlanTable;

/** The revision comparison for the terminal: counts, the rule, the section table and every changed piece. */
public final class RevisionConsole {

    private RevisionConsole() {
    }

    /** The matching rule with the tolerances in the report's units, as one sentence. */
    public static String rule(RevisionDiff diff, UnitSystem u) {
        String place = u.shortLength(diff.tolerance().placeM()) + " " + u.shortUnit();
        String shape = u.shortLength(diff.tolerance().shapeM()) + " " + u.shortUnit();
        return "Pieces are matched by shape and place: the same shape is the same section, closedness and number "
                + "of bends with cut lengths and principal radii of gyration within " + shape + "; the same place is "
                + "centroids within " + place + ". Same shape and place: unchanged; same shape elsewhere: moved; "
                + "same place or an end shared (within " + place + ") with another shape: changed; the rest of A: "
                + "removed, of B: added.";
    }

    public static void print(RevisionDiff diff, RevisionCost cost, UnitSystem units, boolean quiet, PrintWriter out) {
        Map<ChangeKind, Integer> n = diff.counts();
        StringBuilder head = new StringBuilder("revision A ").append(diff.fileA()).append("\nrevision B ")
                .append(diff.fileB()).append('\n');
        for (ChangeKind k : ChangeKind.values()) {
            head.append(String.format(java.util.Locale.ROOT, "  %-10s %d", k.label(), n.get(k))).append('\n');
        }
        out.print(head);
        RevisionTables t = new RevisionTables(units, cost);
        if (!quiet) {
            out.println(rule(diff, units));
            print("Sections", t.sections(diff), out);
            if (!diff.same()) {
                print("Changed pieces", t.pieces(diff), out);
            }
            PlanTable renumbered = t.renumbered(diff);
            if (!renumbered.rows().isEmpty()) {
                print("Renumbered marks (same pieces, another mark in B)", renumbered, out);
            }
            if (cost != null && !cost.complete()) {
                out.println("missing prices: " + String.join("; ", cost.missing()));
            }
            out.println();
            org.linemass.reports.Words.wrap("Caution: " + Caution.TEXT, 99).forEach(out::println);
        }
        out.flush();
    }

    private static void print(String title, PlanTable table, PrintWriter out) {
        out.println();
        out.println(title);
        List<String> header = table.header();
        int[] w = new int[header.size()];
        for (int i = 0; i < w.length; i++) {
            w[i] = header.get(i).length();
            for (List<Object> r : table.rows()) {
                w[i] = Math.max(w[i], cell(r.get(i)).length());
            }
        }
        out.println(line(header.stream().map(h -> (Object) h).toList(), w));
        for (List<Object> r : table.rows()) {
            out.println(line(r, w));
        }
    }

    private static String line(List<Object> cells, int[] w) {
        StringBuilder s = new StringBuilder(" ");
        for (int i = 0; i < w.length; i++) {
            String c = cell(cells.get(i));
            boolean num = cells.get(i) instanceof PlanTable.Num || cells.get(i) instanceof Long;
            s.append(' ').append(num ? " ".repeat(w[i] - c.length()) + c : c + " ".repeat(w[i] - c.length()));
        }
        return s.toString().stripTrailing();
    }

    private static String cell(Object c) {
        if (c instanceof PlanTable.Num n) {
            return UnitSystem.fixed(n.value(), n.decimals());
        }
        return c == null ? "" : c.toString();
    }
}
