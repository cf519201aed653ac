package org.linemass.engine.field;

import org.linemass.engine.integrate.LinearDensity;
import org.linemass.geometry.Vec3;

/**
 * A {@link LinearDensity} given by a density expression (kg/m); negative, NaN or infinite values and
 * division by zero throw {@link FieldException}. Not thread-safe (holds a mutable expression).
 */
public final class FieldDensity implements LinearDensity {

    private final FieldExpression expression;

    public FieldDensity(FieldExpression expression) {
        this.expression = expression;
    }

    @Override
    public double kgPerM(Vec3 pointM, double sM) {
        return expression.at(pointM, sM);
    }

    @Override
    public boolean usesArcLength() {
        return expression.usesArcLength();
    }
}
