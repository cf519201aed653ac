package org.linemass.app;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.linemass.engine.bender.BenderProgram;
import org.linemass.engine.bender.BenderReplay;
import org.linemass.engine.bender.BenderStep;
import org.linemass.geometry.Vec3;

/**
 * {@code check --schedule-csv --bender-csv} on corpus drawings (../shared/corpus). The schedule of
 * v07 with its bar layers assigned to 8 and 16 mm bar: the main bars are shape 00 at their drawn
 * length (1875 and 1500 mm in the corpus drawing's bar block), the cut length is rounded up to 25 mm.
 * The bender CSV of v03 and v07 is read back and every exact piece rebuilt from the printed numbers
 * ({@link BenderReplay}); the end point must land on the piece's end from the pieces CSV. The CSV
 * prints lengths to 0.001 mm and angles to 0.0001 degree, so over a few metres and a few bends the
 * rebuilt end may be off by about 1 mm x 1e-4 rad x length: 0.5 mm is the bound here.
 */
class BendingScheduleTest {

    private static List<String[]> csv(Path p) throws Exception {
        List<String[]> rows = new ArrayList<>();
        for (String line : Files.readAllLines(p, StandardCharsets.UTF_8)) {
            rows.add(line.replace("\uFEFF", "").split(",", -1));
        }
        return rows;
    }

    private static Path drawing(String name) {
        Path dir = CorpusJsonTest.corpus();
        assumeTrue(dir != null && Files.exists(dir.resolve(name)), "../shared/corpus not present; skipped");
        return dir.resolve(name);
    }

    @Test
    void v07Schedule_listsTheMainBarsAsShape00(@TempDir Path tmp) throws Exception {
        Path sched = tmp.resolve("s.csv");
        AppFixtures.Run run = AppFixtures.run(new EnginePipeline(), "check", "-q",
                drawing("v07_rebar_cage_blocks_r2000_mm.dxf").toString(), "-a", "REBAR_MAIN_D16=RB16", "-a",
                "REBAR_STIRRUP_D8=RB8", "--schedule-csv=" + sched);
        assertTrue(run.code() == 0 || run.code() == 1, run.err());
        List<String[]> rows = csv(sched);
        assertEquals("member", rows.get(0)[0]);
        int main = 0;
        for (String[] r : rows) {
            if (r[0].equals("REBAR_MAIN_D16")) {
                main++;
                assertEquals("00", r[5]);
                assertEquals(r[6], r[12], "A is the exact length of a straight");
                int cut = Integer.parseInt(r[4]);
                assertEquals(0, cut % 25, "cut length rounded to 25 mm");
                assertTrue(cut >= Integer.parseInt(r[12]));
            }
        }
        assertEquals(2, main);
    }

    /**
     * v07 with its stirrup and hook layers joined: the stirrups of the plain, rotated, scaled and
     * mirrored cage bays (2 + 7 marks' worth in the drawing's STIRRUP layer, the corpus manifest's
     * contents) open where their 135 degree hooks leave, and schedule as shape 52 (a link with two 135
     * degree hooks); without the option no stirrup is 52.
     */
    @Test
    void v07JoinedHooks_stirrupsBecomeShape52(@TempDir Path tmp) throws Exception {
        Path apart = tmp.resolve("apart.csv");
        Path joined = tmp.resolve("joined.csv");
        String v07 = drawing("v07_rebar_cage_blocks_r2000_mm.dxf").toString();
        AppFixtures.Run run = AppFixtures.run(new EnginePipeline(), "check", "-q", v07, "-a", "REBAR_*_D8=RB8",
                "--schedule-csv=" + apart);
        assertTrue(run.code() == 0 || run.code() == 1, run.err());
        run = AppFixtures.run(new EnginePipeline(), "check", "-q", v07, "-a", "REBAR_*_D8=RB8",
                "--join-layers", "REBAR_STIRRUP_D8+REBAR_HOOK_D8=REBAR_STIRRUP_D8", "--schedule-csv=" + joined);
        assertTrue(run.code() == 0 || run.code() == 1, run.err());
        int before = 0;
        for (String[] r : csv(apart)) {
            if (r[0].equals("REBAR_STIRRUP_D8") && r[5].equals("52")) {
                before++;
            }
        }
        assertEquals(0, before);
        int bars = 0;
        for (String[] r : csv(joined)) {
            if (r[0].equals("REBAR_STIRRUP_D8") && r[5].equals("52")) {
                bars += Integer.parseInt(r[3]);
            }
        }
        // the bays under a non-uniform scale have hooks no longer at 135 degrees: they stay 99
        assertEquals(9, bars, "stirrups scheduled as shape 52");
    }

