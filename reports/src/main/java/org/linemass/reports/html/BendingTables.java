package org.linemass.reports.html;

import java.util.List;
import org.linemass.engine.bender.BenderProgram;
import org.linemass.engine.bender.BenderStep;
import org.linemass.engine.bender.Coil;
import org.linemass.engine.result.DrawingResult;
import org.linemass.engine.result.MarkResult;
import org.linemass.engine.result.PieceResult;
import org.linemass.engine.shape.ShapeResult;
import org.linemass.reports.UnitSystem;

/**
 * The HTML report's bending sections, shown when some piece is bent or coiled: the bar bending
 * schedule (one row per mark, BS 8666 shape code, dimensions A to E and R, formula and exact lengths
 * in millimetres, notes) and, per mark, the bender data of its first piece (feed, rotation of the
 * bending plane, bend angle, radius, arc length; coils with turns and pitch) and its coils.
 */
final class BendingTables {

    private BendingTables() {
    }

    static void write(StringBuilder s, DrawingResult r) {
        boolean bent = r.pieces().stream().anyMatch(p -> !p.form().program().steps().isEmpty());
        if (!bent) {
            return;
        }
        s.append("<h3>Bending schedule</h3>\n<p class=\"meta\">Shape codes and dimensions after BS 8666:2005 "
                + "(millimetres; A to E out-to-out next to 90 and 180 degree bends); the exact length is the drawn "
                + "centre-line. Check against the edition the project specifies.</p>\n");
        s.append("<table class=\"data\">\n<tr><th>member</th><th>bar mark</th><th>type and size</th><th>number</th>"
                + "<th>shape code</th><th>A</th><th>B</th><th>C</th><th>D</th><th>E</th><th>R</th>"
                + "<th>formula length</th><th>exact length</th><th>notes</th></tr>\n");
        for (MarkResult m : r.groups()) {
            ShapeResult sh = first(r, m).form().shape();
            s.append("<tr>");
            HtmlTables.cell(s, m.layer(), false);
            HtmlTables.cell(s, m.mark(), false);
            HtmlTables.cell(s, m.section(), false);
            HtmlTables.cell(s, Integer.toString(m.quantity()), true);
            if (sh == null) {
                s.append("<td colspan=\"10\">no shape worked out</td>");
            } else {
                HtmlTables.cell(s, sh.code().code(), false);
                boolean helix = sh.code() == org.linemass.engine.shape.ShapeCode.S77;
                HtmlTables.cell(s, mm(sh.aM()), true);
                HtmlTables.cell(s, mm(sh.bM()), true);
                // for a helix C is the number of turns
                HtmlTables.cell(s, helix ? UnitSystem.fixed(sh.cM(), 2) + " turns" : mm(sh.cM()), true);
                for (Double v : new Double[] {sh.dM(), sh.eM(), sh.rM()}) {
                    HtmlTables.cell(s, mm(v), true);
                }
                HtmlTables.cell(s, mm(sh.formulaLengthM()), true);
                HtmlTables.cell(s, mm(sh.exactLengthM()), true);
                HtmlTables.cell(s, String.join("; ", sh.notes()), false);
            }
            s.append("</tr>\n");
        }
        s.append("</table>\n<h3>Bender data</h3>\n<p class=\"meta\">From the start of the first piece of each mark: "
                + "feed, then turn the bending plane about the feed direction (right-handed, degrees), then bend. "
                + "Geometry of the drawn centre-line only; springback is the machine's business.</p>\n");
        for (MarkResult m : r.groups()) {
            PieceResult p = first(r, m);
            BenderProgram prog = p.form().program();
            if (prog.steps().isEmpty()) {
                continue;
            }
            s.append("<details><summary>").append(Html.escape(m.mark())).append(" (piece ").append(p.id())
                    .append(", ").append(prog.steps().size()).append(prog.steps().size() == 1 ? " step" : " steps")
                    .append(prog.exact() ? "" : ", not all exact").append(")</summary>\n");
            s.append("<table class=\"data\">\n<tr><th>step</th><th>feed [mm]</th><th>rotation [deg]</th>"
                    + "<th>bend [deg]</th><th>radius [mm]</th><th>arc [mm]</th><th>turns</th><th>pitch [mm]</th></tr>\n");
            int k = 1;
            for (BenderStep st : prog.steps()) {
                boolean coil = st.kind() == BenderStep.Kind.COIL;
                s.append("<tr>");
                HtmlTables.cell(s, (coil ? "coil " : "bend ") + k++, false);
                HtmlTables.cell(s, UnitSystem.fixed(st.feedM() * 1000, 1), true);
                HtmlTables.cell(s, UnitSystem.fixed(st.rotationDeg(), 2), true);
                HtmlTables.cell(s, UnitSystem.fixed(st.angleDeg(), 2), true);
                HtmlTables.cell(s, UnitSystem.fixed(st.radiusM() * 1000, 1), true);
                HtmlTables.cell(s, UnitSystem.fixed(st.arcLengthM() * 1000, 1), true);
                HtmlTables.cell(s, coil ? UnitSystem.fixed(st.turns(), 2) : "", true);
                HtmlTables.cell(s, coil ? UnitSystem.fixed(st.pitchM() * 1000, 2) : "", true);
                s.append("</tr>\n");
            }
            s.append("<tr>");
            HtmlTables.cell(s, "last feed", false);
            HtmlTables.cell(s, UnitSystem.fixed(prog.lastFeedM() * 1000, 1), true);
            s.append("<td colspan=\"6\"></td></tr>\n</table>\n");
            s.append("<p>").append(Html.escape(BendLimitText.of(p.form()))).append("</p>\n");
            List<Coil> coils = p.form().coils();
            for (Coil c : coils) {
                s.append("<p>").append(c.closed() ? "Ring" : "Coil").append(": ").append(UnitSystem.fixed(c.turns(), 2))
                        .append(" turns, pitch ").append(UnitSystem.fixed(c.pitchM() * 1000, 2))
                        .append(" mm, mean diameter ").append(UnitSystem.fixed(c.meanDiameterM() * 1000, 2))
                        .append(" mm</p>\n");
            }
            s.append("</details>\n");
        }
    }

    /** The mark's first piece (ids are 1.. in list order; searched when a hand-built result is not). */
    static PieceResult first(DrawingResult r, MarkResult m) {
        int id = m.pieceIds().get(0);
        if (id >= 1 && id <= r.pieces().size() && r.pieces().get(id - 1).id() == id) {
            return r.pieces().get(id - 1);
        }
        return r.pieces().stream().filter(p -> p.id() == id).findFirst().orElseThrow();
    }

    private static String mm(Double m) {
        return m == null ? "" : UnitSystem.fixed(m * 1000, 0);
    }
}
