package org.linemass.reports.json;

import com.fasterxml.jackson.core.JsonGenerator;
import java.io.IOException;
import java.util.List;
import org.linemass.engine.result.DrawingResult;
import org.linemass.reports.schedule.ScheduleLine;
import org.linemass.reports.schedule.ScheduleLines;
import org.linemass.reports.schedule.SizeTotal;

/**
 * The drawing document's {@code schedule} object: the standard the shape codes follow, the cut-length
 * rounding step, one entry per mark ({@link ScheduleLines}, lengths in metres like the rest of the
 * report; {@code c_is_turns} marks shape 77, whose C is a number of turns) and the mass per bar size.
 */
final class ScheduleJson {

    private ScheduleJson() {
    }

    static void write(JsonGenerator g, DrawingResult r) throws IOException {
        g.writeObjectFieldStart("schedule");
        g.writeStringField("standard", "BS 8666:2005");
        g.writeNumberField("cut_length_step_m", ScheduleLines.STEP_M);
        g.writeArrayFieldStart("lines");
        for (ScheduleLine l : ScheduleLines.of(r)) {
            g.writeStartObject();
            g.writeStringField("member", l.member());
            g.writeStringField("bar_mark", l.mark());
            g.writeStringField("type_and_size", l.size());
            g.writeNumberField("number", l.number());
            num(g, "cut_length_each_m", l.cutLengthM());
            g.writeStringField("shape_code", l.shapeCode());
            num(g, "a_m", l.a());
            num(g, "b_m", l.b());
            num(g, "c", l.c());
            g.writeBooleanField("c_is_turns", l.cTurns());
            num(g, "d_m", l.d());
            num(g, "e_m", l.e());
            num(g, "r_m", l.r());
            num(g, "exact_length_m", l.exactLengthM());
            num(g, "formula_minus_exact_m", l.formulaMinusExactM());
            num(g, "mass_kg", l.massKg());
            g.writeArrayFieldStart("notes");
            for (String n : l.notes()) {
                g.writeString(n);
            }
            g.writeEndArray();
            g.writeEndObject();
        }
        g.writeEndArray();
        g.writeArrayFieldStart("totals_by_size");
        for (SizeTotal t : ScheduleLines.totalsOf(List.of(r))) {
            g.writeStartObject();
            g.writeStringField("type_and_size", t.size());
            num(g, "mass_kg", t.massKg());
            g.writeEndObject();
        }
        g.writeEndArray();
        g.writeEndObject();
    }

    private static void num(JsonGenerator g, String name, Double v) throws IOException {
        g.writeFieldName(name);
        if (v == null || !Double.isFinite(v)) {
            g.writeNull();
        } else {
            g.writeNumber(v);
        }
    }
}
