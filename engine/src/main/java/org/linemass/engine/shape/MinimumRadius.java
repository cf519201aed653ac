package org.linemass.engine.shape;

import java.util.OptionalDouble;
import org.linemass.tolerance.Tolerances;

/**
 * BS 8666:2005 Table 2, minimum scheduling radius r (inside radius, mm) by nominal bar size d (mm):
 * 6: 12, 8: 16, 10: 20, 12: 24, 16: 32, 20: 70, 25: 87, 32: 112, 40: 140, 50: 175. Source: the table
 * as reproduced on a reinforcement supplier's page (tunleyrod.co.uk, "Steel Reinforcement For Concrete
 * - BS 8666:2005"), verified in the team's reference sheet; the pattern is half the EN 1992-1-1 Table
 * 8.1N mandrel (4d up to 16 mm, 7d above), with 25 mm rounded down to 87.
 */
public final class MinimumRadius {

    private static final int[] SIZES = {6, 8, 10, 12, 16, 20, 25, 32, 40, 50};
    private static final int[] RADII = {12, 16, 20, 24, 32, 70, 87, 112, 140, 175};

    private MinimumRadius() {
    }

    /** The minimum scheduling radius in metres for a bar of {@code diameterM}, if it is a Table 2 size. */
    public static OptionalDouble forDiameterM(double diameterM) {
        for (int i = 0; i < SIZES.length; i++) {
            // sizes are whole millimetres; a section given in metres may carry rounding
            if (Math.abs(diameterM * 1000 - SIZES[i]) < Tolerances.BAR_SIZE_MATCH_MM) {
                return OptionalDouble.of(RADII[i] / 1000.0);
            }
        }
        return OptionalDouble.empty();
    }
}
