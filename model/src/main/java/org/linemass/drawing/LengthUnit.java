package org.linemass.drawing;

import java.util.Locale;
import java.util.Optional;

/**
 * Drawing length units with their $INSUNITS code and exact size in metres (DXF Reference,
 * $INSUNITS table; metre values: SI, the 1959 international inch, NIST survey definitions).
 */
public enum LengthUnit {
    UNITLESS(0, "unitless", 1.0),
    INCH(1, "in", 0.0254),
    FOOT(2, "ft", 0.3048),
    MILE(3, "mi", 1609.344),
    MILLIMETRE(4, "mm", 0.001),
    CENTIMETRE(5, "cm", 0.01),
    METRE(6, "m", 1.0),
    KILOMETRE(7, "km", 1000.0),
    MICROINCH(8, "uin", 2.54e-8),
    MIL(9, "mil", 2.54e-5),
    YARD(10, "yd", 0.9144),
    ANGSTROM(11, "angstrom", 1e-10),
    NANOMETRE(12, "nm", 1e-9),
    MICRON(13, "um", 1e-6),
    DECIMETRE(14, "dm", 0.1),
    DECAMETRE(15, "dam", 10.0),
    HECTOMETRE(16, "hm", 100.0),
    GIGAMETRE(17, "Gm", 1e9),
    ASTRONOMICAL_UNIT(18, "au", 149_597_870_700.0),
    LIGHT_YEAR(19, "ly", 9_460_730_472_580_800.0),
    PARSEC(20, "pc", 3.085677581491367e16),
    US_SURVEY_FOOT(21, "us-ft", 1200.0 / 3937.0),
    US_SURVEY_INCH(22, "us-in", 100.0 / 3937.0),
    US_SURVEY_YARD(23, "us-yd", 3600.0 / 3937.0),
    US_SURVEY_MILE(24, "us-mi", 6336000.0 / 3937.0);

    private final int insunits;
    private final String symbol;
    private final double metres;

    LengthUnit(int insunits, String symbol, double metres) {
        this.insunits = insunits;
        this.symbol = symbol;
        this.metres = metres;
    }

    public int insunits() {
        return insunits;
    }

    public String symbol() {
        return symbol;
    }

    /** Metres per drawing unit (1 for UNITLESS, which must be resolved before use). */
    public double metres() {
        return metres;
    }

    public static Optional<LengthUnit> fromInsunits(int code) {
        for (LengthUnit u : values()) {
            if (u.insunits == code) {
                return Optional.of(u);
            }
        }
        return Optional.empty();
    }

    /** Parses a symbol such as {@code mm}, {@code in}, {@code ft}, {@code m} (case-insensitive for most). */
    public static Optional<LengthUnit> fromSymbol(String text) {
        String s = text.trim();
        for (LengthUnit u : values()) {
            if (u.symbol.equals(s)) {
                return Optional.of(u);
            }
        }
        String l = s.toLowerCase(Locale.ROOT);
        return switch (l) {
            case "millimetre", "millimetres", "millimeter", "millimeters" -> Optional.of(MILLIMETRE);
            case "metre", "metres", "meter", "meters" -> Optional.of(METRE);
            case "centimetre", "centimetres", "centimeter", "centimeters" -> Optional.of(CENTIMETRE);
            case "inch", "inches", "\"" -> Optional.of(INCH);
            case "foot", "feet", "'" -> Optional.of(FOOT);
            case "yard", "yards" -> Optional.of(YARD);
            default -> {
                for (LengthUnit u : values()) {
                    if (u.symbol.toLowerCase(Locale.ROOT).equals(l) && u != UNITLESS) {
                        yield Optional.of(u);
                    }
                }
                yield Optional.empty();
            }
        };
    }
}
