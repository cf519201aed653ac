package org.linemass.app;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeMap;
import java.util.TreeSet;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * {@code check B --marks-from A}: marks stay where pieces did not change. Revision B is the demo
 * edited as in {@link CompareCommandTest}; the expected bill follows from the edits by hand.
 */
class MarksFromTest {

    @TempDir
    Path tmp;

    @Test
    void check_marksFromEarlierRevision_unchangedMarksKept() throws Exception {
        DxfEdit b = DxfEdit.demo();
        b.set("4A", "10", "60.0");                 // a clip moved: still M02
        b.remove("3F");                             // one 210 mm cross wire less: M06 has 6 - 1 = 5 (one more lengthened)
        b.set("48", "21", "280.0");                 // lengthened to 260 mm: a new mark
        b.set("3B", "8", "WIRES_D4");               // a leg on the 4 mm layer: a new mark, M03 keeps 3
        b.addLine("7F", "WIRES_D4", 110, 60, 490, 60); // 380 mm: a new mark
        Path fileB = b.write(tmp.resolve("rev-b.dxf"));
        Map<String, String[]> plain = bill(fileB);
        assertNotEquals("210.0", plain.get("M06")[4], "without --marks-from the engine numbers B afresh");
        Map<String, String[]> kept = bill(fileB, "--marks-from",
                CorpusJsonTest.repo().resolve("testdata/demo/garden-planter.dxf").toString());
        // demo README bill: M01 base, M02 12 clips, M03 4 legs, M04 rim, M05 scroll, M06 7 wires, M07 2 half wires
        String[][] expected = {{"M01", "1", "1505.7"}, {"M02", "12", "38.8"}, {"M03", "3", "301.1"}, {"M04", "1", "1657.1"},
            {"M05", "1", "560.2"}, {"M06", "5", "210.0"}, {"M07", "2", "104.5"}};
        for (String[] e : expected) {
            assertEquals(e[1], kept.get(e[0])[1], e[0] + " quantity");
            assertEquals(e[2], kept.get(e[0])[4], e[0] + " length");
        }
        Set<String> fresh = new TreeSet<>();
        for (String m : List.of("M08", "M09", "M10")) {
            assertEquals("1", kept.get(m)[1], m);
            fresh.add(kept.get(m)[4]);
        }
        assertEquals(new TreeSet<>(List.of("260.0", "301.1", "380.0")), fresh, "the three new pieces get new marks");
        assertEquals(10, kept.size(), kept.keySet().toString());
    }

    private Map<String, String[]> bill(Path drawing, String... extra) throws Exception {
        Path demo = CorpusJsonTest.repo().resolve("testdata/demo");
        Path bom = tmp.resolve("bom-" + extra.length + ".csv");
        List<String> args = new ArrayList<>(List.of("check", drawing.toString(), "--fail-at", "never", "-q",
                "--section-table", demo.resolve("garden-planter-section-table.csv").toString(),
                "--assign-file", demo.resolve("garden-planter-layers.csv").toString(), "--bom-csv", bom.toString()));
        args.addAll(List.of(extra));
        AppFixtures.Run r = AppFixtures.run(new EnginePipeline(), args.toArray(String[]::new));
        assertEquals(0, r.code(), r.err());
        Map<String, String[]> out = new TreeMap<>();
        List<String> lines = Files.readAllLines(bom, StandardCharsets.UTF_8);
        for (String l : lines.subList(1, lines.size())) {
            String[] c = l.split(",", -1);
            if (c[0].matches("M\\d+")) {
                out.put(c[0], c);
            }
        }
        return out;
    }
}
