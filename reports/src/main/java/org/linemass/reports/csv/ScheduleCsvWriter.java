package org.linemass.reports.csv;

import java.io.IOException;
import java.io.Writer;
import java.util.ArrayList;
import java.util.List;
import org.linemass.reports.Report;
import org.linemass.reports.UnitSystem;
import org.linemass.reports.schedule.ScheduleLine;
import org.linemass.reports.schedule.ScheduleLines;
import org.linemass.reports.schedule.SizeTotal;

/**
 * The bar bending schedule as CSV: one row per mark ({@link ScheduleLines}), in the column order of a
 * BS 8666 schedule as remembered (member, bar mark, type and size, number, length of each bar, shape
 * code, A, B, C, D, E, R; the order was not checked against the standard's schedule form:
 * unverified), always in millimetres as the standard schedules them, then the exact centre-line
 * length, the formula length minus the exact one and the notes; then one TOTAL row per bar size with
 * its mass. Dimensions are to the millimetre. With several drawings the first column names the
 * drawing.
 */
public final class ScheduleCsvWriter {

    private ScheduleCsvWriter() {
    }

    public static void write(List<Report> reports, Writer out) throws IOException {
        boolean multi = reports.size() > 1;
        CsvTable table = CsvTable.withDrawingColumn(out, multi, List.of("member", "bar mark", "type and size",
                "number", "length of each bar [mm]", "shape code", "A [mm]", "B [mm]", "C [mm]", "D [mm]", "E [mm]",
                "R [mm]", "exact centre-line length [mm]", "formula minus exact [mm]", "notes"));
        for (Report report : reports) {
            for (ScheduleLine l : ScheduleLines.of(report)) {
                List<String> row = new ArrayList<>();
                if (multi) {
                    row.add(CsvCell.text(l.drawing()));
                }
                row.add(CsvCell.text(l.member()));
                row.add(CsvCell.text(l.mark()));
                row.add(CsvCell.text(l.size()));
                row.add(Integer.toString(l.number()));
                row.add(mm(l.cutLengthM()));
                row.add(l.shapeCode() == null ? "" : l.shapeCode());
                row.add(mm(l.a()));
                row.add(mm(l.b()));
                row.add(l.cTurns() ? turns(l.c()) : mm(l.c()));
                row.add(mm(l.d()));
                row.add(mm(l.e()));
                row.add(mm(l.r()));
                row.add(mm(l.exactLengthM()));
                row.add(mm(l.formulaMinusExactM()));
                row.add(CsvCell.text(String.join("; ", l.notes())));
                table.row(row);
            }
        }
        for (SizeTotal t : ScheduleLines.totals(reports)) {
            List<String> row = new ArrayList<>();
            if (multi) {
                row.add("");
            }
            row.addAll(List.of("TOTAL", "", CsvCell.text(t.size()), "", "", "", "", "", "", "", "", "", "", "",
                    CsvCell.text(t.massKg() != null ? "mass " + UnitSystem.fixed(t.massKg(), 3) + " kg"
                            : "mass unknown: no section")));
            table.row(row);
        }
    }

    private static String mm(Double m) {
        return m == null ? "" : UnitSystem.fixed(m * 1000, 0);
    }

    private static String turns(Double t) {
        return t == null ? "" : UnitSystem.fixed(t, 2) + " turns";
    }
}
