package org.linemass.engine.shape;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.linemass.engine.assemble.PieceForms;
import org.linemass.engine.bender.BenderProgram;
import org.linemass.engine.pieces.geom.Curves;
import org.linemass.geometry.Segment;
import org.linemass.geometry.Vec3;

/**
 * ACI 318-19 minimum inside bend radii of US bars in the schedule. Check values: ASTM A615 nominal
 * diameters (team reference sheet 1.2, verified: #4 0.500 in, #9 1.128 in) at 25.4 mm per inch
 * (sheet 0.1), and half the minimum inside bend diameters of ACI 318-19 Tables 25.3.1 and 25.3.2
 * (sheet 6.1: standard hooks 6 d_b for #3-#8 and 8 d_b for #9-#11, verified; stirrups 4 d_b for #5
 * and smaller, verified). Radii are products of exact decimals: compared to 1e-12 m.
 */
class AciRadiusTest {

    private static final double TOL = 1e-12;
    private static final double NO4 = 0.0127;

    @Test
    void forDiameterM_no4AndNo9_tableRadii() {
        AciRadius.Bar no4 = AciRadius.forDiameterM(0.5 * 0.0254).orElseThrow();
        assertEquals("#4", no4.number());
        assertEquals(3 * NO4, no4.hookRadiusM(), TOL);
        assertEquals(2 * NO4, no4.stirrupRadiusM(), TOL);
        assertFalse(no4.stirrupFromMemory());
        AciRadius.Bar no9 = AciRadius.forDiameterM(1.128 * 0.0254).orElseThrow();
        assertEquals(4 * 1.128 * 0.0254, no9.hookRadiusM(), TOL);
        assertNull(no9.stirrupRadiusM());
        assertTrue(AciRadius.forDiameterM(0.012).isEmpty(), "12 mm is a metric size");
    }

    private static ShapeResult classify(List<Segment> bar, double d, BendStandard standard) {
        BenderProgram p = PieceForms.of(bar, false, d, 0, Math.toRadians(0.01), 1e-5).program();
        return ShapeClassifier.classify(p, false, d, bar.stream().mapToDouble(Curves::length).sum(), standard);
    }

    /**
     * The chosen standard alone: a 12 mm bar at inside radius 10 mm (below Table 2's 24 mm) is not
     * checked under ACI 318 (12 mm is no ASTM size) and is flagged under BS 8666; a #4 bar at inside
     * radius 20 mm is flagged under ACI 318 and not checked under BS 8666.
     */
    @Test
    void classify_chosenStandardOnly() {
        List<Segment> metric = ShapeClassifierTest.filleted(0.016, new Vec3(0.4, 0, 0), Vec3.ZERO, new Vec3(0, 0.3, 0));
        ShapeResult aci = classify(metric, 0.012, BendStandard.ACI318);
        assertFalse(aci.belowMinimumRadius());
        assertTrue(aci.notes().contains("not an ASTM A615 bar size: no ACI 318-19 minimum radius"), aci.notes()
                .toString());
        assertTrue(classify(metric, 0.012, BendStandard.BS8666).belowMinimumRadius());
        List<Segment> us = ShapeClassifierTest.filleted(0.020 + NO4 / 2, new Vec3(0.4, 0, 0), Vec3.ZERO,
                new Vec3(0, 0.3, 0));
        assertTrue(classify(us, NO4, BendStandard.ACI318).belowMinimumRadius());
        ShapeResult bs = classify(us, NO4, BendStandard.BS8666);
        assertFalse(bs.belowMinimumRadius());
        assertTrue(bs.notes().contains("not a BS 8666 Table 2 bar size: no minimum radius"), bs.notes().toString());
    }

    @Test
    void parse_unknownStandard_namesTheKnownOnes() {
        assertEquals(BendStandard.ACI318, BendStandard.parse("ACI318"));
        IllegalArgumentException e = org.junit.jupiter.api.Assertions.assertThrows(IllegalArgumentException.class,
                () -> BendStandard.parse("din"));
        assertTrue(e.getMessage().contains("auto, bs8666, aci318"), e.getMessage());
    }

    /** A #4 L-bar at inside radius 20 mm is below the stirrup minimum 25.4 mm; at 30 mm it is not. */
    @Test
    void classify_usBar_checkedAgainstAci() {
        List<Segment> tight = ShapeClassifierTest.filleted(0.020 + NO4 / 2, new Vec3(0.4, 0, 0), Vec3.ZERO,
                new Vec3(0, 0.3, 0));
        ShapeResult t = ShapeClassifierTest.classify(tight, false, NO4);
        assertTrue(t.belowMinimumRadius());
        assertTrue(t.notes().stream().anyMatch(n -> n.contains("below the ACI 318-19 minimum of 25.4 mm")), t.notes()
                .toString());
        List<Segment> easy = ShapeClassifierTest.filleted(0.030 + NO4 / 2, new Vec3(0.4, 0, 0), Vec3.ZERO,
                new Vec3(0, 0.3, 0));
        ShapeResult e = ShapeClassifierTest.classify(easy, false, NO4);
        assertFalse(e.belowMinimumRadius());
        assertTrue(e.notes().stream().anyMatch(n -> n.startsWith("US bar #4")), e.notes().toString());
    }
}
