package org.linemass.app.mutate;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Random;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.linemass.importer.DxfImporter;
import org.linemass.importer.DxfInputException;
import org.linemass.importer.ImportOptions;

/** The reference of the extreme-weight kind, and each hostile-model kind on a corpus drawing. */
class HostileModelKindsTest {

    @TempDir
    Path work;

    @Test
    void referenceOfAQuarterCircle() {
        // the exact rational quadratic quarter circle, weights 1, cos 45 deg, 1 (Piegl and Tiller,
        // The NURBS Book, 2nd ed., section 7.3): radius 10, length 5 pi
        double[][] p = {{10, 0, 0}, {10, 10, 0}, {0, 10, 0}};
        BezierReference.Interval i = BezierReference.length(p, new double[] {1, Math.sqrt(0.5), 1}, 1e-10, 1 << 20);
        double exact = 5 * Math.PI;
        assertTrue(i.lower() <= exact + 1e-12 && exact - 1e-12 <= i.upper(), i.toString());
        // the interval is as narrow as asked: 1e-10 of the length (plus rounding)
        assertTrue(i.upper() - i.lower() <= 1.1e-10 * i.upper(), i.toString());
    }

    @Test
    void referenceOfAParabola() {
        // (0,0)-(10,10)-(20,0), all weights 1: the parabola y = x - x^2/20 on [0, 20]; its length
        // 2 * integral_0^10 sqrt(1 + (1 - x/10)^2) dx = 10 (sqrt 2 + asinh 1) (calculus, closed form)
        double[][] p = {{0, 0, 0}, {10, 10, 0}, {20, 0, 0}};
        BezierReference.Interval i = BezierReference.length(p, new double[] {1, 1, 1}, 1e-10, 1 << 20);
        double exact = 10 * (Math.sqrt(2) + Math.log(1 + Math.sqrt(2)));
        assertTrue(i.lower() <= exact + 1e-12 && exact - 1e-12 <= i.upper(), i.toString());
    }

    @Test
    void extremeInnerWeightTendsToTheControlPolygon() {
        // weight 1e15 on the middle point: the curve runs into the corner (issue 20's case), its length
        // is the control polygon 20 sqrt 2 to within about 1e-7 relative (common practice, no source:
        // the corner is rounded over about 1e-7.5 of the legs)
        double[][] p = {{0, 0, 0}, {10, 10, 0}, {20, 0, 0}};
        BezierReference.Interval i = BezierReference.length(p, new double[] {1, 1e15, 1}, 1e-10, 1 << 20);
        assertEquals(20 * Math.sqrt(2), i.upper(), 1e-6 * 28.28, i.toString());
        assertTrue(i.upper() - i.lower() <= 1.1e-10 * i.upper(), i.toString());
    }

    @Test
    void everyKindMakesADrawingTheImporterReads() throws IOException, DxfInputException {
        Seed seed = corpusSeed();
        for (Mutation kind : HostileModelKinds.all()) {
            for (long s = 1; s <= 4; s++) {
                Mutant m = kind.make(seed, new Random(s));
                assertNotNull(m, kind.name());
                Path in = work.resolve(kind.name() + s + ".dxf");
                Files.write(in, m.bytes());
                // a well-formed drawing (hostile content, not hostile syntax): it imports without a message
                assertNotNull(DxfImporter.read(in, ImportOptions.DEFAULTS), kind.name());
            }
        }
    }

    @Test
    void extremeWeightSplinesMeetTheReference() throws IOException {
        Seed seed = corpusSeed();
        MutantRun runner = new MutantRun();
        Path out = Files.createDirectories(work.resolve("out"));
        int checked = 0;
        for (long s = 1; s <= 8; s++) {
            Mutant m = HostileModelKinds.extremeWeights().make(seed, new Random(s));
            Path in = work.resolve("m.dxf");
            Files.write(in, m.bytes());
            MutantRun.clear(out);
            // 120 s: a loaded machine; the drawing itself takes about a second
            MutantRun.Result r = runner.run(MutantRun.args(in, out, false, false, false, m.args()), out, 120_000);
            assertTrue(!r.overBound() && (r.code() == 0 || r.code() == 1), "seed " + s + ": " + r.err());
            assertEquals(List.of(), OutputChecks.success(r, m.bytes()), "seed " + s);
            JsonNode json = new ObjectMapper().readTree(out.resolve("r.json").toFile());
            List<String> p = m.reference().check(json);
            if (p != null) { // null: the spline was skipped as malformed (a weight beyond 1e100)
                assertEquals(List.of(), p, "seed " + s);
                checked++;
            }
        }
        assertTrue(checked >= 4, "most splines were weighed and checked: " + checked);
    }

    private static Seed corpusSeed() throws IOException {
        Path drawing = MutationCampaignTest.shared().resolve("corpus/v01_wire_shelf_lines_r2000_mm.dxf");
        assumeTrue(Files.exists(drawing), "../shared/corpus is not beside the checkout: test skipped");
        return new Seed("v01", Files.readAllBytes(drawing));
    }
}
