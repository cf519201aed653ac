package org.linemass.engine.pieces;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.linemass.engine.piece.Piece;
import org.linemass.engine.pieces.geom.Curves;
import org.linemass.engine.result.Finding;
import org.linemass.engine.result.FindingKind;
import org.linemass.engine.result.Severity;
import org.linemass.engine.result.SourceRef;
import org.linemass.geometry.Segment;
import org.linemass.geometry.Vec3;

/**
 * The welded mesh panel with drafting defects: every LINE of layer MESH_WIRE_D4 of the corpus
 * drawing v10 (coordinates as written in the DXF, millimetres), built by hand. Expected places,
 * sizes and entity handles come from the corpus manifest.json, file v10, "defects".
 */
class MeshPanelDefectsTest {

    /** Locations in the manifest are given to ~1e-13 mm; 1 nm leaves room for our rounding. */
    private static final double PLACE_TOL_M = 1e-9;

    private static final String L = "MESH_WIRE_D4";

    private static PieceAnalysis result;

    static List<Segment> panel() {
        return new ArrayList<>(List.of(
                Fixtures.line(L, "32", 350.0, -120.0, 445.02378708327916, -88.84747380465545),
                Fixtures.line(L, "33", 445.0712989768208, -88.83189754155778, 540.0475741665583, -57.694947609310894),
                Fixtures.line(L, "34", 334.42373690232773, -72.48810645836042, 429.4475239856069, -41.33558026301587),
                Fixtures.line(L, "35", 431.34799972727245, -40.71252973910897, 524.471311068886, -10.183054067671321),
                Fixtures.line(L, "36", 318.84747380465546, -24.97621291672084, 508.8950479712138, 37.32883947396826),
                Fixtures.line(L, "37", 318.84747380465546, -24.97621291672084, 508.8950479712138, 37.32883947396826),
                Fixtures.line(L, "38", 303.2712107069832, 22.53568062491874, 417.2997552069181, 59.91871205933222),
                Fixtures.line(L, "39", 379.2902403736065, 47.457701581194385, 493.3187848735415, 84.84073301560784),
                Fixtures.line(L, "3A", 335.2068411509505, 85.62383726423059, 335.2068411509505, 85.62383726423059),
                Fixtures.line(L, "3B", 272.1186845116386, 117.55946770819787, 462.1662586781969, 179.864520098887),
                Fixtures.line(L, "3C", 367.14247159491777, 148.7119939035424, 351.5662084972455, 196.22388744518202),
                Fixtures.line(L, "3D", 250.31191617489742, 184.0761186664933, 421.66797462424904, 303.3954433071499),
                Fixtures.line(L, "3E", 231.6204004576907, 241.09039091646076, 440.35949034145574, 246.38117105718243)));
    }

    @BeforeAll
    static void run() {
        result = PieceAnalyzer.analyze(panel(), Fixtures.tol(), Fixtures.sections(L, Fixtures.WIRE_D4), false);
    }

    private static Finding only(String kind) {
        List<Finding> f = result.findings().stream().filter(x -> x.kind().equals(kind)).toList();
        assertEquals(1, f.size(), kind + " findings: " + f);
        return f.get(0);
    }

    private static void assertAt(double xMm, double yMm, Finding f) {
        Vec3 at = f.atM();
        assertNotNull(at, f.toString());
        assertTrue(at.distance(Fixtures.mm(xMm, yMm)) < PLACE_TOL_M, f + " not at " + xMm + ", " + yMm);
    }

    private static void assertHandles(Finding f, String... handles) {
        List<String> got = f.entities().stream().map(SourceRef::handle).sorted().toList();
        assertEquals(java.util.Arrays.stream(handles).sorted().toList(), got, f.toString());
    }

    @Test
    void smallGap_joinsUnderTenthMillimetreTolerance_andIsReportedAsInfo() {
        // manifest v10 small_gap: gap 0.05 at (445.04754303004995, -88.83968567310662), handles 32, 33
        Finding f = only(FindingKind.JOINED_ACROSS_GAP);
        assertEquals(Severity.INFO, f.severity());
        assertAt(445.04754303004995, -88.83968567310662, f);
        assertEquals(0.05e-3, f.sizeM(), 1e-12, "gap 0.05 mm; 1e-12 m covers the rounding of the DXF coordinates");
        assertHandles(f, "32", "33");
    }

    @Test
    void largeGap_isReportedAsGapWarningWithItsSize() {
        // manifest v10 large_gap: gap 2.0 at (430.3977618564397, -41.02405500106242), handles 34, 35
        Finding f = only(FindingKind.GAP);
        assertEquals(Severity.WARNING, f.severity());
        assertAt(430.3977618564397, -41.02405500106242, f);
        assertEquals(2.0e-3, f.sizeM(), 1e-12);
        assertHandles(f, "34", "35");
    }

