package org.linemass.engine.shape;

import java.util.Locale;

/**
 * Which standard's minimum bend radii the schedule checks a bar against. {@link #AUTO} follows the
 * bar size: BS 8666:2005 Table 2 for its sizes, ACI 318-19 ({@link AciRadius}) for ASTM A615 sizes.
 * {@link #BS8666} and {@link #ACI318} use only that standard; a bar size the chosen standard does not
 * list gets a note and no check. The shape codes and length formulas are BS 8666's in every case
 * (ACI 315 bar types are not covered).
 */
public enum BendStandard {
    AUTO, BS8666, ACI318;

    /** The standard named {@code text} ({@code auto}, {@code bs8666}, {@code aci318}, any case). */
    public static BendStandard parse(String text) {
        for (BendStandard s : values()) {
            if (s.name().equalsIgnoreCase(text.trim())) {
                return s;
            }
        }
        throw new IllegalArgumentException("unknown bend standard '" + text + "' (known: "
                + String.join(", ", java.util.Arrays.stream(values()).map(v -> v.name().toLowerCase(Locale.ROOT))
                        .toList()) + ")");
    }
}
