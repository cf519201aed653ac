package org.linemass.app;

import java.util.Locale;
import java.util.Optional;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.linemass.drawing.LengthUnit;

/**
 * Reads a length with its unit, such as {@code 0.01mm}, {@code 2 mm}, {@code 0.1in},
 * {@code 1.5e-3 m}: a decimal number (dot as decimal separator, optional exponent), optional
 * spaces, and a unit symbol or name known to {@link LengthUnit#fromSymbol}. The unit is required,
 * so a length never silently takes the drawing's unit. Returns metres.
 */
public final class LengthParser {

    private static final Pattern FORM = Pattern.compile(
            "\\s*([+-]?(?:\\d+(?:\\.\\d*)?|\\.\\d+)(?:[eE][+-]?\\d+)?)\\s*([A-Za-z\"'][A-Za-z\"'-]*)?\\s*");

    private LengthParser() {
    }

    /** The length in metres; IllegalArgumentException naming the text when it is not a length. */
    public static double metres(String text) {
        Matcher m = FORM.matcher(text == null ? "" : text);
        if (!m.matches()) {
            throw new IllegalArgumentException("'" + text + "' is not a length (examples: 0.01mm, 2 mm, 0.1in)");
        }
        if (m.group(2) == null) {
            throw new IllegalArgumentException("'" + text.trim() + "' has no unit (write e.g. "
                    + text.trim() + "mm or " + text.trim() + "in)");
        }
        Optional<LengthUnit> unit = LengthUnit.fromSymbol(m.group(2));
        if (unit.isEmpty() || unit.get() == LengthUnit.UNITLESS) {
            throw new IllegalArgumentException("'" + m.group(2) + "' in '" + text.trim()
                    + "' is not a length unit (use mm, cm, m, in, ft, ...)");
        }
        double v = Double.parseDouble(m.group(1)) * unit.get().metres();
        if (!Double.isFinite(v)) {
            throw new IllegalArgumentException("'" + text.trim() + "' is too large");
        }
        return v;
    }

    /** Like {@link #metres} but the length must be above zero. */
    public static double positiveMetres(String text) {
        double v = metres(text);
        if (!(v > 0)) {
            throw new IllegalArgumentException("'" + text.trim() + "' must be above zero");
        }
        return v;
    }

    /** Reads a drawing unit name for {@code --units}. */
    public static LengthUnit unit(String text) {
        Optional<LengthUnit> u = LengthUnit.fromSymbol(text == null ? "" : text);
        if (u.isEmpty() || u.get() == LengthUnit.UNITLESS) {
            throw new IllegalArgumentException("'" + text + "' is not a drawing unit (use one of mm, cm, m, in, ft, "
                    + "yd, um, dm, ...)");
        }
        return u.get();
    }

    static String describe(double metres) {
        return String.format(Locale.ROOT, "%.6g m", metres);
    }
}
