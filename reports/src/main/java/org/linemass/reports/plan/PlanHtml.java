package org.linemass.reports.plan;

import java.util.List;
import org.linemass.reports.html.Html;

/** Plan tables as one HTML section ("Cutting plan and order"), every cell escaped. */
public final class PlanHtml {

    private PlanHtml() {
    }

    public static String section(List<PlanTable> tables) {
        StringBuilder s = new StringBuilder();
        s.append("<section class=\"plan\" id=\"plan\">\n<h2>Cutting plan and order</h2>\n");
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
