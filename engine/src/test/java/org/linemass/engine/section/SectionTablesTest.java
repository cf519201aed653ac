package org.linemass.engine.section;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.StringReader;
import java.util.List;
import org.linemass.engine.error.AnalysisException;
import org.junit.jupiter.api.Test;

class SectionTablesTest {

    /** Published tables print 3 decimals: compare at one unit in the last digit (FACTS.md §0 advice). */
    private static final double TABLE = 0.001;
    /** Formula-based values: relative 1e-9 (FACTS.md §0 advice). */
    private static final double FORMULA = 1e-9;

    private static Section builtIn(String id) {
        return BuiltInSections.table().find(id).orElseThrow();
    }

    @Test
    void enBar12_sixMetres_weighsTableMass() {
        // FACTS.md §1.1: BS 4449:1997 Table 1, 12 mm -> 0.888 kg/m; 6.000 m -> 5.328 kg
        assertEquals(5.328, builtIn("RB12").kgPerM() * 6.0, 1e-12);
        // FACTS.md §1.1 row values
        assertEquals(0.222, builtIn("RB6").kgPerM(), TABLE);
        assertEquals(6.313, builtIn("RB32").kgPerM(), TABLE);
        assertEquals(15.413, builtIn("RB50").kgPerM(), TABLE);
        // EN 1992-1-1 Table 8.1N (FACTS.md §6.1): mandrel 4 phi (<= 16) -> radius 2 phi; 7 phi -> 3.5 phi
        assertEquals(0.024, builtIn("RB12").minBendRadiusM(), 1e-15);
        assertEquals(0.070, builtIn("RB20").minBendRadiusM(), 1e-15);
    }

    @Test
    void astm4_sixMetres_weighsTableMass() {
        // FACTS.md §1.2: A615 #4 0.668 lb/ft; 6 m = 6/0.3048 ft; 1 lb = 0.45359237 kg (FACTS.md §0.1)
        assertEquals(6 / 0.3048 * 0.668 * 0.45359237, builtIn("A615-4").kgPerM() * 6, 1e-12);
        // A615M kg/m column (FACTS.md §1.2): #4 0.994, #5 1.552, #11 7.907, #18 20.24
        assertEquals(0.994, builtIn("A615-4").kgPerM(), TABLE);
        assertEquals(1.552, builtIn("A615-5").kgPerM(), TABLE);
        assertEquals(7.907, builtIn("A615-11").kgPerM(), TABLE);
        assertEquals(20.24, builtIn("A615-18").kgPerM(), 0.01);
        // ACI 318-19 Table 25.3.1 (FACTS.md §6.1): #8 inside diameter 6 d_b -> radius 3 d_b; #18 10 d_b
        assertEquals(3 * 0.0254, builtIn("A615-8").minBendRadiusM(), 1e-15);
        assertEquals(5 * 2.257 * 0.0254, builtIn("A615-18").minBendRadiusM(), 1e-15);
    }

    @Test
    void awgWire_matchesB258Formula() {
        // FACTS.md §3.1 table (formula, copper 8890): AWG 10 -> 2.5882 mm, 46.772 g/m; 0000 -> 953.180 g/m;
        // AWG 22 -> 2.894 g/m; diameters compared at +-0.002 mm (FACTS.md §9 #14)
        assertEquals(2.5882, builtIn("AWG10-CU").diameterM() * 1000, 0.002);
        assertEquals(0.046772, builtIn("AWG10-CU").kgPerM(), 1e-6);
        assertEquals(0.953180, builtIn("AWG0000-CU").kgPerM(), 1e-6);
        assertEquals(0.002894, builtIn("AWG22-CU").kgPerM(), 1e-6);
        assertEquals(11.6840, BuiltInSections.awgDiameterMm("0000"), 1e-4);
        // aluminium 1350 at 2705 kg/m3 (FACTS.md §2): AWG 10 area 5.2612 mm2 -> 14.2316 g/m
        assertEquals(2705 * 5.2612e-6, builtIn("AWG10-AL").kgPerM(), 1e-6);
    }

    @Test
    void steelWire_matchesFactsGramsPerMetre() {
        // FACTS.md §3.2: steel 7850, 2.0 mm -> 24.662 g/m, 10.0 mm -> 616.538 g/m
        assertEquals(0.024662, builtIn("SW2.0").kgPerM(), 1e-6);
        assertEquals(0.616538, builtIn("SW10.0").kgPerM(), 1e-6);
    }

    @Test
    void everyBuiltInRow_hasSource() {
        List<Section> rows = BuiltInSections.rows();
        assertTrue(rows.size() > 100);
        for (Section s : rows) {
            assertFalse(s.source().isBlank(), s.id());
        }
        for (Material m : Materials.all()) {
            assertFalse(m.source().isBlank(), m.id());
        }
    }

