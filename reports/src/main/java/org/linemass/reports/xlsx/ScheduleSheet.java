package org.linemass.reports.xlsx;

import java.util.List;
import org.linemass.reports.Report;
import org.linemass.reports.schedule.ScheduleLine;
import org.linemass.reports.schedule.ScheduleLines;
import org.linemass.reports.schedule.SizeTotal;

/**
 * The bar bending schedule: the rows of the schedule CSV ({@link ScheduleLines}) as typed cells, always
 * in millimetres as the standard schedules them (length of each bar and A to E, R to the millimetre;
 * for shape 77, C is the number of turns, two decimals, and the notes say so), then one TOTAL row per
 * bar size with its mass in kilograms (each line's mass is that of all bars of its mark).
 */
final class ScheduleSheet implements XlsxSheet {

    private static final double MM = 1000;

    private final List<Report> reports;

    ScheduleSheet(List<Report> reports) {
        this.reports = reports;
    }

    @Override
    public String name() {
        return "bending schedule";
    }

    @Override
    public List<String> header() {
        return CheckSheets.header(reports, List.of("member", "bar mark", "type and size", "number",
                "length of each bar [mm]", "shape code", "A [mm]", "B [mm]", "C [mm]", "D [mm]", "E [mm]", "R [mm]",
                "exact centre-line length [mm]", "formula minus exact [mm]", "mass [kg]", "notes"));
    }

    @Override
    public void fill(SheetRows rows) {
        for (Report report : reports) {
            for (ScheduleLine l : ScheduleLines.of(report)) {
                CheckSheets.start(rows, reports, report).text(l.member()).text(l.mark()).text(l.size())
                        .integer(l.number()).number(l.cutLengthM() * MM, 0).text(l.shapeCode()).number(mm(l.a()), 0)
                        .number(mm(l.b()), 0).number(l.cTurns() ? l.c() : mm(l.c()), l.cTurns() ? 2 : 0)
                        .number(mm(l.d()), 0).number(mm(l.e()), 0).number(mm(l.r()), 0)
                        .number(l.exactLengthM() * MM, 0).number(mm(l.formulaMinusExactM()), 0).number(l.massKg(), 3)
                        .text(notes(l)).end();
            }
        }
        for (SizeTotal t : ScheduleLines.totals(reports)) {
            if (reports.size() > 1) {
                rows.blank();
            }
            rows.text("TOTAL").blank().text(t.size()).blank().blank().blank().blank().blank().blank().blank().blank()
                    .blank().blank().blank().number(t.massKg(), 3)
                    .text(t.massKg() == null ? "mass unknown: no section" : "").end();
        }
    }

    private static String notes(ScheduleLine l) {
        String n = String.join("; ", l.notes());
        return l.cTurns() ? (n.isEmpty() ? "C is the number of turns" : "C is the number of turns; " + n) : n;
    }

    private static Double mm(Double m) {
        return m == null ? null : m * MM;
    }
}
