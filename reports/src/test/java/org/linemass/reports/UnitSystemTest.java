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
}
