package org.linemass.engine.shape;

import java.util.Optional;
import org.linemass.tolerance.Tolerances;

/**
 * ACI 318-19 minimum inside bend radii for US reinforcing bar (ASTM A615 sizes #3 to #18), half the
 * minimum inside bend diameters: standard hooks on deformed bars in tension, Table 25.3.1, 6 d_b for
 * #3-#8, 8 d_b for #9-#11, 10 d_b for #14 and #18 (team reference sheet 6.1, verified; the 8 d_b read
 * from context of a partly garbled copy); stirrups, ties and hoops, Table 25.3.2, 4 d_b for #5 and
 * smaller (verified) and 6 d_b for #6-#8 (from memory). A bar is a US size when its diameter is an
 * ASTM A615 Table 1 nominal diameter (reference sheet 1.2, verified) to {@link
 * Tolerances#BAR_SIZE_MATCH_MM} after conversion at 25.4 mm per inch. ACI 315's bar types and hook
 * dimensions are not covered.
 */
public final class AciRadius {

    /**
     * One US bar size: its number, nominal diameter and the two minimum inside radii (metres; the
     * stirrup radius null where Table 25.3.2 lists none), and whether the stirrup radius is from memory.
     */
    public record Bar(String number, double diameterM, double hookRadiusM, Double stirrupRadiusM,
            boolean stirrupFromMemory) {
    }

    private static final String[] NUMBERS = {"#3", "#4", "#5", "#6", "#7", "#8", "#9", "#10", "#11", "#14", "#18"};
    private static final double[] DIAMETERS_IN = {0.375, 0.500, 0.625, 0.750, 0.875, 1.000, 1.128, 1.270, 1.410,
        1.693, 2.257};
    /** Minimum inside bend diameter of a standard hook, in bar diameters (Table 25.3.1). */
    private static final double[] HOOK_DB = {6, 6, 6, 6, 6, 6, 8, 8, 8, 10, 10};
    /** Minimum inside bend diameter of a stirrup or tie, in bar diameters (Table 25.3.2; 0: not listed). */
    private static final double[] STIRRUP_DB = {4, 4, 4, 6, 6, 6, 0, 0, 0, 0, 0};
    private static final double INCH_M = 0.0254;

    private AciRadius() {
    }

    /** The US bar of diameter {@code diameterM}, if it is one. */
    public static Optional<Bar> forDiameterM(double diameterM) {
        for (int i = 0; i < NUMBERS.length; i++) {
            double d = DIAMETERS_IN[i] * INCH_M;
            if (Math.abs(diameterM - d) * 1000 < Tolerances.BAR_SIZE_MATCH_MM) {
                return Optional.of(new Bar(NUMBERS[i], d, HOOK_DB[i] * d / 2,
                        STIRRUP_DB[i] > 0 ? STIRRUP_DB[i] * d / 2 : null, STIRRUP_DB[i] == 6));
            }
        }
        return Optional.empty();
    }
}