    @Test
    void benderCsv_rebuildsEveryExactPiece(@TempDir Path tmp) throws Exception {
        for (String name : List.of("v03_tubular_handrail_lwpoly_r2018_mm.dxf", "v07_rebar_cage_blocks_r2000_mm.dxf")) {
            Path bender = tmp.resolve("b.csv");
            Path pieces = tmp.resolve("p.csv");
            AppFixtures.Run run = AppFixtures.run(new EnginePipeline(), "check", "-q", drawing(name).toString(),
                    "--bender-csv=" + bender, "--pieces-csv=" + pieces);
            assertTrue(run.code() == 0 || run.code() == 1, run.err());
            Map<String, Vec3> ends = new HashMap<>();
            List<String[]> pr = csv(pieces);
            List<String> header = List.of(pr.get(0));
            int ex = header.indexOf("end x [m]");
            for (String[] r : pr.subList(1, pr.size())) {
                ends.put(r[0], new Vec3(Double.parseDouble(r[ex]), Double.parseDouble(r[ex + 1]),
                        Double.parseDouble(r[ex + 2])));
            }
            int rebuilt = 0;
            Map<String, List<String[]>> byPiece = new HashMap<>();
            for (String[] r : csv(bender).subList(1, csv(bender).size())) {
                byPiece.computeIfAbsent(r[0], k -> new ArrayList<>()).add(r);
            }
            for (Map.Entry<String, List<String[]>> e : byPiece.entrySet()) {
                Vec3 start = null;
                Vec3 dir = null;
                Vec3 normal = null;
                List<BenderStep> steps = new ArrayList<>();
                double last = 0;
                boolean exact = true;
                for (String[] r : e.getValue()) {
                    switch (r[2]) {
                        case "start" -> start = point(r, 1e-3);
                        case "direction" -> dir = point(r, 1);
                        case "plane" -> normal = point(r, 1);
                        case "bend", "coil" -> {
                            exact &= r[2].equals("bend") && r[13].equals("yes");
                            steps.add(new BenderStep(BenderStep.Kind.BEND, mm(r[3]), Double.parseDouble(r[4]),
                                    Double.parseDouble(r[5]), mm(r[6]), mm(r[7]), 0, 0, true));
                        }
                        case "end" -> last = mm(r[3]);
                        default -> { }
                    }
                }
                if (!exact) {
                    continue;
                }
                BenderProgram prog = new BenderProgram(start, dir, normal, steps, last, List.of());
                Vec3 end = BenderReplay.replay(prog).orElseThrow().endM();
                Vec3 want = ends.get(e.getKey());
                // pieces CSV prints metres to 0.001 m: compare within that print step plus the bound above
                assertTrue(end.distance(want) <= 1e-3 + 5e-4, name + " piece " + e.getKey() + ": " + end + " vs " + want);
                rebuilt++;
            }
            assertTrue(rebuilt > 5, name + ": pieces rebuilt " + rebuilt);
        }
    }

    private static Vec3 point(String[] r, double scale) {
        return new Vec3(Double.parseDouble(r[10]) * scale, Double.parseDouble(r[11]) * scale,
                Double.parseDouble(r[12]) * scale);
    }

    private static double mm(String s) {
        return s.isEmpty() ? 0 : Double.parseDouble(s) / 1000;
    }
}
