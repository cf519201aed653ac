package org.linemass.reports.csv;

import java.io.IOException;
import java.io.Writer;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import org.linemass.engine.result.DrawingResult;
import org.linemass.engine.result.MarkResult;
import org.linemass.engine.result.PieceResult;
import org.linemass.engine.shape.ShapeResult;
import org.linemass.reports.Report;
import org.linemass.reports.UnitSystem;

/**
 * The bar bending schedule: one row per mark, in the column order of a BS 8666 schedule (member, bar
 * mark, type and size, number, length of each bar, shape code, A, B, C, D, E, R), always in
 * millimetres as the standard schedules them, then the exact centre-line length, the formula length
 * minus the exact one and the notes; then one TOTAL row per bar size with its mass. The length of
 * each bar is the standard's formula length (the exact length for shapes 98 and 99) rounded up to
 * the next 25 mm (BS 8666:2005 cut-length rounding, from memory: check the clause); dimensions are to
 * the millimetre. Member is the layer; type and size is the section. With several drawings the first
 * column names the drawing.
 */
public final class ScheduleCsvWriter {

    /** Cut-length rounding step, mm (from memory, BS 8666:2005). */
    static final double STEP_MM = 25;

    private ScheduleCsvWriter() {
    }

    public static void write(List<Report> reports, Writer out) throws IOException {
        boolean multi = reports.size() > 1;
        CsvTable table = CsvTable.withDrawingColumn(out, multi, List.of("member", "bar mark", "type and size",
                "number", "length of each bar [mm]", "shape code", "A [mm]", "B [mm]", "C [mm]", "D [mm]", "E [mm]",
                "R [mm]", "exact centre-line length [mm]", "formula minus exact [mm]", "notes"));
        Map<String, Double> massBySize = new TreeMap<>();
        Map<String, Boolean> massKnown = new TreeMap<>();
        for (Report report : reports) {
            DrawingResult r = report.result();
            for (MarkResult m : r.groups()) {
                int id = m.pieceIds().get(0);
                PieceResult p = id >= 1 && id <= r.pieces().size() && r.pieces().get(id - 1).id() == id
                        ? r.pieces().get(id - 1) : r.pieces().stream().filter(q -> q.id() == id).findFirst().orElseThrow();
                ShapeResult s = p.form().shape();
                List<String> row = new ArrayList<>();
                if (multi) {
                    row.add(CsvCell.text(r.drawing().file()));
                }
                row.add(CsvCell.text(m.layer()));
                row.add(CsvCell.text(m.mark()));
                row.add(CsvCell.text(m.section()));
                row.add(Integer.toString(m.quantity()));
                if (s == null) {
                    row.add(mm(roundUp(p.lengthM())));
                    row.addAll(List.of("", "", "", "", "", "", "", mm(p.lengthM()), "", "no shape worked out"));
                } else {
                    double cut = s.formulaLengthM() != null ? s.formulaLengthM() : s.exactLengthM();
                    row.add(mm(roundUp(cut)));
                    row.add(s.code().code());
                    row.add(mm(s.aM()));
                    row.add(mm(s.bM()));
                    row.add(s.code() == org.linemass.engine.shape.ShapeCode.S77 ? turns(s.cM()) : mm(s.cM()));
                    row.add(mm(s.dM()));
                    row.add(mm(s.eM()));
                    row.add(mm(s.rM()));
                    row.add(mm(s.exactLengthM()));
                    row.add(s.formulaLengthM() == null ? "" : mm(s.formulaLengthM() - s.exactLengthM()));
                    row.add(CsvCell.text(String.join("; ", s.notes())));
                }
                table.row(row);
                String size = m.section() == null ? "" : m.section();
                massBySize.merge(size, m.massTotalKg() == null ? 0 : m.massTotalKg(), Double::sum);
                massKnown.merge(size, m.massTotalKg() != null, Boolean::logicalAnd);
            }
        }
        for (Map.Entry<String, Double> e : massBySize.entrySet()) {
            List<String> row = new ArrayList<>();
            if (multi) {
                row.add("");
            }
            boolean known = massKnown.get(e.getKey());
            row.addAll(List.of("TOTAL", "", CsvCell.text(e.getKey()), "", "", "", "", "", "", "", "", "", "", "",
                    CsvCell.text(known ? "mass " + UnitSystem.fixed(e.getValue(), 3) + " kg"
                            : "mass unknown: no section")));
            table.row(row);
        }
    }

    private static double roundUp(double m) {
        double mm = m * 1000;
        // a length already on the step (to rounding) stays there
        return Math.ceil(mm / STEP_MM - 1e-9) * STEP_MM / 1000;
    }

    private static String mm(Double m) {
        return m == null ? "" : UnitSystem.fixed(m * 1000, 0);
    }

    private static String turns(Double t) {
        return t == null ? "" : UnitSystem.fixed(t, 2) + " turns";
    }
}