    @Test
    void parametric_tubeMatchesPipeFormula() {
        // FACTS.md §4: NPS 2 Sch 40, 60.3 x 3.91 mm, 0.0246615 (D - t) t = 5.4375 kg/m (published 5.44)
        Section tube = ParametricSection.parse("tube:60.3x3.91:steel").orElseThrow();
        assertEquals(7850 * Math.PI * (60.3 - 3.91) * 3.91 * 1e-6, tube.kgPerM(), FORMULA * tube.kgPerM());
        assertEquals(5.44, tube.kgPerM(), 0.01);
        assertEquals(0.0603, tube.diameterM(), 1e-15);
        // round, square, rect, flat and a density given as a number
        assertEquals(7850 * Math.PI * 144 / 4 * 1e-6, ParametricSection.parse("round:12:steel").orElseThrow().kgPerM(),
                1e-15);
        assertEquals(2700 * 100e-6, ParametricSection.parse("square:10:aluminium-6061").orElseThrow().kgPerM(), 1e-15);
        assertEquals(7850 * 400e-6, ParametricSection.parse("rect:40x10:steel").orElseThrow().kgPerM(), 1e-15);
        assertEquals(7900 * 200e-6, ParametricSection.parse("flat:40x5:stainless-304").orElseThrow().kgPerM(), 1e-15);
        assertEquals(8500 * 100e-6, ParametricSection.parse("square:10:8500").orElseThrow().kgPerM(), 1e-15);
        assertNull(ParametricSection.parse("square:10:steel").orElseThrow().diameterM());
        assertTrue(ParametricSection.parse("RB12").isEmpty());
        assertThrows(IllegalArgumentException.class, () -> ParametricSection.parse("tube:20x11:steel"));
        assertThrows(IllegalArgumentException.class, () -> ParametricSection.parse("round:12:unobtainium"));
        assertThrows(IllegalArgumentException.class, () -> ParametricSection.parse("oval:12:steel"));
        assertThrows(IllegalArgumentException.class, () -> ParametricSection.parse("round:-2:steel"));
    }

    @Test
    void userTable_readsMassAndShapeRows() throws AnalysisException {
        String csv = "# shop table\nsection,mass_kg_per_m,shape,d_mm,od_mm,wall_mm,w_mm,h_mm,density_kg_m3,min_bend_radius_mm,"
                + "description,source\n"
                + "TRELLIS-WIRE,0.05,,,,,,,,6,garden wire,supplier sheet\n"
                + "RAIL,,tube,,42.4,2.6,,,7850,,,\n"
                + "\"BAR,FLAT\",,flat,,,,30,6,7850,,,\n";
        SectionTable t = SectionCsvReader.read(new StringReader(csv), "shop.csv");
        assertEquals(0.05, t.find("trellis-wire").orElseThrow().kgPerM(), 0);
        assertEquals(0.006, t.find("TRELLIS-WIRE").orElseThrow().minBendRadiusM(), 1e-15);
        // FACTS.md §4: rho pi (D - t) t
        assertEquals(7850 * Math.PI * (42.4 - 2.6) * 2.6e-6, t.find("RAIL").orElseThrow().kgPerM(), 1e-12);
        assertEquals(7850 * 180e-6, t.find("BAR,FLAT").orElseThrow().kgPerM(), 1e-12);
        assertTrue(t.find("RAIL").orElseThrow().source().contains("shop.csv line 4"));
    }

    @Test
    void userTable_badRowsNameFileAndLine() {
        String header = "section,mass_kg_per_m,shape,d_mm,density_kg_m3\n";
        assertMessage("t.csv: line 2: column mass_kg_per_m must be positive", header + "A,-1,,,\n");
        assertMessage("t.csv: line 3: column mass_kg_per_m is not a number", header + "A,1,,,\nB,abc,,,\n");
        assertMessage("t.csv: line 3: section a already defined on line 2", header + "A,1,,,\na,2,,,\n");
        assertMessage("t.csv: line 2: column density_kg_m3 must be positive", header + "A,,round,5,0\n");
        assertMessage("t.csv: line 2: a shape row needs density_kg_m3", header + "A,,round,5,\n");
        assertMessage("t.csv: line 1: the header has no 'section' column", "name,mass_kg_per_m\nA,1\n");
        assertMessage("t.csv: line 2: column section is empty", header + ",1,,,\n");
    }

    private static void assertMessage(String start, String csv) {
        AnalysisException e = assertThrows(AnalysisException.class,
                () -> SectionCsvReader.read(new StringReader(csv), "t.csv"));
        assertTrue(e.getMessage().startsWith(start), e.getMessage());
    }

    @Test
    void assignments_lastMatchingRuleWins() throws AnalysisException {
        List<LayerAssignment> rules = AssignmentReader.read(new StringReader(
                "layer,section\nBAR*,RB12\nbar-16,RB16\n"), "assign.csv");
        List<LayerAssignment> all = new java.util.ArrayList<>(rules);
        all.add(AssignmentReader.parseArgument("RAIL=tube:42.4x2.6:steel"));
        SectionAssigner a = new SectionAssigner(BuiltInSections.table(), all);
        a.validate();
        assertEquals("RB12", a.forLayer("BARS-MAIN").orElseThrow().id());
        assertEquals("RB16", a.forLayer("BAR-16").orElseThrow().id());
        assertEquals("tube:42.4x2.6:steel", a.forLayer("rail").orElseThrow().id());
        assertTrue(a.forLayer("OTHER").isEmpty());
        SectionAssigner bad = new SectionAssigner(BuiltInSections.table(),
                List.of(AssignmentReader.parseArgument("X=NOPE")));
        AnalysisException e = assertThrows(AnalysisException.class, bad::validate);
        assertTrue(e.getMessage().contains("argument X=NOPE") && e.getMessage().contains("unknown section NOPE"));
        assertThrows(IllegalArgumentException.class, () -> AssignmentReader.parseArgument("NOEQUALS"));
    }

    @Test
    void glob_caseInsensitiveWithLiterals() {
        assertTrue(LayerGlob.of("bar*").matches("BARS"));
        assertTrue(LayerGlob.of("A?C").matches("abc"));
        assertFalse(LayerGlob.of("A?C").matches("abbc"));
        assertTrue(LayerGlob.of("x.y[1]").matches("X.Y[1]"));
        assertFalse(LayerGlob.of("x.y").matches("xzy"));
    }
}
