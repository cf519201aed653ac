package org.linemass.app;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.linemass.drawing.LengthUnit;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.params.provider.ValueSource;

class LengthParserTest {

    /** Products of two decimal numbers: a few ulps of rounding, relative 1e-15. */
    private static final double REL = 1e-15;

    @ParameterizedTest
    @CsvSource(delimiter = '|', value = {
        // exact unit sizes: 1 in = 25.4 mm, 1 ft = 0.3048 m (FACTS.md section 0.1)
        "0.01mm|1e-5", "2 mm|0.002", "0.1in|0.00254", "1.5e-3 m|0.0015", "3ft|0.9144", ".5 cm|0.005",
        "  4 mm  |0.004", "2 millimetres|0.002", "1 inch|0.0254", "1E2um|1e-4"})
    void metres_readsNumberAndUnit(String text, double metres) {
        assertEquals(metres, LengthParser.metres(text), metres * REL);
    }

    @ParameterizedTest
    @ValueSource(strings = {"5", "mm", "", "1,5mm", "2 parsnips", "1..2mm", "0x10mm", "2 unitless"})
    void metres_rejectsNonLengths(String text) {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> LengthParser.metres(text));
        assertTrue(e.getMessage().contains("'"), "message quotes the input: " + e.getMessage());
    }

    @Test
    void positiveMetres_rejectsZeroAndNegative() {
        assertThrows(IllegalArgumentException.class, () -> LengthParser.positiveMetres("0mm"));
        assertThrows(IllegalArgumentException.class, () -> LengthParser.positiveMetres("-1mm"));
        assertThrows(IllegalArgumentException.class, () -> LengthParser.positiveMetres("1e400 m"));
    }

    @Test
    void unit_readsSymbolsAndRejectsUnitless() {
        assertEquals(LengthUnit.INCH, LengthParser.unit("in"));
        assertEquals(LengthUnit.MILLIMETRE, LengthParser.unit("mm"));
        assertThrows(IllegalArgumentException.class, () -> LengthParser.unit("unitless"));
        assertThrows(IllegalArgumentException.class, () -> LengthParser.unit("furlong"));
    }
}
