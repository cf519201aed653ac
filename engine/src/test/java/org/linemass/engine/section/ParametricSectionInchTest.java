package org.linemass.engine.section;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;

class ParametricSectionInchTest {

    /** Relative difference allowed between an inch id and its millimetre twin: the 25.4 product rounds once. */
    private static final double SAME = 1e-12;

    private static double kgPerM(String id) {
        return ParametricSection.parse(id).orElseThrow().kgPerM();
    }

    @Test
    void parse_inches_sameAsTheirMillimetres() {
        // 1 in = 25.4 mm exactly (international inch)
        assertEquals(kgPerM("round:12.7:steel"), kgPerM("round:0.5in:steel"), SAME * kgPerM("round:12.7:steel"));
        assertEquals(kgPerM("rect:50.8x6.35:steel"), kgPerM("rect:2x0.25in:steel"), SAME * kgPerM("rect:50.8x6.35:steel"));
        assertEquals(kgPerM("rect:50.8x6.35:steel"), kgPerM("rect:2inx6.35mm:steel"), SAME * kgPerM("rect:50.8x6.35:steel"));
        assertEquals(0.0127, ParametricSection.parse("round:0.5in:steel").orElseThrow().diameterM(), 1e-15);
    }

    @Test
    void parse_pipeInInches_matchesThePublishedWeightPerFoot() {
        // NPS 1-1/2 schedule 40 steel pipe: OD 1.900 in, wall 0.145 in, 2.72 lb/ft (ASME B36.10M
        // table, from memory); the table rounds to 0.01 lb/ft and assumes 0.2836 lb/in3 (7850 kg/m3)
        double lbPerFt = kgPerM("tube:1.9x0.145in:steel") * 0.3048 / 0.45359237;
        assertEquals(2.72, lbPerFt, 0.005);
    }

    @Test
    void parse_badInchDimension_namesIt() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> ParametricSection.parse("round:halfin:steel"));
        assertEquals("section round:halfin:steel: dimension 'halfin' is not a number (millimetres, or inches "
                + "followed by in: 0.5in)", e.getMessage());
    }
}
