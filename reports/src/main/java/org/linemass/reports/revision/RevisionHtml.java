package org.linemass.reports.revision;

import java.io.IOException;
import java.io.Writer;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.linemass.plan.revision.ChangeKind;
import org.linemass.plan.revision.RevisionCost;
import org.linemass.plan.revision.RevisionDiff;
import org.linemass.reports.Caution;
import org.linemass.reports.Report;
import org.linemass.reports.UnitSystem;
import org.linemass.reports.html.Html;
import org.linemass.reports.plan.PlanHtml;
import org.linemass.reports.plan.PlanTable;

/**
 * The revision comparison as one self-contained HTML page: the two files, the counts, the matching
 * rule and its tolerance, the picture with the changes coloured, the tables (changed pieces,
 * sections, marks) and the caution. Every text is escaped; lines end with {@code \n}.
 */
public final class RevisionHtml {

    private RevisionHtml() {
    }

    public static void write(RevisionDiff diff, Report a, Report b, RevisionCost cost, UnitSystem units, Writer out)
            throws IOException {
        RevisionTables t = new RevisionTables(units, cost);
        StringBuilder s = new StringBuilder();
        s.append("<!DOCTYPE html>\n<html lang=\"en\">\n<head>\n<meta charset=\"utf-8\">\n<title>")
                .append(Html.escape("Revisions: " + diff.fileA() + " and " + diff.fileB())).append("</title>\n")
                .append("<style>body{font-family:sans-serif;margin:1em;max-width:1200px}table{border-collapse:collapse;"
                        + "margin:0.5em 0}td,th{border:1px solid #bbb;padding:2px 6px;font-size:0.9em}td.num{text-align:right}"
                        + "svg.revision{max-width:100%;height:auto;border:1px solid #ddd}.legend span{margin-right:1em}"
                        + "div.scroll{overflow-x:auto}</style>\n</head>\n<body>\n");
        s.append("<h1>What changed between two revisions</h1>\n<p>Revision A: ").append(Html.escape(diff.fileA()))
                .append("<br>Revision B: ").append(Html.escape(diff.fileB())).append("</p>\n<p>");
        Map<ChangeKind, Integer> n = diff.counts();
        List<String> parts = new ArrayList<>();
        for (ChangeKind k : ChangeKind.values()) {
            parts.add(n.get(k) + " " + k.label());
        }
        s.append(Html.escape(String.join(", ", parts))).append(".</p>\n<p>").append(Html.escape(RevisionConsole.rule(diff,
                units))).append("</p>\n");
        if (cost != null && !cost.complete()) {
            s.append("<p>Missing prices (their lines have no cost; cost changes of what they touch are left empty): ")
                    .append(Html.escape(String.join("; ", cost.missing()))).append(".</p>\n");
        }
        s.append(RevisionSvg.legend()).append(RevisionSvg.render(diff, a, b));
        List<PlanTable> tables = new ArrayList<>(List.of(t.sections(diff), t.marks(diff), t.pieces(diff)));
        PlanTable renumbered = t.renumbered(diff);
        if (!renumbered.rows().isEmpty()) {
            tables.add(renumbered);
        }
        s.append("<div class=\"scroll\">\n").append(PlanHtml.section("revisions", "Differences", List.of(), tables))
                .append("</div>\n");
        s.append("<p class=\"caution\">").append(Html.escape(Caution.TEXT)).append("</p>\n</body>\n</html>\n");
        out.write(s.toString());
    }
}
