package org.linemass.app;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * {@code linemass compare} of the demo drawing (revision A) against copies edited here, entity by
 * handle (revision B): the expected differences are worked out by hand from the edits and the
 * demo's closed forms (testdata/demo/README.md).
 */
class CompareCommandTest {

    /**
     * Masses are engine lengths (about 1e-9 relative) times the demo kg/m, which the README gives
     * to six digits (0.098646, 0.394584: about 5e-7 relative); 1e-6 kg covers that on the
     * masses of well under 1 kg compared here.
     */
    private static final double KG = 1e-6;
    /** Lengths and moves read back from CSV with the report's 0.1 mm: half of that. */
    private static final double MM = 0.05;

    private static final double D4_KG_M = 0.098646; // demo README: 7850 x pi x 0.004^2 / 4
    private static final double D8_KG_M = 0.394584; // demo README: 7850 x pi x 0.008^2 / 4
    private static final double LEG_M = 0.3011430; // demo README: one leg

    @TempDir
    Path tmp;

    @Test
    void compare_demoWithEditedCopy_handDerivedDifferences() throws Exception {
        DxfEdit b = DxfEdit.demo();
        b.set("4A", "10", "60.0");                 // clip moved 30 mm along x (from x = 90)
        b.remove("3F");                             // cross wire at x = 80 (210 mm) removed
        b.set("48", "21", "280.0");                 // cross wire at x = 500 lengthened 210 -> 260 mm
        b.set("3B", "8", "WIRES_D4");               // one leg from PLANTER-D8 to PLANTER-D4
        b.addLine("7F", "WIRES_D4", 110, 60, 490, 60); // a new 380 mm wire
        Path fileB = b.write(tmp.resolve("planter-rev-b.dxf"));
        Path changes = tmp.resolve("changes.csv");
        Path sections = tmp.resolve("sections.csv");
        AppFixtures.Run r = compare(fileB, "--changes-csv", changes.toString(), "--sections-csv", sections.toString(),
                "--html", tmp.resolve("rev.html").toString());
        assertEquals(0, r.code(), r.err());
        assertTrue(r.out().contains("unchanged  24\n  moved      1\n  changed    2\n  removed    1\n  added      1\n"),
                r.out());

        List<Map<String, String>> rows = csv(changes);
        assertEquals(5, rows.size(), rows.toString());
        Map<String, String> moved = only(rows, "moved");
        assertEquals(30.0, Double.parseDouble(moved.get("move [mm]")), MM);
        assertEquals(0, Double.parseDouble(moved.get("mass change [kg]")), KG);
        Map<String, String> removed = only(rows, "removed");
        assertEquals(210.0, Double.parseDouble(removed.get("length A [mm]")), MM);
        Map<String, String> added = only(rows, "added");
        assertEquals(380.0, Double.parseDouble(added.get("length B [mm]")), MM);
        List<Map<String, String>> changed = rows.stream().filter(x -> x.get("change").equals("changed")).toList();
        assertEquals(2, changed.size());
        Map<String, String> longer = changed.stream().filter(x -> x.get("what changed").equals("length")).findFirst()
                .orElseThrow(() -> new AssertionError(changed.toString()));
        assertEquals(260.0, Double.parseDouble(longer.get("length B [mm]")), MM);
        Map<String, String> leg = changed.stream().filter(x -> x.get("what changed").equals("section")).findFirst()
                .orElseThrow(() -> new AssertionError(changed.toString()));
        assertEquals("PLANTER-D8", leg.get("section A"));
        assertEquals("PLANTER-D4", leg.get("section B"));
        assertEquals("LEGS_D8 -> WIRES_D4", leg.get("layer"));

        // per section, from the edits: D4 loses 210 mm, gains 380 + 50 mm and a leg; D8 loses the leg
        Map<String, Map<String, String>> bySection = new HashMap<>();
        csv(sections).forEach(x -> bySection.put(x.get("section"), x));
        double d4 = (-0.210 + 0.380 + 0.050 + LEG_M) * D4_KG_M;
        double d8 = -LEG_M * D8_KG_M;
        assertEquals(d4, mass(bySection.get("PLANTER-D4")), 1e-3, "CSV mass change has the report's 3 significant digits");
        assertEquals(d8, mass(bySection.get("PLANTER-D8")), 1e-3);
        assertEquals("10", bySection.get("PLANTER-D4").get("pieces A"));
        assertEquals("11", bySection.get("PLANTER-D4").get("pieces B"));
        assertEquals("6", bySection.get("PLANTER-D8").get("pieces A"));
        assertEquals("5", bySection.get("PLANTER-D8").get("pieces B"));
        assertEquals(0, mass(bySection.get("PLANTER-D3")), KG);

        String html = Files.readString(tmp.resolve("rev.html"));
        assertTrue(html.contains("<svg class=\"revision\""), "a picture");
        assertTrue(html.contains("stroke=\"#c62828\" stroke-width=\"2.5\" stroke-dasharray=\"6 4\""), "the removed wire in red, dashed");
        assertTrue(html.contains("centroids within 1.0 mm"), "the rule and its tolerance are stated");
    }

