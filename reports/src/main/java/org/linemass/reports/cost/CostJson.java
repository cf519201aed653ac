package org.linemass.reports.cost;

import com.fasterxml.jackson.core.JsonGenerator;
import java.io.IOException;
import java.util.List;
import java.util.Map;
import org.linemass.plan.cost.CostLine;
import org.linemass.plan.cost.JobCost;
import org.linemass.reports.json.JsonNumbers;
import org.linemass.reports.json.JsonPart;

/**
 * The {@code costs} object of the JSON report: currency, price table, whether every line is
 * priced, the total of the priced lines per drawing and for the job, the lines, the stock lines
 * and the missing prices. A missing cost is null, never 0.
 */
public final class CostJson implements JsonPart {

    private final JobCost job;

    public CostJson(JobCost job) {
        this.job = job;
    }

    @Override
    public String key() {
        return "costs";
    }

    @Override
    public void write(JsonGenerator g) throws IOException {
        g.writeStartObject();
        g.writeStringField("currency", job.currency());
        g.writeStringField("price_table", job.priceTable());
        g.writeBooleanField("complete", job.complete());
        JsonNumbers.field(g, "total_priced", job.totalPriced());
        g.writeArrayFieldStart("drawings");
        for (String d : job.drawings()) {
            g.writeStartObject();
            g.writeStringField("file", d);
            JsonNumbers.field(g, "total_priced", job.drawingTotal(d));
            g.writeEndObject();
        }
        g.writeEndArray();
        lines(g, "lines", job.lines());
        lines(g, "stock", job.stock());
        g.writeArrayFieldStart("missing");
        for (Map.Entry<String, Integer> e : job.missing().entrySet()) {
            g.writeStartObject();
            g.writeStringField("price", e.getKey());
            g.writeNumberField("lines", e.getValue());
            g.writeEndObject();
        }
        g.writeEndArray();
        g.writeEndObject();
    }

    private static void lines(JsonGenerator g, String name, List<CostLine> lines) throws IOException {
        g.writeArrayFieldStart(name);
        for (CostLine l : lines) {
            g.writeStartObject();
            g.writeStringField("drawing", l.drawing());
            g.writeStringField("mark", l.mark());
            g.writeStringField("section", l.section());
            g.writeStringField("item", l.item());
            JsonNumbers.field(g, "quantity", l.quantity());
            g.writeStringField("unit", l.unit());
            JsonNumbers.field(g, "unit_price", l.unitPrice());
            JsonNumbers.field(g, "cost", l.cost());
            g.writeStringField("formula", l.formula());
            g.writeStringField("price_from", l.source());
            g.writeStringField("missing_price", l.missing());
            g.writeEndObject();
        }
        g.writeEndArray();
    }
}
