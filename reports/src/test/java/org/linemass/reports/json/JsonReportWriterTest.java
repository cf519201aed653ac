package org.linemass.reports.json;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.networknt.schema.JsonSchema;
import com.networknt.schema.JsonSchemaFactory;
import com.networknt.schema.SpecVersion;
import com.networknt.schema.ValidationMessage;
import java.io.IOException;
import java.io.InputStream;
import java.io.StringWriter;
import java.util.ArrayList;
import java.util.Iterator;
import java.util.List;
import java.util.Set;
import org.linemass.engine.result.DrawingResult;
import org.linemass.reports.Fixtures;
import org.linemass.reports.Report;
import org.junit.jupiter.api.Test;

class JsonReportWriterTest {

    /** The totals are sums of a handful of closed-form values; 1e-12 covers rounding. */
    private static final double TOL = 1e-12;
    private static final ObjectMapper MAPPER = new ObjectMapper();

    static JsonSchema schema() throws IOException {
        try (InputStream in = JsonReportWriter.class.getResourceAsStream(JsonReportWriter.SCHEMA_RESOURCE)) {
            return JsonSchemaFactory.getInstance(SpecVersion.VersionFlag.V202012).getSchema(in);
        }
    }

    static String json(List<Report> reports) throws IOException {
        StringWriter w = new StringWriter();
        JsonReportWriter.write(reports, w);
        return w.toString();
    }

    @Test
    void write_oneDrawing_validatesAgainstSchema() throws IOException {
        String text = json(List.of(Report.of(Fixtures.frame("a.dxf", 0.3, true))));
        Set<ValidationMessage> errors = schema().validate(MAPPER.readTree(text));
        assertTrue(errors.isEmpty(), errors.toString());
    }

    @Test
    void write_severalDrawings_validatesAndCombinesTotals() throws IOException {
        DrawingResult a = Fixtures.flatFrame("a.dxf");
        DrawingResult b = Fixtures.frame("b.dxf", 0.3, true);
        String text = json(List.of(Report.of(a), Report.of(b)));
        JsonNode root = MAPPER.readTree(text);
        Set<ValidationMessage> errors = schema().validate(root);
        assertTrue(errors.isEmpty(), errors.toString());
        assertEquals(2, root.get("drawings").size());
        assertEquals(a.totals().lengthM() + b.totals().lengthM(), root.get("totals").get("length_m").asDouble(), TOL);
        assertFalse(root.get("complete").asBoolean());
        assertTrue(root.get("incomplete_reasons").get(0).asText().startsWith("b.dxf: "));
    }

    @Test
    void schema_rejectsDocumentWithoutTotalsOrWithTextForNumber() throws IOException {
        JsonNode root = MAPPER.readTree(json(List.of(Report.of(Fixtures.flatFrame("a.dxf")))));
        ((com.fasterxml.jackson.databind.node.ObjectNode) root).remove("totals");
        assertFalse(schema().validate(root).isEmpty(), "a document without totals must not validate");
        JsonNode other = MAPPER.readTree(json(List.of(Report.of(Fixtures.flatFrame("a.dxf")))));
        ((com.fasterxml.jackson.databind.node.ObjectNode) other.get("layers").get(0)).put("length_m", "2");
        assertFalse(schema().validate(other).isEmpty(), "a length given as text must not validate");
    }

    @Test
    void write_nullsForUnknownValues() throws IOException {
        JsonNode root = MAPPER.readTree(json(List.of(Report.of(Fixtures.flatFrame("a.dxf")))));
        JsonNode ringLayer = root.get("layers").get(1);
        assertTrue(ringLayer.get("section").isNull());
        assertTrue(ringLayer.get("mass_kg").isNull());
        assertTrue(ringLayer.get("inertia_kg_m2").isNull());
        JsonNode info = root.get("findings").get(2);
        assertTrue(info.get("at_m").isNull());
        assertTrue(info.get("size_m").isNull());
    }

    @Test
    void write_keysInContractOrder() throws IOException {
        JsonNode root = MAPPER.readTree(json(List.of(Report.of(Fixtures.flatFrame("a.dxf")))));
        assertEquals(List.of("drawing", "entities", "layers", "pieces", "groups", "findings", "totals", "sections",
                "schedule", "complete", "incomplete_reasons", "caution"), names(root));
        assertEquals(List.of("name", "length_m", "drawn_length_m", "length_centroid_m", "length_inertia_m3", "section",
                "mass_kg", "centroid_m", "inertia_kg_m2", "pieces", "error_bound_m", "principal_moments_kg_m2", "principal_axes",
                "radii_of_gyration_m"), names(root.get("layers").get(0)));
        assertEquals(3, root.get("layers").get(0).get("length_inertia_m3").size());
        assertEquals(3, root.get("layers").get(0).get("length_inertia_m3").get(2).size());
    }

    @Test
    void write_numbersRoundTripShortest() throws IOException {
        // 1/12 has no short decimal form: the text must read back to the same double (shortest round trip);
        // 0.617 must come out as written, not as 0.61699999999999999
        String text = json(List.of(Report.of(Fixtures.flatFrame("a.dxf"))));
        JsonNode root = MAPPER.readTree(text);
        JsonNode j = root.get("layers").get(0).get("length_inertia_m3");
        double yy = 2.0 / 12.0 + 2 * 0.25 * 0.25 * 1.0;
        assertEquals(yy, j.get(2).get(2).asDouble(), 0.0);
        assertTrue(text.contains("\"mass_each_kg\" : 0.617"), "0.617 written as its shortest form");
        assertFalse(text.contains("\r"), "line ends are \\n");
    }

    @Test
    void write_isDeterministic() throws IOException {
        List<Report> r = List.of(Report.of(Fixtures.flatFrame("a.dxf")));
        assertEquals(json(r), json(r));
    }

    private static List<String> names(JsonNode n) {
        List<String> out = new ArrayList<>();
        for (Iterator<String> it = n.fieldNames(); it.hasNext();) {
            out.add(it.next());
        }
        return out;
    }
}
