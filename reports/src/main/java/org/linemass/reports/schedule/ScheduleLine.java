package org.linemass.reports.schedule;

import java.util.List;
import org.linemass.engine.result.MarkResult;
import org.linemass.engine.shape.ShapeResult;

/**
 * One line of the bar bending schedule (lengths in metres): drawing file, member (the layer), bar
 * mark, type and size (the section, null when none), number of bars, length of each bar (rounded up
 * by {@link ScheduleLines#roundUp}), shape code (null when no shape was worked out), dimensions A to E
 * and R (null where the shape has none; for shape 77, {@code c} is the number of turns and
 * {@code cTurns} is set), the exact centre-line length, the formula length minus the exact one (null
 * without a formula), the mass of all bars of the mark (kilograms, null without a section) and the
 * notes.
 */
public record ScheduleLine(String drawing, String member, String mark, String size, int number, double cutLengthM,
        String shapeCode, Double a, Double b, Double c, Double d, Double e, Double r, boolean cTurns,
        double exactLengthM, Double formulaMinusExactM, Double massKg, List<String> notes) {

    public ScheduleLine {
        notes = List.copyOf(notes);
    }

    static ScheduleLine of(String drawing, MarkResult m, ShapeResult s, double pieceLengthM) {
        double cut = ScheduleLines.roundUp(ScheduleLines.uncut(s, pieceLengthM));
        if (s == null) {
            return new ScheduleLine(drawing, m.layer(), m.mark(), m.section(), m.quantity(), cut, null, null, null, null,
                    null, null, null, false, pieceLengthM, null, m.massTotalKg(), List.of("no shape worked out"));
        }
        return new ScheduleLine(drawing, m.layer(), m.mark(), m.section(), m.quantity(), cut, s.code().code(), s.aM(),
                s.bM(), s.cM(), s.dM(), s.eM(), s.rM(), ScheduleLines.cIsTurns(s), s.exactLengthM(),
                s.formulaLengthM() == null ? null : s.formulaLengthM() - s.exactLengthM(), m.massTotalKg(), s.notes());
    }
}
