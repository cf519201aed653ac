package org.linemass.engine.pieces;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.linemass.engine.result.Finding;
import org.linemass.engine.result.FindingKind;
import org.linemass.engine.result.Severity;
import org.linemass.geometry.Segment;
import org.linemass.geometry.Straight;
import org.linemass.geometry.Vec3;
import org.linemass.tolerance.Tolerances;

/**
 * Far stray entities: reported as {@code remote_entity} with their distance, weighed like the rest,
 * and without effect on how the rest is joined and checked (issue 20's drawing: ten short wires,
 * one real 0.05 mm gap, strays at 1e9 mm and 1e12 mm). Distances are differences of the drawn
 * coordinates (closed form).
 */
class RemoteEntityTest {

    private static final String W = "WIRE";

    /** The defaults of every analysis (join 0.01 mm), as the command line uses them. */
    private static final Tolerances TOL = Tolerances.defaults();

    private static PieceAnalysis run(List<Segment> segs, Tolerances tol) {
        return PieceAnalyzer.analyze(segs, tol, Fixtures.sections(W, Fixtures.WIRE_D4), false);
    }

    private static List<Finding> of(PieceAnalysis r, String kind) {
        return r.findings().stream().filter(f -> f.kind().equals(kind)).toList();
    }

    /** Eight 440 mm L-shaped wires, a 400 mm wire split by a 0.05 mm gap (mm coordinates, metres out). */
    private static List<Segment> panel() {
        List<Segment> s = new ArrayList<>();
        int h = 0x10;
        for (int k = 0; k < 8; k++) {
            double y = 300 * k;
            s.add(Fixtures.line(W, Integer.toHexString(h++), 0, y, 200, y));
            s.add(Fixtures.line(W, Integer.toHexString(h++), 200, y, 200, y + 240));
        }
        s.add(Fixtures.line(W, "80", 0, 3000, 200, 3000));
        s.add(Fixtures.line(W, "81", 200.05, 3000, 400, 3000));
        return s;
    }

    @Test
    void cleanPanel_noRemoteEntity() {
        PieceAnalysis r = run(panel(), TOL);
        assertEquals(List.of(), of(r, FindingKind.REMOTE_ENTITY));
        assertEquals(18 - 8, r.pieces().size()); // 8 L-shapes joined at their corners, 2 halves of the gap wire
    }

    @Test
    void partsAFewHundredMetresApart_areNotRemote() {
        // a second part 500 m away from a 3 m panel: under 1000 x max(size, 1 m); common practice, no source
        List<Segment> s = new ArrayList<>(panel());
        s.add(Fixtures.line(W, "90", 500_000, 0, 500_400, 0));
        assertEquals(List.of(), of(run(s, TOL), FindingKind.REMOTE_ENTITY));
    }

    @Test
    void straysAt1e9And1e12Millimetres_reportedWithTheirDistance_restUnchanged() {
        List<Segment> s = new ArrayList<>(panel());
        s.add(Fixtures.line(W, "90", 1e9, 0, 1e9 + 10, 0));
        s.add(Fixtures.line(W, "91", 1e12, 0, 1e12 + 10, 0));
        PieceAnalysis r = run(s, TOL);
        // the panel's ten pieces plus the two strays, each a piece of its own (weighed like the rest)
        assertEquals(12, r.pieces().size());
        List<Finding> gaps = of(r, FindingKind.GAP);
        assertEquals(1, gaps.size(), r.findings().toString());
        // the opening is 200.05 - 200 mm; 1e-12 m covers the rounding of the millimetre coordinates
        assertEquals(0.05e-3, gaps.get(0).sizeM(), 1e-12);
        assertEquals(List.of(), of(r, FindingKind.ZERO_LENGTH));
        assertEquals(List.of(), of(r, FindingKind.JOINED_ACROSS_GAP));
        List<Finding> far = of(r, FindingKind.REMOTE_ENTITY);
        assertEquals(2, far.size(), far.toString());
        for (Finding f : far) {
            assertEquals(Severity.WARNING, f.severity());
            assertEquals(1, f.entities().size());
        }
        // distances from the panel's box (x up to 400 mm) to each stray's start: 1e6 m - 0.4 m and 1e9 m - 0.4 m;
        // relative 1e-12 is far above the rounding of these differences
        Finding near = far.get(0).sizeM() < far.get(1).sizeM() ? far.get(0) : far.get(1);
        Finding farthest = near == far.get(0) ? far.get(1) : far.get(0);
        assertEquals(1e6 - 0.4, near.sizeM(), 1e-12 * 1e6);
        assertEquals(1e9 - 0.4, farthest.sizeM(), 1e-12 * 1e9);
        assertTrue(near.message().contains("1.00e+06 m away from the rest of the drawing"), near.message());
        assertTrue(farthest.message().contains("1.00e+09 m away"), farthest.message());
    }

    @Test
    void straysInOppositeDirections_andAClusterOfThree() {
        List<Segment> s = new ArrayList<>(panel());
        s.add(Fixtures.line(W, "90", -1e12, 0, -1e12 + 10, 0));
        s.add(Fixtures.line(W, "91", 0, 1e9, 10, 1e9));
        // three lines drawn end to end 1e10 mm up in z: one cluster, one finding naming all three
        for (int i = 0; i < 3; i++) {
            s.add(new Straight(Fixtures.mm(100 * i, 0, 1e10), Fixtures.mm(100 * i + 100, 0, 1e10),
                    Fixtures.src(W, Integer.toHexString(0xA0 + i))));
        }
        PieceAnalysis r = run(s, TOL);
        List<Finding> far = of(r, FindingKind.REMOTE_ENTITY);
        assertEquals(3, far.size(), far.toString());
        assertEquals(1, far.stream().filter(f -> f.entities().size() == 3).count(), far.toString());
        assertTrue(far.stream().anyMatch(f -> f.message().startsWith("3 entities (")), far.toString());
        // the three lines still join into one 300 mm piece: the join tolerance holds out there too
        assertEquals(10 + 2 + 1, r.pieces().size());
    }

    @Test
    void aUserJoinOf001mm_isHonouredWhateverLiesFarAway() {
        List<Segment> s = new ArrayList<>(panel());
        s.add(Fixtures.line(W, "91", 1e12, 0, 1e12 + 10, 0));
        PieceAnalysis r = run(s, TOL.withJoin(1e-5));
        assertEquals(1, of(r, FindingKind.GAP).size());
        assertEquals(11, r.pieces().size());
    }

    @Test
    void noiseIsLocal() {
        // 10 nm floor near the origin; 64 ulps of the coordinate far out (Math.ulp(1e9) = 2^-23 exactly)
        assertEquals(1e-8, TOL.noiseAt(0.0));
        assertEquals(1e-8, TOL.noiseAt(1000.0));
        assertEquals(64 * Math.pow(2, -23), TOL.noiseAt(1e9));
        assertEquals(Double.POSITIVE_INFINITY, TOL.noiseAt(Double.NaN));
        // a 5 nm straight near the origin has no length; the same 5 nm far out is far below the noise too,
        // but a 1 mm straight at 1e9 m is a real segment (noise 7.6e-6 m there)
        Vec3 a = new Vec3(1e9, 0, 0);
        PieceAnalysis r = run(List.of(new Straight(a, new Vec3(1e9 + 1e-3, 0, 0), Fixtures.src(W, "10"))), TOL);
        assertEquals(List.of(), of(r, FindingKind.ZERO_LENGTH));
        assertEquals(1, r.pieces().size());
    }
}
