package org.linemass.reports;

import java.math.BigDecimal;
import java.math.MathContext;
import java.util.Locale;

/**
 * How quantities are shown to people: metric (m, mm, kg) or imperial (ft, in, lb). JSON always
 * stays in SI. Conversion factors are exact by definition (international yard and pound, 1959):
 * 1 in = 0.0254 m, 1 ft = 0.3048 m, 1 lb = 0.45359237 kg.
 */
public enum UnitSystem {
    /** Long lengths and coordinates in m, cut lengths and small sizes in mm, mass in kg. */
    METRIC("m", 1.0, 3, "mm", 0.001, 1, "kg", 1.0, 3),
    /** Long lengths and coordinates in ft, cut lengths and small sizes in in, mass in lb. */
    IMPERIAL("ft", 0.3048, 3, "in", 0.0254, 3, "lb", 0.45359237, 3);

    /** Share of a unit below which a value also gets a finer reading (chosen for readability, no source). */
    static final double SMALL = 0.1;
    /** Significant digits of a small mass. */
    static final int SMALL_DIGITS = 3;

    private final String longUnit;
    private final double longM;
    private final int longDecimals;
    private final String shortUnit;
    private final double shortM;
    private final int shortDecimals;
    private final String massUnit;
    private final double massKg;
    private final int massDecimals;

    UnitSystem(String longUnit, double longM, int longDecimals, String shortUnit, double shortM, int shortDecimals,
            String massUnit, double massKg, int massDecimals) {
        this.longUnit = longUnit;
        this.longM = longM;
        this.longDecimals = longDecimals;
        this.shortUnit = shortUnit;
        this.shortM = shortM;
        this.shortDecimals = shortDecimals;
        this.massUnit = massUnit;
        this.massKg = massKg;
        this.massDecimals = massDecimals;
    }

    /** Unit symbol for totals and coordinates (m or ft). */
    public String longUnit() {
        return longUnit;
    }

    /** Unit symbol for cut lengths and small sizes (mm or in). */
    public String shortUnit() {
        return shortUnit;
    }

    /** Unit symbol for mass (kg or lb). */
    public String massUnit() {
        return massUnit;
    }

    /** A length in metres as a number in the long unit (m or ft), unrounded, for typed spreadsheet cells. */
    public double inLongUnit(double metres) {
        return metres / longM;
    }

    /** A length in metres as a number in the short unit (mm or in), unrounded. */
    public double inShortUnit(double metres) {
        return metres / shortM;
    }

    /** A mass in kilograms as a number in the mass unit (kg or lb), unrounded. */
    public double inMassUnit(double kg) {
        return kg / massKg;
    }

    /** Decimals shown for long lengths and coordinates. */
    public int longDecimals() {
        return longDecimals;
    }

    /** Decimals shown for cut lengths. */
    public int shortDecimals() {
        return shortDecimals;
    }

    /** Decimals shown for masses. */
    public int massDecimals() {
        return massDecimals;
    }

    /** A length in metres shown in the long unit, fixed decimals; empty text for null. */
    public String longLength(Double metres) {
        return metres == null ? "" : fixed(metres / longM, longDecimals);
    }

    /** A length in metres shown in the long unit with {@code extra} more decimals than usual; empty text for null. */
    public String longLength(Double metres, int extra) {
        return metres == null ? "" : fixed(metres / longM, longDecimals + Math.max(0, extra));
    }

    /**
     * Extra decimals for coordinates of a drawing whose total wire length is {@code scaleM}: one
     * per factor of ten below one long unit, at most three, so a 6 mm clip's centre of gravity does
     * not read "x 0.000, y 0.000".
     */
    public int extraDecimalsFor(double scaleM) {
        double v = scaleM / longM;
        if (!(v > 0) || v >= 1 || !Double.isFinite(v)) {
            return 0;
        }
        return (int) Math.min(3, Math.ceil(-Math.log10(v)));
    }

    /** A length in metres shown in the short unit, fixed decimals; empty text for null. */
    public String shortLength(Double metres) {
        return metres == null ? "" : fixed(metres / shortM, shortDecimals);
    }

    /**
     * The size of a drawing defect (a gap, an overlap) in the short unit, with two more decimals
     * than a cut length: a 0.05 mm gap must not read as 0.0. Empty text for null.
     */
    public String defectSize(Double metres) {
        return metres == null ? "" : fixed(metres / shortM, shortDecimals + 2);
    }

    /**
     * A mass in kilograms shown in the mass unit: fixed decimals, or {@value #SMALL_DIGITS}
     * significant digits when below {@value #SMALL} of the unit, so a 2 g clip reads "0.00216" in
     * every table and report, never "0.002" in one and "0.00216" in another. Empty text for null.
     */
    public String mass(Double kg) {
        if (kg == null) {
            return "";
        }
        double v = kg / massKg;
        if (v == 0 || Math.abs(v) >= SMALL || !Double.isFinite(v)) {
            return fixed(v, massDecimals);
        }
        return new BigDecimal(v).round(new MathContext(SMALL_DIGITS)).toPlainString();
    }

    /**
     * Like {@link #longLength}, followed by the short unit in brackets when the value is below
     * {@value #SMALL} of the long unit, so a 6 mm clip reads "0.006 (6.3 mm)", not just "0.006".
     */
    public String longLengthReadable(Double metres) {
        if (metres == null) {
            return "";
        }
        String s = longLength(metres);
        double v = Math.abs(metres / longM);
        return v > 0 && v < SMALL ? s + " (" + shortLength(metres) + " " + shortUnit + ")" : s;
    }

    /** The same text as {@link #mass}: every mass is shown one way. */
    public String massReadable(Double kg) {
        return mass(kg);
    }

    /**
     * A number with a fixed count of decimals, Locale.ROOT, no grouping; "-0.000" shown as "0.000".
     * Every number of the console, CSV and HTML reports goes through here.
     *
     * @throws NonFiniteNumber for NaN and infinities: no report holds one
     */
    public static String fixed(double v, int decimals) {
        NonFiniteNumber.check(v, "text of a report");
        String s = String.format(Locale.ROOT, "%." + decimals + "f", v);
        if (s.startsWith("-") && s.chars().skip(1).allMatch(c -> c == '0' || c == '.')) {
            return s.substring(1);
        }
        return s;
    }
}
