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
    IMPERIAL("ft", 0.3048, 3, "in", 0.0254, 3, "lb", 0.45359237, 3),
    /**
     * As {@link #IMPERIAL}, with the cut lengths of the bill of materials in feet, inches and
     * sixteenths ({@code 4' 11-1/4"}), as a shop tape reads; everything else as {@link #IMPERIAL}.
     */
    IMPERIAL_FEET_INCHES("ft", 0.3048, 3, "in", 0.0254, 3, "lb", 0.45359237, 3);

    /** Parts of an inch the feet-and-inches lengths are rounded to (1/16 in, 1.5875 mm; common shop practice). */
    static final int INCH_PARTS = 16;

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

    /** Whether lengths are in feet and inches and masses in pounds. */
    public boolean isImperial() {
        return this != METRIC;
    }

    /** A cut length of the bill of materials: {@link #shortLength}, or feet, inches and sixteenths. */
    public String cutLength(Double metres) {
        return this == IMPERIAL_FEET_INCHES && metres != null ? feetInches(metres) : shortLength(metres);
    }

    /** The unit named in the header of {@link #cutLength} columns: mm, in, or ft-in. */
    public String cutUnit() {
        return this == IMPERIAL_FEET_INCHES ? "ft-in" : shortUnit;
    }

    /**
     * A length as feet, inches and a fraction of an inch reduced to lowest terms, rounded to the
     * nearest 1/{@value #INCH_PARTS} in: {@code 4' 11-1/4"}, {@code 1' 0"}, {@code 5/16"}.
     */
    public static String feetInches(double metres) {
        NonFiniteNumber.check(metres, "text of a report");
        long parts = Math.round(Math.abs(metres) / 0.0254 * INCH_PARTS);
        long perFoot = 12L * INCH_PARTS;
        long feet = parts / perFoot;
        long inches = parts % perFoot / INCH_PARTS;
        long num = parts % INCH_PARTS;
        long den = INCH_PARTS;
        while (num > 0 && num % 2 == 0) {
            num /= 2;
            den /= 2;
        }
        // whole inches are written after feet even when zero (1' 0-1/2"); alone, a fraction stands by itself
        boolean whole = feet > 0 || inches > 0 || num == 0;
        String inch = (whole ? Long.toString(inches) : "") + (num > 0 ? (whole ? "-" : "") + num + "/" + den : "")
                + "\"";
        return (metres < 0 && parts > 0 ? "-" : "") + (feet > 0 ? feet + "' " + inch : inch);
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

    /**
     * The decimals {@link #mass} shows {@code kg} with: the fixed count, or as many as its
     * {@value #SMALL_DIGITS} significant digits need for a small mass (0.00216 has five), so a
     * spreadsheet cell formatted with them reads as the console does.
     */
    public int massDecimals(Double kg) {
        double v = kg == null ? 0 : Math.abs(kg / massKg);
        if (v == 0 || v >= SMALL || !Double.isFinite(v)) {
            return massDecimals;
        }
        return SMALL_DIGITS - 1 - (int) Math.floor(Math.log10(v));
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

    /** A metric quantity in an engine message: a number, one space, and mm, m, kg/m or kg as a whole word. */
    private static final java.util.regex.Pattern METRIC_QUANTITY =
            java.util.regex.Pattern.compile("(?<![\\w.])(-?[0-9]+(?:\\.([0-9]+))?) (mm|m|kg/m|kg)(?![\\w/])");

    /**
     * An engine message (written in millimetres, metres and kilograms) in this unit system: for
     * imperial every "210.000 mm", "3.900 m", "0.0207 kg" and "0.395 kg/m" becomes inches, feet,
     * pounds and pounds per foot (one more decimal for inches than the millimetres had, so 1.000 mm
     * reads 0.0394 in; masses as {@link #mass} shows them). Metric messages are returned unchanged;
     * angles, counts and line numbers are left alone (they carry no length unit after them).
     */
    public String message(String text) {
        if (this == METRIC || text == null) {
            return text;
        }
        java.util.regex.Matcher m = METRIC_QUANTITY.matcher(text);
        StringBuilder out = new StringBuilder(text.length() + 16);
        while (m.find()) {
            double v = Double.parseDouble(m.group(1));
            int decimals = m.group(2) == null ? 0 : m.group(2).length();
            String shown;
            switch (m.group(3)) {
                case "mm" -> shown = fixed(v * 0.001 / shortM, Math.min(6, decimals + 1)) + " " + shortUnit;
                case "m" -> shown = fixed(v / longM, Math.max(decimals, longDecimals)) + " " + longUnit;
                case "kg" -> shown = mass(v) + " " + massUnit;
                default -> shown = fixed(v * longM / massKg, Math.max(decimals, 3)) + " " + massUnit + "/" + longUnit;
            }
            m.appendReplacement(out, java.util.regex.Matcher.quoteReplacement(shown));
        }
        m.appendTail(out);
        return out.toString();
    }
}
