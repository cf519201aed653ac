package org.linemass.reports.schedule;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import org.linemass.engine.result.DrawingResult;
import org.linemass.engine.result.MarkResult;
import org.linemass.engine.result.PieceResult;
import org.linemass.engine.shape.ShapeCode;
import org.linemass.engine.shape.ShapeResult;
import org.linemass.reports.Report;

/**
 * The lines of the bar bending schedule, shared by its CSV, spreadsheet and JSON forms: one line per
 * mark, in the drawing's mark order, with the shape of the mark's first piece; and the mass per bar
 * size over all drawings, in order of the size's name. The length of each bar is the formula length
 * (the exact centre-line length for shapes 98 and 99 and for a piece with no shape) rounded up to the
 * next {@link #STEP_M}.
 */
public final class ScheduleLines {

    /**
     * Cut-length rounding step (metres): 25 mm, from memory of BS 8666:2005 (cut lengths rounded up to
     * the next 25 mm); the clause was not checked here: unverified.
     */
    public static final double STEP_M = 0.025;

    /** Lengths within this share of a step above a multiple of it stay on it (dimensionless; rounding). */
    private static final double ON_STEP = 1e-9;

    private ScheduleLines() {
    }

    /** One line per mark of {@code report}. */
    public static List<ScheduleLine> of(Report report) {
        return of(report.result());
    }

    /** One line per mark of {@code r}. */
    public static List<ScheduleLine> of(DrawingResult r) {
        List<ScheduleLine> out = new ArrayList<>();
        for (MarkResult m : r.groups()) {
            PieceResult p = firstPiece(r, m);
            out.add(ScheduleLine.of(r.drawing().file(), m, p.form().shape(), p.lengthM()));
        }
        return out;
    }

    /** Mass per bar size (section name; "" for none) over {@code reports}, sorted by size name. */
    public static List<SizeTotal> totals(List<Report> reports) {
        return totalsOf(reports.stream().map(Report::result).toList());
    }

    /** Mass per bar size over {@code results}, sorted by size name. */
    public static List<SizeTotal> totalsOf(List<DrawingResult> results) {
        Map<String, Double> mass = new TreeMap<>();
        Map<String, Boolean> known = new TreeMap<>();
        for (DrawingResult r : results) {
            for (MarkResult m : r.groups()) {
                String size = m.section() == null ? "" : m.section();
                mass.merge(size, m.massTotalKg() == null ? 0 : m.massTotalKg(), Double::sum);
                known.merge(size, m.massTotalKg() != null, Boolean::logicalAnd);
            }
        }
        List<SizeTotal> out = new ArrayList<>();
        mass.forEach((size, kg) -> out.add(new SizeTotal(size, known.get(size) ? kg : null)));
        return out;
    }

    /** {@code m} rounded up to the next {@link #STEP_M}; a length already on a step stays there. */
    public static double roundUp(double m) {
        // in whole millimetres first, so 1525 mm is 1.525 m and not 1.5250000000000001
        double stepMm = STEP_M * 1000;
        return Math.ceil(m * 1000 / stepMm - ON_STEP) * stepMm / 1000;
    }

    /** The length a bar is cut to before rounding: the formula length, else the exact length. */
    static double uncut(ShapeResult s, double pieceLengthM) {
        if (s == null) {
            return pieceLengthM;
        }
        return s.formulaLengthM() != null ? s.formulaLengthM() : s.exactLengthM();
    }

    /** Whether dimension C of {@code s} is a number of turns (shape 77) rather than a length. */
    static boolean cIsTurns(ShapeResult s) {
        return s != null && s.code() == ShapeCode.S77;
    }

    /** The mark's first piece (ids are 1.. in list order; searched when a hand-built result is not). */
    public static PieceResult firstPiece(DrawingResult r, MarkResult m) {
        int id = m.pieceIds().get(0);
        if (id >= 1 && id <= r.pieces().size() && r.pieces().get(id - 1).id() == id) {
            return r.pieces().get(id - 1);
        }
        return r.pieces().stream().filter(q -> q.id() == id).findFirst().orElseThrow();
    }
}