    @Test
    void compare_removedAndSectionChanged_totalMassChange() throws Exception {
        DxfEdit b = DxfEdit.demo();
        b.remove("3F");
        b.set("3B", "8", "WIRES_D4");
        Path fileB = b.write(tmp.resolve("b.dxf"));
        Path sections = tmp.resolve("s.csv");
        AppFixtures.Run r = compare(fileB, "--sections-csv", sections.toString(), "-q");
        assertEquals(0, r.code(), r.err());
        Map<String, String> total = csv(sections).stream().filter(x -> x.get("section").equals("TOTAL")).findFirst()
                .orElseThrow();
        double expected = -0.210 * D4_KG_M + LEG_M * (D4_KG_M - D8_KG_M);
        assertEquals(expected, mass(total), 1e-3);
    }

    @Test
    void compare_reorderedReversedAndNudged_allUnchanged() throws Exception {
        DxfEdit b = DxfEdit.demo();
        b.reverseEntities();
        b.set("40", "20", "230.0");                // cross wire at x = 140 drawn the other way round
        b.set("40", "21", "20.0");
        b.set("4B", "10", "150.4");                // a clip nudged 0.4 mm: within the 1 mm place tolerance
        Path fileB = b.write(tmp.resolve("same.dxf"));
        AppFixtures.Run r = compare(fileB);
        assertEquals(0, r.code(), r.err());
        assertTrue(r.out().contains("unchanged  28\n  moved      0\n  changed    0\n  removed    0\n  added      0\n"),
                r.out());
        AppFixtures.Run tight = compare(fileB, "--match-tolerance", "0.1mm", "-q");
        assertTrue(tight.out().contains("unchanged  27\n  moved      1\n"), "0.4 mm is a move at 0.1 mm:\n" + tight.out());
    }

    @Test
    void compare_withPrices_sectionCostChangesAddUpToTotal() throws Exception {
        DxfEdit b = DxfEdit.demo();
        b.remove("3F");
        b.set("48", "21", "280.0");
        Path fileB = b.write(tmp.resolve("b.dxf"));
        Path sections = tmp.resolve("s.csv");
        AppFixtures.Run r = compare(fileB, "--sections-csv", sections.toString(), "--price-table",
                CorpusJsonTest.repo().resolve("testdata/demo/garden-planter-prices.csv").toString(), "-q");
        assertEquals(0, r.code(), r.err());
        double sum = 0;
        double total = Double.NaN;
        for (Map<String, String> x : csv(sections)) {
            double c = Double.parseDouble(x.get("cost change [EUR]"));
            if (x.get("section").equals("TOTAL")) {
                total = c;
            } else {
                sum += c;
            }
        }
        // each cell is rounded to the cent: three sections can differ from the total by 1.5 cents
        assertEquals(total, sum, 0.015);
        // invented prices: one piece less (0.10 a cut), 160 mm of 4 mm wire less at 1.20 /kg, welds per the engine
        assertTrue(total < 0, "less wire, fewer cuts: " + total);
    }

    @Test
    void compare_missingRevision_oneLineExit2() {
        AppFixtures.Run r = compare(tmp.resolve("nothing.dxf"));
        assertEquals(2, r.code());
        assertEquals(1, r.err().strip().lines().count(), r.err());
        assertTrue(r.err().contains("nothing.dxf"), r.err());
    }

    private AppFixtures.Run compare(Path b, String... extra) {
        Path demo = CorpusJsonTest.repo().resolve("testdata/demo");
        List<String> args = new ArrayList<>(List.of("compare", demo.resolve("garden-planter.dxf").toString(),
                b.toString(), "--section-table", demo.resolve("garden-planter-section-table.csv").toString(),
                "--assign-file", demo.resolve("garden-planter-layers.csv").toString()));
        args.addAll(List.of(extra));
        return AppFixtures.run(new EnginePipeline(), args.toArray(String[]::new));
    }

    private static double mass(Map<String, String> row) {
        return Double.parseDouble(row.get("mass change [kg]"));
    }

    private static Map<String, String> only(List<Map<String, String>> rows, String kind) {
        List<Map<String, String>> m = rows.stream().filter(x -> x.get("change").equals(kind)).toList();
        assertEquals(1, m.size(), kind + ": " + rows);
        return m.get(0);
    }

    /** A CSV without quoted commas (the cells compared here have none) as maps by header. */
    private static List<Map<String, String>> csv(Path file) throws Exception {
        List<String> lines = Files.readAllLines(file, StandardCharsets.UTF_8);
        String[] head = lines.get(0).replace("\uFEFF", "").split(",", -1);
        List<Map<String, String>> out = new ArrayList<>();
        for (String l : lines.subList(1, lines.size())) {
            String[] c = l.split(",", -1);
            Map<String, String> m = new HashMap<>();
            for (int i = 0; i < head.length; i++) {
                m.put(head[i], i < c.length ? c[i] : "");
            }
            out.add(m);
        }
        return out;
    }
}
