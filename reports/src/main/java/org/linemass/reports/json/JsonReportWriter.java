package org.linemass.reports.json;

import com.fasterxml.jackson.core.JsonFactory;
import com.fasterxml.jackson.core.JsonGenerator;
import com.fasterxml.jackson.core.StreamWriteFeature;
import com.fasterxml.jackson.core.util.DefaultIndenter;
import com.fasterxml.jackson.core.util.DefaultPrettyPrinter;
import java.io.IOException;
import java.io.Writer;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.linemass.engine.result.Bend;
import org.linemass.engine.result.DrawingResult;
import org.linemass.engine.result.Finding;
import org.linemass.engine.result.LayerResult;
import org.linemass.engine.result.MarkResult;
import org.linemass.engine.result.PieceResult;
import org.linemass.engine.result.SectionUse;
import org.linemass.engine.result.SourceRef;
import org.linemass.engine.result.Totals;
import org.linemass.engine.moments.PrincipalAxes;
import org.linemass.engine.moments.Sym3;
import org.linemass.geometry.Vec3;
import org.linemass.reports.Caution;
import org.linemass.engine.result.CombinedTotals;
import org.linemass.reports.Report;

/**
 * Writes the JSON report. One drawing gives one drawing document; several give
 * {@code {"drawings": [document...], "totals": {...}, "complete": ..., "incomplete_reasons": [...],
 * "caution": "..."}} with the combined totals of {@link CombinedTotals}. Keys come in a fixed order;
 * numbers are written as the shortest text that reads back to the same double; NaN and infinities
 * (never expected) are written as null. Lines end with "\n".
 */
public final class JsonReportWriter {

    /** Classpath location of the JSON Schema (draft 2020-12) the output follows. */
    public static final String SCHEMA_RESOURCE = "/org/linemass/reports/linemass-report.schema.json";

    private static final JsonFactory FACTORY = JsonFactory.builder()
            .enable(StreamWriteFeature.USE_FAST_DOUBLE_WRITER)
            .disable(StreamWriteFeature.AUTO_CLOSE_TARGET)
            // a report cut short by a failure must not be closed into valid-looking JSON
            .disable(StreamWriteFeature.AUTO_CLOSE_CONTENT)
            .build();

    private JsonReportWriter() {
    }

    /** Writes the report of {@code reports} (one or more drawings) to {@code out}, which stays open. */
    public static void write(List<Report> reports, Writer out) throws IOException {
        write(reports, List.of(), out);
    }

    /** Writes the report with the job-level {@code parts} (cutting plan, costs) in it. */
    public static void write(List<Report> reports, List<JsonPart> parts, Writer out) throws IOException {
        if (reports.isEmpty()) {
            throw new IllegalArgumentException("no drawing to report");
        }
        DefaultIndenter lf = new DefaultIndenter("  ", "\n");
        try (JsonGenerator g = FACTORY.createGenerator(out)) {
            g.setPrettyPrinter(new DefaultPrettyPrinter().withObjectIndenter(lf));
            if (reports.size() == 1) {
                drawingDocument(g, reports.get(0).result(), parts);
            } else {
                multiDocument(g, reports, parts);
            }
            g.writeRaw('\n');
        }
    }

    private static void multiDocument(JsonGenerator g, List<Report> reports, List<JsonPart> parts)
            throws IOException {
        List<Totals> totals = new ArrayList<>();
        List<String> reasons = new ArrayList<>();
        for (Report r : reports) {
            totals.add(r.result().totals());
            for (String reason : r.result().incompleteReasons()) {
                reasons.add(r.result().drawing().file() + ": " + reason);
            }
        }
        g.writeStartObject();
        g.writeArrayFieldStart("drawings");
        for (Report r : reports) {
            drawingDocument(g, r.result(), List.of());
        }
        g.writeEndArray();
        g.writeFieldName("totals");
        totals(g, CombinedTotals.of(totals));
        parts(g, parts);
        g.writeBooleanField("complete", reasons.isEmpty());
        strings(g, "incomplete_reasons", reasons);
        g.writeStringField("caution", Caution.TEXT);
        g.writeEndObject();
    }

    private static void parts(JsonGenerator g, List<JsonPart> parts) throws IOException {
        for (JsonPart p : parts) {
            g.writeFieldName(p.key());
            p.write(g);
        }
    }

