package org.linemass.reports;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.Locale;
import org.junit.jupiter.api.Test;

class UnitSystemTest {

    @Test
    void imperial_convertsWithExactFactors() {
        // 1 ft = 0.3048 m, 1 in = 25.4 mm, 1 lb = 0.45359237 kg exactly (FACTS.md section 0.1)
        assertEquals("3.281", UnitSystem.IMPERIAL.longLength(1.0));
        assertEquals("1.000", UnitSystem.IMPERIAL.shortLength(0.0254));
        assertEquals("2.205", UnitSystem.IMPERIAL.mass(1.0));
        assertEquals("1.000", UnitSystem.IMPERIAL.mass(0.45359237));
    }

    @Test
    void metric_showsMillimetresAndKilograms() {
        assertEquals("1234.5", UnitSystem.METRIC.shortLength(1.2345));
        assertEquals("0.617", UnitSystem.METRIC.mass(0.617));
        assertEquals("", UnitSystem.METRIC.mass(null));
    }

    @Test
    void fixed_ignoresDefaultLocaleAndNegativeZero() {
        Locale before = Locale.getDefault();
        try {
            Locale.setDefault(Locale.GERMANY);
            assertEquals("1.500", UnitSystem.fixed(1.5, 3));
            assertEquals("0.000", UnitSystem.fixed(-0.0000001, 3));
            assertEquals("-0.010", UnitSystem.fixed(-0.01, 3));
        } finally {
            Locale.setDefault(before);
        }
    }

    @Test
    void readable_smallValuesKeepTheirDigits() {
        // a 6.3 mm clip: 0.006 m alone hides the size; the mm reading follows in brackets
        assertEquals("0.006 (6.3 mm)", UnitSystem.METRIC.longLengthReadable(0.0063));
        assertEquals("1.500", UnitSystem.METRIC.longLengthReadable(1.5));
        // 1 in = 0.0254 m exactly (FACTS.md section 0.1): 0.05 ft is 0.6 in
        assertEquals("0.050 (0.600 in)", UnitSystem.IMPERIAL.longLengthReadable(0.05 * 0.3048));
        // 0.000123 kg with three significant digits, not "0.000"; large masses keep fixed decimals
        assertEquals("0.000123", UnitSystem.METRIC.massReadable(0.000123));
        assertEquals("12.346", UnitSystem.METRIC.massReadable(12.3456));
        assertEquals("0.000", UnitSystem.METRIC.massReadable(0.0));
        assertEquals("", UnitSystem.METRIC.massReadable(null));
    }

    @Test
    void mass_isShownOneWayEverywhere() {
        // a 2.16 g clip (demo drawing, 38.8 mm of 3 mm wire, testdata/demo/README.md): the same text in
        // every table, never "0.002" in the bill and "0.00216" in the summary
        assertEquals("0.00216", UnitSystem.METRIC.mass(0.002157));
        assertEquals(UnitSystem.METRIC.massReadable(0.002157), UnitSystem.METRIC.mass(0.002157));
        assertEquals("0.594", UnitSystem.METRIC.mass(0.5941));
        // 1 lb = 0.45359237 kg exactly (FACTS.md section 0.1): 2.157 g = 0.00476 lb
        assertEquals("0.00476", UnitSystem.IMPERIAL.mass(0.002157));
    }

    @Test
    void extraDecimals_growForSmallDrawings() {
        // 7 m of wire: the usual 3 decimals (1 mm); 6.3 mm of wire: 3 more (1 micrometre)
        assertEquals(0, UnitSystem.METRIC.extraDecimalsFor(7.0));
        assertEquals(1, UnitSystem.METRIC.extraDecimalsFor(0.5));
        assertEquals(3, UnitSystem.METRIC.extraDecimalsFor(0.0063));
        assertEquals(3, UnitSystem.METRIC.extraDecimalsFor(1e-9), "capped");
        assertEquals("0.000212", UnitSystem.METRIC.longLength(0.000212, 3));
    }
}
