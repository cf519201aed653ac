package org.linemass.reports;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;

import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.linemass.engine.result.DrawingResult;
import org.linemass.engine.result.Finding;
import org.linemass.engine.result.FindingKind;
import org.linemass.engine.result.PieceResult;
import org.linemass.engine.result.Severity;
import org.linemass.engine.result.SourceRef;
import org.linemass.geometry.Vec3;

class FindingGroupsTest {

    /** The frame of {@link Fixtures#frame} with {@code extra} findings after its own three. */
    private static DrawingResult with(List<Finding> extra) {
        DrawingResult b = Fixtures.flatFrame("a.dxf");
        List<Finding> all = new ArrayList<>(b.findings());
        all.addAll(extra);
        return new DrawingResult(b.drawing(), b.entities(), b.layers(), b.pieces(), b.groups(), all, b.totals(),
                b.sections(), b.incompleteReasons());
    }

    /** A tight bend message as the engine writes it, naming entity {@code e}. */
    private static Finding bend(SourceRef e, double x, double radiusMm) {
        return new Finding(FindingKind.TIGHT_BEND, Severity.WARNING, new Vec3(x, 0, 0), radiusMm / 1000, "BARS",
                List.of(e), null, String.format(java.util.Locale.ROOT, "Bend of 90.0 deg of %s has an inside radius "
                        + "of %.3f mm, below the minimum 16.000 mm for section B10.", FindingGroups.describe(e), radiusMm));
    }

    @Test
    void of_sameMessageButOwnEntities_oneGroupWithItsNumbersAndMark() {
        // the frame's pieces 1 and 2 (mark A) come from LINE 120:2A and LINE 134:2B
        SourceRef la = new SourceRef(120, "2A", "LINE", List.of());
        SourceRef lb = new SourceRef(134, "2B", "LINE", List.of());
        DrawingResult r = with(List.of(bend(la, 0.2, 12), bend(lb, 0.4, 12), bend(la, 0.6, 12), bend(lb, 0.8, 4.533)));
        List<FindingGroups.Group> g = FindingGroups.of(r);
        // frame: error gap, warning duplicate, info units; then 3 alike bends and one with another radius
        assertEquals(List.of(1), g.get(0).numbers());
        assertEquals(List.of(2), g.get(1).numbers());
        FindingGroups.Group alike = g.get(2);
        assertEquals(List.of(4, 5, 6), alike.numbers());
        assertEquals("3 tight bends on A", alike.headline());
        assertEquals("Bend of 90.0 deg of LINE has an inside radius of 12.000 mm, below the minimum 16.000 mm for "
                + "section B10.", alike.message());
        assertEquals(0.012, alike.sizeM(), 0.0, "the common size, as given");
        assertEquals("4-6", alike.numberText());
        assertEquals(List.of(7), g.get(3).numbers(), "4.533 mm is another message: a group of its own");
        assertEquals(Severity.INFO, g.get(4).severity(), "notes come last");
        assertEquals(5, g.size());
    }

    @Test
    void of_marksFromTheBendAtTheFindingsPlace() {
        DrawingResult b = Fixtures.flatFrame("a.dxf");
        PieceResult p = b.pieces().get(0);
        Vec3 at = new Vec3(0.3, 0, 0);
        PieceResult bent = new PieceResult(p.id(), p.layer(), p.section(), p.lengthM(), p.massKg(), p.centroidM(),
                p.lengthInertiaM3(), p.inertiaKgM2(), p.startM(), p.endM(), p.closed(), p.segments(), "B7",
                List.of(new org.linemass.engine.result.Bend(at, 90, 0.012, 0.017)), List.of(), p.errorBoundM());
        SourceRef other = new SourceRef(999, "FF", "LWPOLYLINE", List.of("BLK"));
        Finding f = new Finding(FindingKind.TIGHT_BEND, Severity.WARNING, at, 0.012, "BARS", List.of(other), null, "x");
        DrawingResult r = new DrawingResult(b.drawing(), b.entities(), b.layers(), List.of(bent), b.groups(),
                List.of(f, f), b.totals(), b.sections(), b.incompleteReasons());
        assertEquals(List.of("B7"), FindingGroups.of(r).get(0).marks());
    }

    @Test
    void of_differentSizes_groupSizeUnknown_layersNamed() {
        SourceRef e = new SourceRef(5, "", "LINE", List.of());
        Finding a = new Finding(FindingKind.GAP, Severity.WARNING, Vec3.ZERO, 0.001, "L1", List.of(e), null, "gap");
        Finding c = new Finding(FindingKind.GAP, Severity.WARNING, Vec3.ZERO, 0.002, "L2", List.of(e), null, "gap");
        FindingGroups.Group g = FindingGroups.of(with(List.of(a, c))).get(2);
        assertEquals(List.of(4, 5), g.numbers());
        assertNull(g.sizeM());
        assertEquals(List.of("L1", "L2"), g.layers());
        assertEquals("2 gaps on layers L1, L2", g.headline());
        assertEquals("4, 5", g.numberText());
    }

    @Test
    void numberText_manyRuns_restCounted() {
        List<Integer> n = List.of(1, 3, 5, 7, 9, 11, 13, 14, 15, 20);
        FindingGroups.Group g = new FindingGroups.Group("crossing", Severity.INFO, "m", n, List.of(), List.of(), null);
        assertEquals("1, 3, 5, 7, 9, 11 and 4 more", g.numberText());
        assertEquals("10 crossings", g.headline());
        assertEquals("T-junctions", FindingGroups.plural(FindingKind.T_JUNCTION, 2));
    }
}
