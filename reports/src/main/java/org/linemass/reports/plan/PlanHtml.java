package org.linemass.reports.plan;

import java.util.List;
import org.linemass.reports.html.Html;

/** Plan tables (and other job tables, such as costs) as one HTML section, every cell escaped. */
public final class PlanHtml {

    private PlanHtml() {
    }

    public static String section(List<PlanTable> tables) {
        return section("plan", "Cutting plan and order", List.of(), tables);
    }

    /**
     * Tables as one HTML section with the given id and heading, the {@code notes} as paragraphs
     * under the heading; every text escaped.
     */
    public static String section(String id, String heading, List<String> notes, List<PlanTable> tables) {
        StringBuilder s = new StringBuilder();
        s.append("<section class=\"plan\" id=\"").append(Html.escape(id)).append("\">\n<h2>")
                .append(Html.escape(heading)).append("</h2>\n");
        for (String n : notes) {
            s.append("<p>").append(Html.escape(n)).append("</p>\n");
        }
        for (PlanTable t : tables) {
            s.append("<h3>").append(Html.escape(t.name())).append("</h3>\n<table class=\"plan\">\n<tr>");
            for (String h : t.header()) {
                s.append("<th>").append(Html.escape(h)).append("</th>");
            }
            s.append("</tr>\n");
            for (List<Object> r : t.rows()) {
                s.append("<tr>");
                for (Object c : r) {
                    boolean num = c instanceof PlanTable.Num || c instanceof Long;
                    s.append(num ? "<td class=\"num\">" : "<td>").append(Html.escape(cell(c))).append("</td>");
                }
                s.append("</tr>\n");
            }
            s.append("</table>\n");
        }
        s.append("</section>\n");
        return s.toString();
    }

    private static String cell(Object c) {
        if (c == null) {
            return "";
        }
        if (c instanceof PlanTable.Num n) {
            return org.linemass.reports.UnitSystem.fixed(n.value(), n.decimals());
        }
        return c.toString();
    }
}
