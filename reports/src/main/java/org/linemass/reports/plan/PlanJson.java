package org.linemass.reports.plan;

import com.fasterxml.jackson.core.JsonGenerator;
import java.io.IOException;
import org.linemass.plan.JobPlan;
import org.linemass.plan.SectionPlan;
import org.linemass.plan.Unplanned;
import org.linemass.plan.cutting.CutPattern;
import org.linemass.plan.cutting.CutPlan;
import org.linemass.plan.cutting.Demand;
import org.linemass.plan.cutting.PatternPiece;
import org.linemass.plan.stock.StockLength;
import org.linemass.reports.json.JsonNumbers;
import org.linemass.reports.json.JsonPart;

/**
 * The {@code cutting_plan} object of the JSON report, in SI units: per section its stock, the
 * bars or coils bought, lengths and masses bought and used, waste share, reusable offcuts, the
 * lower bound and gap, the method, notes, the patterns and the pieces not cut; then the pieces not
 * planned and the job's masses. The solver's wall time is left out so that the report of the same
 * input is the same file (it is in the plan CSV and on the console).
 */
public final class PlanJson implements JsonPart {

    private final JobPlan job;

    public PlanJson(JobPlan job) {
        this.job = job;
    }

    @Override
    public String key() {
        return "cutting_plan";
    }

    @Override
    public void write(JsonGenerator g) throws IOException {
        g.writeStartObject();
        g.writeArrayFieldStart("sections");
        for (SectionPlan sp : job.sections()) {
            section(g, sp);
        }
        g.writeEndArray();
        g.writeArrayFieldStart("unplanned");
        for (Unplanned u : job.unplanned()) {
            g.writeStartObject();
            g.writeStringField("section", u.section());
            g.writeStringField("mark", u.mark());
            g.writeNumberField("quantity", u.quantity());
            g.writeStringField("reason", u.reason());
            g.writeEndObject();
        }
        g.writeEndArray();
        JsonNumbers.field(g, "mass_bought_kg", job.massBoughtKg());
        JsonNumbers.field(g, "mass_used_kg", job.massUsedKg());
        g.writeEndObject();
    }

    private static void section(JsonGenerator g, SectionPlan sp) throws IOException {
        CutPlan p = sp.plan();
        g.writeStartObject();
        g.writeStringField("section", sp.section());
        JsonNumbers.field(g, "kg_per_m", sp.kgPerM());
        g.writeObjectFieldStart("stock");
        g.writeArrayFieldStart("lengths");
        for (StockLength l : sp.stock().lengths()) {
            g.writeStartObject();
            JsonNumbers.field(g, "length_m", l.lengthM());
            g.writeFieldName("available");
            if (l.available() == null) {
                g.writeNull();
            } else {
                g.writeNumber(l.available());
            }
            g.writeEndObject();
        }
        g.writeEndArray();
        JsonNumbers.field(g, "coil_kg", sp.stock().coilKg());
        JsonNumbers.field(g, "kerf_m", sp.stock().kerfM());
        JsonNumbers.field(g, "min_offcut_m", sp.stock().minOffcutM());
        g.writeEndObject();
        g.writeNumberField(sp.stock().coil() ? "coils" : "bars", p.bars());
        g.writeNumberField("pieces_cut", p.piecesCut());
        JsonNumbers.field(g, "bought_m", p.boughtLengthM());
        JsonNumbers.field(g, "used_m", p.usedLengthM());
        JsonNumbers.field(g, "mass_bought_kg", sp.massBoughtKg());
        JsonNumbers.field(g, "mass_used_kg", sp.massUsedKg());
        JsonNumbers.field(g, "waste_share", p.wasteShare());
        JsonNumbers.field(g, "reusable_offcut_m", p.reusableOffcutM());
        JsonNumbers.field(g, "lower_bound_m", p.lowerBoundM());
        JsonNumbers.field(g, "gap", p.gap());
        g.writeBooleanField("relaxation_solved", p.boundProven());
        g.writeStringField("method", p.method());
        g.writeArrayFieldStart("notes");
        for (String n : p.notes()) {
            g.writeString(n);
        }
        g.writeEndArray();
        g.writeArrayFieldStart("patterns");
        for (CutPattern c : p.patterns()) {
            g.writeStartObject();
            JsonNumbers.field(g, "stock_m", c.stockLengthM());
            g.writeNumberField("bars", c.bars());
            g.writeArrayFieldStart("pieces");
            for (PatternPiece x : c.pieces()) {
                g.writeStartObject();
                g.writeStringField("mark", x.mark());
                JsonNumbers.field(g, "length_m", x.lengthM());
                g.writeNumberField("count", x.count());
                g.writeEndObject();
            }
            g.writeEndArray();
            JsonNumbers.field(g, "offcut_m", c.offcutM());
            g.writeBooleanField("offcut_reusable", c.offcutReusable());
            g.writeEndObject();
        }
        g.writeEndArray();
        g.writeArrayFieldStart("uncut");
        for (Demand d : p.uncut()) {
            g.writeStartObject();
            g.writeStringField("mark", d.mark());
            JsonNumbers.field(g, "length_m", d.lengthM());
            g.writeNumberField("quantity", d.quantity());
            g.writeEndObject();
        }
        g.writeEndArray();
        g.writeEndObject();
    }
}