    private static void drawingDocument(JsonGenerator g, DrawingResult r, List<JsonPart> parts) throws IOException {
        g.writeStartObject();
        g.writeObjectFieldStart("drawing");
        g.writeStringField("file", r.drawing().file());
        g.writeStringField("dxf_version", r.drawing().dxfVersion());
        g.writeStringField("units", r.drawing().unit().symbol());
        g.writeStringField("unit_source", r.drawing().unitSource().jsonName());
        g.writeEndObject();

        g.writeObjectFieldStart("entities");
        counts(g, "curves", r.entities().curves());
        counts(g, "no_geometry", r.entities().noGeometry());
        g.writeNumberField("paper_space", r.entities().paperSpace());
        g.writeEndObject();

        g.writeArrayFieldStart("layers");
        for (LayerResult l : r.layers()) {
            layer(g, l);
        }
        g.writeEndArray();
        g.writeArrayFieldStart("pieces");
        for (PieceResult p : r.pieces()) {
            piece(g, p);
        }
        g.writeEndArray();
        g.writeArrayFieldStart("groups");
        for (MarkResult m : r.groups()) {
            group(g, m);
        }
        g.writeEndArray();
        g.writeArrayFieldStart("findings");
        for (Finding f : r.findings()) {
            finding(g, f);
        }
        g.writeEndArray();
        g.writeFieldName("totals");
        totals(g, r.totals());
        g.writeArrayFieldStart("sections");
        for (SectionUse s : r.sections()) {
            section(g, s);
        }
        g.writeEndArray();
        parts(g, parts);
        ScheduleJson.write(g, r);
        g.writeBooleanField("complete", r.complete());
        strings(g, "incomplete_reasons", r.incompleteReasons());
        g.writeStringField("caution", Caution.TEXT);
        g.writeEndObject();
    }

    private static void layer(JsonGenerator g, LayerResult l) throws IOException {
        g.writeStartObject();
        g.writeStringField("name", l.name());
        num(g, "length_m", l.lengthM());
        num(g, "drawn_length_m", l.drawnLengthM());
        vec(g, "length_centroid_m", l.lengthCentroidM());
        tensor(g, "length_inertia_m3", l.lengthInertiaM3());
        g.writeStringField("section", l.section());
        num(g, "mass_kg", l.massKg());
        vec(g, "centroid_m", l.centroidM());
        tensor(g, "inertia_kg_m2", l.inertiaKgM2());
        g.writeNumberField("pieces", l.pieces());
        num(g, "error_bound_m", l.errorBoundM());
        principal(g, l.massKg(), l.inertiaKgM2());
        g.writeEndObject();
    }

    private static void piece(JsonGenerator g, PieceResult p) throws IOException {
        g.writeStartObject();
        g.writeNumberField("id", p.id());
        g.writeStringField("layer", p.layer());
        num(g, "length_m", p.lengthM());
        num(g, "mass_kg", p.massKg());
        vec(g, "centroid_m", p.centroidM());
        g.writeBooleanField("closed", p.closed());
        g.writeNumberField("segments", p.segments());
        g.writeStringField("group", p.mark());
        vec(g, "start_m", p.startM());
        vec(g, "end_m", p.endM());
        g.writeArrayFieldStart("bends");
        for (Bend b : p.bends()) {
            g.writeStartObject();
            vec(g, "at_m", b.atM());
            num(g, "angle_deg", b.angleDeg());
            num(g, "inside_radius_m", b.insideRadiusM());
            num(g, "centre_radius_m", b.centreRadiusM());
            g.writeEndObject();
        }
        g.writeEndArray();
        sources(g, "sources", p.sources());
        g.writeEndObject();
    }

    private static void group(JsonGenerator g, MarkResult m) throws IOException {
        g.writeStartObject();
        g.writeStringField("mark", m.mark());
        g.writeNumberField("quantity", m.quantity());
        g.writeStringField("section", m.section());
        num(g, "length_each_m", m.lengthEachM());
        num(g, "mass_each_kg", m.massEachKg());
        num(g, "length_total_m", m.lengthTotalM());
        num(g, "mass_total_kg", m.massTotalKg());
        g.writeStringField("layer", m.layer());
        g.writeNumberField("bends_each", m.bendsEach());
        g.writeEndObject();
    }

    private static void finding(JsonGenerator g, Finding f) throws IOException {
        g.writeStartObject();
        g.writeStringField("kind", f.kind());
        g.writeStringField("severity", f.severity().jsonName());
        vec(g, "at_m", f.atM());
        num(g, "size_m", f.sizeM());
        g.writeStringField("layer", f.layer());
        sources(g, "entities", f.entities());
        num(g, "mass_kg", f.massKg());
        g.writeStringField("message", f.message());
        g.writeEndObject();
    }

