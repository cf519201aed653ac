package org.linemass.reports;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

class UnitSystemImperialTest {

    @Test
    void message_imperial_everyMetricQuantityConverted() {
        // the demo's duplicate message (engine wording); 1 in = 25.4 mm, 1 ft = 0.3048 m, 1 lb = 0.45359237 kg
        // exactly: 210 mm = 8.2677 in, 3.9 m = 12.795 ft, 0.0207 kg = 0.0456 lb, 0.395 kg/m = 0.265 lb/ft
        String m = "LINE at line 877, handle 47 is drawn again over LINE at line 853, handle 46: 210.000 mm would be "
                + "counted twice (0.0207 kg); it is counted once.";
        assertEquals("LINE at line 877, handle 47 is drawn again over LINE at line 853, handle 46: 8.2677 in would be "
                + "counted twice (0.0456 lb); it is counted once.", UnitSystem.IMPERIAL.message(m));
        assertEquals("layer L has 12.795 ft of wire", UnitSystem.IMPERIAL.message("layer L has 3.900 m of wire"));
        assertEquals("0.265 lb/ft", UnitSystem.IMPERIAL.message("0.395 kg/m"));
        assertEquals("Bend of 90.0 deg, r 0.4724 in", UnitSystem.IMPERIAL.message("Bend of 90.0 deg, r 12.000 mm"));
        // not quantities: a layer called 5 m_X, a unit glued to a word, and metric text stays as it is
        assertEquals("layer 5 m_X", UnitSystem.IMPERIAL.message("layer 5 m_X"));
        assertEquals(m, UnitSystem.METRIC.message(m));
    }

    @Test
    void feetInches_roundedToSixteenths_lowestTerms() {
        assertEquals("1' 0\"", UnitSystem.feetInches(0.3048));
        assertEquals("1' 0-1/2\"", UnitSystem.feetInches(0.0254 * 12.5));
        assertEquals("1/16\"", UnitSystem.feetInches(0.0254 / 16));
        assertEquals("0\"", UnitSystem.feetInches(0.0001));
        // the demo's base frame, 1505.664 mm = 59.278 in: 948.45 sixteenths round to 948 = 4 ft 11 1/4 in
        assertEquals("4' 11-1/4\"", UnitSystem.feetInches(1.505664));
        assertEquals("ft-in", UnitSystem.IMPERIAL_FEET_INCHES.cutUnit());
        assertEquals("59.278", UnitSystem.IMPERIAL.cutLength(1.505664));
    }
}
