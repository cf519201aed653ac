package org.linemass.engine.shape;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.linemass.engine.assemble.PieceForms;
import org.linemass.engine.result.PieceForm;
import org.linemass.engine.section.Section;
import org.linemass.engine.section.BuiltInSections;
import org.linemass.geometry.Segment;
import org.linemass.geometry.Vec3;

/**
 * The minimum inside bend radius each kind of section gets, and its basis. Check values: BS 8666:2005
 * Table 2 (team reference sheet 6.1, verified) for a 12 mm bar, 24 mm; the wire and tube rules are
 * common practice with no source (reference sheet 6.2: about one diameter for annealed wire), so the
 * test checks that they are applied and labelled as such, not that they are right. Radii are
 * compared to 1e-12 m: products of a diameter and a small whole factor.
 */
class BendLimitsTest {

    private static final double TOL = 1e-12;
    private static final org.linemass.geometry.Provenance SRC = org.linemass.geometry.Provenance.of("bar.dxf", "BAR",
            1, "1", "LINE");

    private static Section round(String id, String description, double d, Double min) {
        return new Section(id, description, "steel", 1.0, d, min, "test");
    }

    @Test
    void of_tableTwoBarSize_takesTheTable() {
        BendLimit l = BendLimits.of(round("round:12:steel", "round bar 12 mm", 0.012, null));
        assertEquals(0.024, l.insideRadiusM(), TOL);
        assertEquals("BS 8666:2005 Table 2", l.basis());
    }

    @Test
    void of_sectionWithItsOwnMinimum_takesIt() {
        BendLimit l = BendLimits.of(round("W3", "round wire 3 mm", 0.003, 0.0075));
        assertEquals(0.0075, l.insideRadiusM(), TOL);
        assertTrue(l.basis().startsWith("the section's own minimum"), l.basis());
    }

    @Test
    void of_wireAndTube_commonPracticeLabelled() {
        BendLimit wire = BendLimits.of(round("W3", "round wire 3 mm", 0.003, null));
        assertEquals(0.003, wire.insideRadiusM(), TOL);
        assertTrue(wire.basis().startsWith("common practice, no source"), wire.basis());
        BendLimit tube = BendLimits.of(round("tube:42.4x2.6:steel", "round tube 42.4 x 2.6 mm", 0.0424, null));
        assertEquals(1.5 * 0.0424, tube.insideRadiusM(), TOL);
        assertTrue(tube.basis().startsWith("common practice, no source"), tube.basis());
    }

    @Test
    void of_flatOrNoSection_saysNoneIsKnown() {
        BendLimit flat = BendLimits.of(new Section("flat:40x5:steel", "flat bar 40 x 5 mm", "steel", 1.57, null, null,
                "test"));
        assertFalse(flat.known());
        assertTrue(flat.basis().contains("no minimum bend radius known"), flat.basis());
        assertFalse(BendLimits.of(null).known());
        assertNull(BendLimits.of(null).insideRadiusM());
    }

    @Test
    void builtInSections_everyRoundOneHasALimit() {
        // the built-in catalogue: reinforcing bar carries its own table radius, AWG and steel wire get the
        // wire rule; none is silently without one
        for (Section s : BuiltInSections.rows()) {
            BendLimit l = BendLimits.of(s);
            assertTrue(l.known(), s.id() + ": " + l.basis());
        }
    }

    @Test
    void bendsBelowLimit_sharpCornerAndTightBendCounted() {
        // a 12 mm bar with one sharp corner and one bend of centre-line radius 20 mm (inside 14 < 24)
        List<Segment> bar = new java.util.ArrayList<>(ShapeClassifierTest.filleted(0.020, new Vec3(0.4, 0, 0),
                Vec3.ZERO, new Vec3(0, 0.3, 0)));
        Section s = round("round:12:steel", "round bar 12 mm", 0.012, null);
        PieceForm tight = PieceForms.ofSection(bar, false, s, 0.7, Math.toRadians(0.01), 1e-5);
        assertEquals(1, tight.bendsBelowLimit());
        List<Segment> sharp = List.of(new org.linemass.geometry.Straight(new Vec3(0.4, 0, 0), Vec3.ZERO,
                SRC), new org.linemass.geometry.Straight(Vec3.ZERO, new Vec3(0, 0.3, 0),
                SRC));
        assertEquals(1, PieceForms.ofSection(sharp, false, s, 0.7, Math.toRadians(0.01), 1e-5).bendsBelowLimit());
        List<Segment> easy = ShapeClassifierTest.filleted(0.030, new Vec3(0.4, 0, 0), Vec3.ZERO, new Vec3(0, 0.3, 0));
        assertEquals(0, PieceForms.ofSection(easy, false, s, 0.7, Math.toRadians(0.01), 1e-5).bendsBelowLimit());
    }
}
