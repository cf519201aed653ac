package org.linemass.importer;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Iterator;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeMap;
import java.util.TreeSet;
import java.util.stream.Stream;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.DynamicTest;
import org.junit.jupiter.api.TestFactory;
import org.linemass.drawing.Drawing;
import org.linemass.drawing.LengthUnit;
import org.linemass.geometry.Segment;

/**
 * Every drawing of {@code ../shared/external} (real drawings written by other programs, with
 * expected values from an independent reader) against its manifest.json: per manifest layer the
 * length and the length centroid, model space only, inserts expanded with layer-0 inheritance
 * ({@link TestExpander}), invisible entities and off or frozen layers left out, integrated by the
 * test's own {@link LineIntegrals}. Files without $INSUNITS (or 0) are read as millimetres, as the
 * folder's README says.
 *
 * <p>Tolerances from that README: 1e-9 relative on length and 1e-9 x {@code rg_m} (the radius of
 * gyration about the centroid) on each centroid coordinate; the reference's own error estimate
 * ({@code oracle_error_m}) is below 1e-12 relative for every layer, and the test's quadrature
 * (12-point Gauss-Legendre on 32 sub-intervals per smooth span) is far below 1e-9 for smooth spans.
 *
 * <p>The expected exit: 0 (read, no entity skipped with an error) for every file except those in
 * {@link #MALFORMED_ENTITIES} (1: read, with the malformed entities skipped as errors) and in
 * {@link #NOT_DXF} (2: refused with a one-line message).
 */
class ExternalDrawingsTest {

    /** README of ../shared/external, "Expected values": relative length tolerance. */
    private static final double REL_TOL = 1e-9;

    /**
     * Files that are truly not DXF, each with the reason, refused with a one-line message (exit 2).
     * Empty while every file of the folder is a drawing some reader opens.
     */
    static final Map<String, String> NOT_DXF = Map.of();

    /**
     * Files read with entities that are truly malformed skipped as {@code error} notes (exit 1,
     * "totals incomplete"); the independent reader leaves the same entities out (its
     * {@code counts_model_space} does not list them), so the layers still agree.
     */
    static final Map<String, String> MALFORMED_ENTITIES = Map.of(
            "cadquery__rational_spline.dxf", "SPLINE with 5 knots for 4 control points of degree 3 (needs 8)",
            "ezdxf__circle_radius_le_0.dxf", "CIRCLEs of radius 0 and -1",
            "dxf2gcode__qcad_test_Elements_zero.dxf", "ARCs of radius 0");

    /** Classes of the issue not yet fixed: these files are expected to fail until they are. */
    static final Map<String, String> KNOWN_FAILURES = new TreeMap<>(Map.of(
));

    static Path external() {
        return SharedFiles.repo().resolve("..").resolve("shared").resolve("external").normalize();
    }

    @TestFactory
    Stream<DynamicTest> externalDrawingsMatchManifest() throws IOException {
        Path dir = external();
        Assumptions.assumeTrue(Files.isRegularFile(dir.resolve("manifest.json")),
                "../shared/external not present beside the checkout; external drawing checks skipped");
        JsonNode files = new ObjectMapper().readTree(dir.resolve("manifest.json").toFile()).get("files");
        List<DynamicTest> tests = new ArrayList<>();
        for (Iterator<Map.Entry<String, JsonNode>> it = files.fields(); it.hasNext();) {
            Map.Entry<String, JsonNode> e = it.next();
            String name = e.getKey();
            tests.add(DynamicTest.dynamicTest(name, () -> {
                if (KNOWN_FAILURES.containsKey(name)) {
                    AssertionError failure = null;
                    try {
                        check(dir.resolve(name), e.getValue());
                    } catch (AssertionError a) {
                        failure = a;
                    }
                    assertTrue(failure != null, "listed as a known failure (" + KNOWN_FAILURES.get(name)
                            + ") but now passes: take it off the list");
                    Assumptions.abort("known failure: " + KNOWN_FAILURES.get(name) + ": " + failure.getMessage());
                }
                check(dir.resolve(name), e.getValue());
            }));
        }
        return tests.stream();
    }

    /** The options the README prescribes: millimetres when the header gives no unit. */
    static ImportOptions optionsFor(JsonNode expected) {
        JsonNode ins = expected.get("insunits");
        boolean assumed = ins == null || ins.isNull() || ins.asInt() == 0;
        return assumed ? ImportOptions.DEFAULTS.withUnit(LengthUnit.MILLIMETRE) : ImportOptions.DEFAULTS;
    }

    private static void check(Path file, JsonNode expected) throws IOException {
        String name = file.getFileName().toString();
        Drawing d;
        try {
            d = DxfImporter.read(file, optionsFor(expected));
        } catch (DxfInputException e) {
            assertTrue(NOT_DXF.containsKey(name), () -> "refused: " + e.getMessage());
            assertTrue(e.getMessage().indexOf('\n') < 0, "one-line message");
            return;
        }
        if (NOT_DXF.containsKey(name)) {
            fail("expected a refusal (" + NOT_DXF.get(name) + "), but the file was read");
        }
        boolean skipped = d.notes().stream().anyMatch(n -> n.severity().equals("error"));
        if (MALFORMED_ENTITIES.containsKey(name)) {
            assertTrue(skipped, () -> "expected malformed entities skipped with an error (exit 1): "
                    + MALFORMED_ENTITIES.get(name));
        } else {
            assertTrue(!skipped, () -> "entities skipped (exit 1 where 0 is expected): " + d.notes());
        }
        double scale = d.unit().metres();
        Map<String, List<Segment>> byLayer = visibleByLayer(d);
        JsonNode layers = expected.get("layers");
        Set<String> missing = new TreeSet<>();
        layers.fieldNames().forEachRemaining(l -> {
            if (!byLayer.containsKey(l)) {
                missing.add(l);
            }
        });
        assertTrue(missing.isEmpty(), () -> "manifest layers with no wire here: " + missing + "; layers read: "
                + byLayer.keySet());
        List<String> wrong = new ArrayList<>();
        for (Iterator<Map.Entry<String, JsonNode>> it = layers.fields(); it.hasNext();) {
            Map.Entry<String, JsonNode> e = it.next();
            JsonNode ex = e.getValue();
            LineIntegrals li = LineIntegrals.of(byLayer.get(e.getKey()));
            double len = ex.get("length_m").asDouble();
            double got = li.length * scale;
            if (!(Math.abs(got - len) <= REL_TOL * len)) {
                wrong.add("'" + e.getKey() + "' length " + got + " m, expected " + len);
                continue;
            }
            double rg = ex.get("rg_m").asDouble();
            double[] g = li.centroid.toArray();
            for (int a = 0; a < 3; a++) {
                double want = ex.get("centroid_m").get(a).asDouble();
                if (!(Math.abs(g[a] * scale - want) <= REL_TOL * rg)) {
                    wrong.add("'" + e.getKey() + "' centroid " + a + " " + g[a] * scale + " m, expected " + want);
                }
            }
        }
        assertEquals(List.of(), wrong, "layers that disagree with the manifest");
    }

    /** Expanded world segments per effective layer, leaving out off and frozen layers. */
    static Map<String, List<Segment>> visibleByLayer(Drawing d) {
        Map<String, List<Segment>> byLayer = new TreeMap<>();
        for (TestExpander.Placed p : TestExpander.expand(d)) {
            if (d.layer(p.layer()).visible()) {
                byLayer.computeIfAbsent(p.layer(), k -> new ArrayList<>()).add(p.segment());
            }
        }
        return byLayer;
    }
}
