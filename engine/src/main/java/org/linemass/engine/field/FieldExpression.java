package org.linemass.engine.field;

import java.util.Locale;
import java.util.Set;
import net.objecthunter.exp4j.Expression;
import net.objecthunter.exp4j.ExpressionBuilder;
import org.linemass.engine.error.AnalysisException;
import org.linemass.geometry.Vec3;

/**
 * A parsed expression in {@code x}, {@code y}, {@code z} (world metres) and {@code s} (metres along
 * the piece from its start), with the functions and operators of exp4j ({@code sin}, {@code exp},
 * {@code sqrt}, {@code ^}, ...). Evaluation fails with a {@link FieldException} naming the layer and
 * the point when it divides by zero or gives NaN or infinity, and, for densities, when it is
 * negative. Each instance holds one exp4j expression, which is mutable: not thread-safe (use
 * {@link #copy()} per thread).
 */
public final class FieldExpression {

    private static final String[] VARIABLES = {"x", "y", "z", "s"};

    private final String text;
    private final String layer;
    private final boolean density;
    private final Expression expression;

    private FieldExpression(String text, String layer, boolean density, Expression expression) {
        this.text = text;
        this.layer = layer;
        this.density = density;
        this.expression = expression;
    }

    /**
     * Parses {@code text}.
     *
     * @param layer the layer (or pattern) it belongs to, for messages; empty when it applies to every layer
     * @param density whether values are linear densities (then negative values are errors)
     * @throws AnalysisException when it does not parse or uses unknown variables
     */
    public static FieldExpression parse(String text, String layer, boolean density) throws AnalysisException {
        try {
            Expression e = new ExpressionBuilder(text).variables(VARIABLES).build();
            for (String v : VARIABLES) {
                e.setVariable(v, 0);
            }
            var check = e.validate(true);
            if (!check.isValid()) {
                throw new AnalysisException(what(density, layer) + " '" + text + "' is not valid: "
                        + String.join("; ", check.getErrors()));
            }
            return new FieldExpression(text, layer, density, e);
        } catch (IllegalArgumentException | java.util.EmptyStackException e) {
            throw new AnalysisException(what(density, layer) + " '" + text + "' does not parse: " + e.getMessage());
        }
    }

    private static String what(boolean density, String layer) {
        if (layer == null || layer.isEmpty()) {
            return density ? "density expression" : "expression";
        }
        return (density ? "density expression for layer " : "expression for layer ") + layer;
    }

    /** An independent copy for use on another thread. */
    public FieldExpression copy() {
        return new FieldExpression(text, layer, density, new Expression(expression));
    }

    public String text() {
        return text;
    }

    /** Whether the expression uses {@code s}. */
    public boolean usesArcLength() {
        Set<String> names = expression.getVariableNames();
        return names.contains("s");
    }

    /** The value at world point {@code p} (metres), {@code s} metres along the piece. */
    public double at(Vec3 p, double s) {
        double v;
        try {
            v = expression.setVariable("x", p.x()).setVariable("y", p.y()).setVariable("z", p.z())
                    .setVariable("s", s).evaluate();
        } catch (ArithmeticException e) {
            throw new FieldException(what(density, layer) + " '" + text + "' divides by zero at " + place(p, s));
        }
        if (!Double.isFinite(v)) {
            throw new FieldException(what(density, layer) + " '" + text + "' is " + v + " at " + place(p, s));
        }
        if (density && v < 0) {
            throw new FieldException(what(density, layer) + " '" + text + "' is negative (" + v + " kg/m) at "
                    + place(p, s));
        }
        return v;
    }

    private static String place(Vec3 p, double s) {
        return String.format(Locale.ROOT, "x=%.6g m, y=%.6g m, z=%.6g m, s=%.6g m", p.x(), p.y(), p.z(), s);
    }
}