    @Test
    void duplicate_isAnErrorWith200mmAndTheMassCountedTwice() {
        // manifest v10 duplicate: duplicate_length 200.0 at (413.8712608879346, 6.176313278623709), handles 36, 37
        Finding f = only(FindingKind.DUPLICATE);
        assertEquals(Severity.ERROR, f.severity());
        assertAt(413.8712608879346, 6.176313278623709, f);
        assertEquals(0.2, f.sizeM(), 1e-12);
        // mass counted twice: 0.2 m x pi (0.004 m)^2 / 4 x 7850 kg/m^3 (closed form, FACTS.md section 2)
        assertEquals(0.2 * Math.PI * 0.004 * 0.004 / 4 * 7850, f.massKg(), 1e-12);
        assertHandles(f, "36", "37");
    }

    @Test
    void partialOverlap_isAnErrorWith40mmAtTheMiddleOfTheOverlap() {
        // manifest v10 partial_overlap: overlap_length 40.0 at (398.2949977902623, 53.688206820263304), handles 38, 39
        Finding f = only(FindingKind.OVERLAP);
        assertEquals(Severity.ERROR, f.severity());
        assertAt(398.2949977902623, 53.688206820263304, f);
        assertEquals(0.04, f.sizeM(), 1e-12);
        assertHandles(f, "38", "39");
    }

    @Test
    void removedMaterial_matchesTheManifestDeduplicatedLength() {
        // manifest v10 layer MESH_WIRE_D4: raw length 1705.562260356422 mm, deduplicated 1465.562260356422 mm
        double removed = result.removed().stream().mapToDouble(Curves::length).sum();
        assertEquals((1705.562260356422 - 1465.562260356422) * 1e-3, removed, 1e-12);
        double kept = result.pieces().stream().flatMap(p -> p.segments().stream()).mapToDouble(Curves::length).sum();
        assertEquals(1465.562260356422e-3, kept, 1e-12, "pieces count the material once");
    }

    @Test
    void zeroLengthLine_isAWarning() {
        // manifest v10 zero_length at (335.2068411509505, 85.62383726423059), handle 3A
        Finding f = only(FindingKind.ZERO_LENGTH);
        assertEquals(Severity.WARNING, f.severity());
        assertAt(335.2068411509505, 85.62383726423059, f);
        assertHandles(f, "3A");
    }

    @Test
    void tJunction_isInfoAtTheTouchingEnd() {
        // manifest v10 t_junction at (367.14247159491777, 148.7119939035424), handles 3C (end) and 3B
        Finding f = only(FindingKind.T_JUNCTION);
        assertEquals(Severity.INFO, f.severity());
        assertAt(367.14247159491777, 148.7119939035424, f);
        assertHandles(f, "3B", "3C");
        assertTrue(f.message().contains("1 T-junction and 1 crossing"), f.message());
    }

    @Test
    void crossing_isInfoAtTheCrossingPoint() {
        // manifest v10 crossing at (335.98994539957323, 243.73578098682157), handles 3D, 3E
        Finding f = only(FindingKind.CROSSING);
        assertEquals(Severity.INFO, f.severity());
        assertAt(335.98994539957323, 243.73578098682157, f);
        assertHandles(f, "3D", "3E");
    }

    @Test
    void nothingElse_isReported() {
        Map<String, Integer> kinds = new TreeMap<>();
        result.findings().forEach(f -> kinds.merge(f.kind(), 1, Integer::sum));
        assertEquals(Map.of(FindingKind.JOINED_ACROSS_GAP, 1, FindingKind.GAP, 1, FindingKind.DUPLICATE, 1,
                FindingKind.OVERLAP, 1, FindingKind.ZERO_LENGTH, 1, FindingKind.T_JUNCTION, 1,
                FindingKind.CROSSING, 1), kinds);
    }

    @Test
    void pieces_joinTheSmallGapAndTheOverlapButNotTheLargeGap() {
        // wires: 32+33 joined, 34, 35, 36 (37 removed), 38+39 (39 trimmed, joined), 3B, 3C, 3D, 3E
        assertEquals(9, result.pieces().size());
        assertTrue(result.pieces().stream().noneMatch(Piece::closed));
        long twoSegment = result.pieces().stream().filter(p -> p.segments().size() == 2).count();
        assertEquals(2, twoSegment);
        for (Piece p : result.pieces()) {
            assertTrue(p.bends().isEmpty(), "straight wires have no bends: " + p);
        }
    }

    @Test
    void groups_coverEveryPieceOnce() {
        List<Integer> all = result.groups().stream().flatMap(List::stream).sorted().toList();
        List<Integer> expected = new ArrayList<>();
        for (int i = 0; i < result.pieces().size(); i++) {
            expected.add(i);
        }
        assertEquals(expected, all);
    }
}
