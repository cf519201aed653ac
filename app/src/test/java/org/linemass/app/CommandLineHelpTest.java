package org.linemass.app;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The command line for a first-time user: bare {@code linemass}, mistyped commands and options,
 * the materials listing, near matches for an unknown material, {@code --density} and a marked-up
 * copy asked into one file for several drawings.
 */
class CommandLineHelpTest {

    private static final ObjectMapper MAPPER = new ObjectMapper();

    private record Run(int code, String out, String err) {
    }

    private static Run run(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        AppContext sys = AppContext.system();
        AppContext ctx = new AppContext(new PrintWriter(out), new PrintWriter(err), sys.pipeline(), sys.sections(),
                sys.integrator(), false);
        int code = Cli.run(ctx, args);
        return new Run(code, out.toString(), err.toString());
    }

    @Test
    void bare_printsUsageAndFails() {
        Run r = run();
        assertEquals(ExitCodes.BAD_INPUT, r.code());
        assertTrue(r.err().contains("Usage: linemass"), r.err());
        assertTrue(r.err().contains("check") && r.err().contains("materials"), r.err());
    }

    @Test
    void mistypedCommand_suggestsTheNearOne() {
        Run r = run("chek", "a.dxf");
        assertEquals(ExitCodes.BAD_INPUT, r.code());
        assertTrue(r.err().contains("did you mean check?"), r.err());
    }

    @Test
    void mistypedOption_suggestsTheNearOne() {
        Run r = run("check", "--jsn", "out.json", "a.dxf");
        assertEquals(ExitCodes.BAD_INPUT, r.code());
        assertTrue(r.err().contains("did you mean --json"), r.err());
    }

    @Test
    void materials_listsEveryBuiltInMaterialWithItsSource() {
        Run r = run("materials");
        assertEquals(ExitCodes.OK, r.code(), r.err());
        // 7850 kg/m3 for steel: EN 1993-1-1 3.2.6 (FACTS.md section 2)
        assertTrue(r.out().lines().anyMatch(l -> l.startsWith("steel") && l.contains("7850") && l.contains("EN 1993")),
                r.out());
    }

    @Test
    void sections_sourceColumnShowsSourcesNotTablePointers() {
        Run r = run("sections");
        assertEquals(ExitCodes.OK, r.code(), r.err());
        assertFalse(r.out().contains("materials.csv"), "internal table name in the listing");
        // copper 8890 kg/m3 is the AWG rows' density (materials table, FACTS.md section 2)
        assertTrue(r.out().lines().anyMatch(l -> l.startsWith("AWG12-CU") && l.contains("8890 kg/m3 for copper")),
                r.out());
    }

    @Test
    void unknownMaterial_namesTheNearOnes(@TempDir Path dir) throws Exception {
        Path dxf = bar(dir);
        Run r = run("check", "-a", "BAR=round:12:stel", dxf.toString());
        assertEquals(ExitCodes.BAD_INPUT, r.code());
        assertTrue(r.err().contains("unknown material 'stel'; near: steel"), r.err());
        assertTrue(r.err().contains("linemass materials"), r.err());
    }

    @Test
    void density_taperedBar_massAndCentroidAreTheClosedForm(@TempDir Path dir) throws Exception {
        Path dxf = bar(dir);
        // a 1 m bar along x whose density grows linearly, lambda = 1 + x kg/m:
        // m = integral_0^1 (1 + x) dx = 1.5 kg; x_g = integral_0^1 x (1 + x) dx / m = (1/2 + 1/3) / 1.5 = 5/9 m
        Run r = run("check", "--json", "-", "-a", "BAR=round:12:steel", "--density", "BAR=1+x", dxf.toString());
        assertEquals(ExitCodes.OK, r.code(), r.err());
        JsonNode t = MAPPER.readTree(r.out()).get("totals");
        // a linear density on a straight is integrated by Gauss-Kronrod exactly up to rounding: 1e-12 relative
        assertEquals(1.5, t.get("mass_kg").asDouble(), 1.5e-12);
        assertEquals(5.0 / 9.0, t.get("centroid_m").get(0).asDouble(), 1e-12);
    }

    @Test
    void density_withoutEquals_isAUsageProblem(@TempDir Path dir) throws Exception {
        Run r = run("check", "--density", "1+x", bar(dir).toString());
        assertEquals(ExitCodes.BAD_INPUT, r.code());
        assertTrue(r.err().contains("--density '1+x': expected LAYER=EXPR"), r.err());
    }

    @Test
    void markupIntoOneFile_forSeveralDrawings_isRefused(@TempDir Path dir) throws Exception {
        Path a = bar(dir);
        Path b = Files.copy(a, dir.resolve("b.dxf"));
        Run r = run("check", "--markup-dxf", dir.resolve("one.dxf").toString(), a.toString(), b.toString());
        assertEquals(ExitCodes.BAD_INPUT, r.code());
        assertTrue(r.err().contains("give a folder"), r.err());
        assertFalse(Files.exists(dir.resolve("one.dxf")), "nothing is written");
    }

    @Test
    void onlyLayerMatchingNothing_isRefusedNamingTheLayers(@TempDir Path dir) throws Exception {
        Run r = run("check", "--only-layer", "RAIL*", bar(dir).toString());
        assertEquals(ExitCodes.BAD_INPUT, r.code());
        assertTrue(r.err().contains("nothing is left to weigh after --only-layer 'RAIL*'"), r.err());
        assertTrue(r.err().contains("'BAR'"), r.err());
    }

    @Test
    void assignmentMatchingNothing_isAWarningNamingTheRuleAndTheLayers(@TempDir Path dir) throws Exception {
        Run r = run("check", "--json", "-", "-a", "BAR=round:12:steel", "-a", "BRA*=round:8:steel",
                "--skip-layer", "NOTES", bar(dir).toString());
        assertEquals(ExitCodes.OK, r.code(), r.err());
        JsonNode findings = MAPPER.readTree(r.out()).get("findings");
        List<String> unmatched = new ArrayList<>();
        findings.forEach(f -> {
            if ("unmatched_rule".equals(f.get("kind").asText())) {
                assertEquals("warning", f.get("severity").asText());
                unmatched.add(f.get("message").asText());
            }
        });
        assertEquals(2, unmatched.size(), unmatched.toString());
        assertTrue(unmatched.stream().anyMatch(m -> m.contains("--assign BRA*=round:8:steel")
                && m.contains("its layers are 'BAR'")), unmatched.toString());
        assertTrue(unmatched.stream().anyMatch(m -> m.startsWith("--skip-layer 'NOTES' matches no layer")),
                unmatched.toString());
    }

    /** One LINE from (0,0,0) to (1000,0,0) mm on layer BAR. */
    private static Path bar(Path dir) throws Exception {
        Path dxf = dir.resolve("bar.dxf");
        Files.writeString(dxf, String.join("\n", "0", "SECTION", "2", "HEADER", "9", "$INSUNITS", "70", "4",
                "0", "ENDSEC", "0", "SECTION", "2", "ENTITIES", "0", "LINE", "5", "2A", "8", "BAR", "10", "0",
                "20", "0", "30", "0", "11", "1000", "21", "0", "31", "0", "0", "ENDSEC", "0", "EOF", ""),
                StandardCharsets.US_ASCII);
        return dxf;
    }
}
