package org.linemass.engine.integrate;

import org.linemass.geometry.Vec3;

/**
 * A linear density in kg/m as a function of the world point (metres) and the arc length {@code s}
 * (metres from the start of the piece). Implementations may throw an unchecked exception when the
 * density cannot be evaluated at a point; the integrator lets it through.
 */
public interface LinearDensity {

    /** Density at {@code pointM}, {@code sM} metres along the piece. */
    double kgPerM(Vec3 pointM, double sM);

    /** Whether the density depends on {@code s} (then the integrator measures arc length). */
    boolean usesArcLength();

    /** The density 1 kg/m everywhere (length moments). */
    LinearDensity UNIT = new LinearDensity() {
        @Override
        public double kgPerM(Vec3 pointM, double sM) {
            return 1;
        }

        @Override
        public boolean usesArcLength() {
            return false;
        }
    };
}