    private static void totals(JsonGenerator g, Totals t) throws IOException {
        g.writeStartObject();
        num(g, "length_m", t.lengthM());
        num(g, "drawn_length_m", t.drawnLengthM());
        num(g, "mass_kg", t.massKg());
        vec(g, "centroid_m", t.centroidM());
        tensor(g, "inertia_kg_m2", t.inertiaKgM2());
        vec(g, "length_centroid_m", t.lengthCentroidM());
        g.writeBooleanField("mass_complete", t.massComplete());
        num(g, "error_bound_m", t.errorBoundM());
        principal(g, t.massKg(), t.inertiaKgM2());
        g.writeEndObject();
    }

    /**
     * Principal moments of inertia (ascending), their unit axes (one per moment, right-handed) and
     * the radii of gyration {@code sqrt(I_k / m)}; all null when the mass is not known or the inertia is not finite.
     */
    private static void principal(JsonGenerator g, Double massKg, Sym3 inertia) throws IOException {
        java.util.Optional<PrincipalAxes> axes = massKg == null || !(massKg > 0) || inertia == null
                ? java.util.Optional.empty() : PrincipalAxes.tryOf(inertia);
        if (axes.isEmpty()) {
            // no mass, or an inertia out of range (non-finite entries): no principal axes to give
            g.writeNullField("principal_moments_kg_m2");
            g.writeNullField("principal_axes");
            g.writeNullField("radii_of_gyration_m");
            return;
        }
        PrincipalAxes p = axes.get();
        g.writeArrayFieldStart("principal_moments_kg_m2");
        for (double m : p.moments()) {
            number(g, m);
        }
        g.writeEndArray();
        g.writeArrayFieldStart("principal_axes");
        for (Vec3 a : p.axes()) {
            g.writeStartArray();
            number(g, a.x());
            number(g, a.y());
            number(g, a.z());
            g.writeEndArray();
        }
        g.writeEndArray();
        g.writeArrayFieldStart("radii_of_gyration_m");
        for (double r : p.radiiOfGyration(massKg)) {
            number(g, r);
        }
        g.writeEndArray();
    }

    private static void section(JsonGenerator g, SectionUse s) throws IOException {
        g.writeStartObject();
        g.writeStringField("section", s.section());
        g.writeStringField("description", s.description());
        g.writeStringField("material", s.material());
        num(g, "kg_per_m", s.kgPerM());
        num(g, "diameter_m", s.diameterM());
        g.writeStringField("source", s.source());
        g.writeEndObject();
    }

    private static void sources(JsonGenerator g, String name, List<SourceRef> refs) throws IOException {
        g.writeArrayFieldStart(name);
        for (SourceRef s : refs) {
            g.writeStartObject();
            g.writeNumberField("line", s.line());
            g.writeStringField("handle", s.handle());
            g.writeStringField("type", s.entityType());
            strings(g, "blocks", s.blockPath());
            g.writeEndObject();
        }
        g.writeEndArray();
    }

    private static void counts(JsonGenerator g, String name, Map<String, Long> counts) throws IOException {
        g.writeObjectFieldStart(name);
        for (Map.Entry<String, Long> e : counts.entrySet()) {
            g.writeNumberField(e.getKey(), e.getValue());
        }
        g.writeEndObject();
    }

    private static void strings(JsonGenerator g, String name, List<String> values) throws IOException {
        g.writeArrayFieldStart(name);
        for (String v : values) {
            g.writeString(v);
        }
        g.writeEndArray();
    }

    private static void num(JsonGenerator g, String name, Double v) throws IOException {
        g.writeFieldName(name);
        number(g, v);
    }

    private static void number(JsonGenerator g, Double v) throws IOException {
        if (v == null || !Double.isFinite(v)) {
            g.writeNull();
        } else {
            g.writeNumber(v.doubleValue());
        }
    }

    private static void vec(JsonGenerator g, String name, Vec3 v) throws IOException {
        g.writeFieldName(name);
        if (v == null) {
            g.writeNull();
            return;
        }
        g.writeStartArray();
        number(g, v.x());
        number(g, v.y());
        number(g, v.z());
        g.writeEndArray();
    }

    private static void tensor(JsonGenerator g, String name, Sym3 s) throws IOException {
        g.writeFieldName(name);
        if (s == null) {
            g.writeNull();
            return;
        }
        g.writeStartArray();
        for (double[] row : s.toMatrix()) {
            g.writeStartArray();
            for (double v : row) {
                number(g, v);
            }
            g.writeEndArray();
        }
        g.writeEndArray();
    }
}
