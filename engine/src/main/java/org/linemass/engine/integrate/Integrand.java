package org.linemass.engine.integrate;

/**
 * A vector-valued function of the curve parameter for {@link AdaptiveGaussKronrod}. The current
 * sub-interval [a, b] is passed with every evaluation so that the integrand may work about a
 * local reference point (e.g. the curve point at the middle of the sub-interval) and avoid
 * cancellation. Component 0 is the one whose relative accuracy the integrator controls and whose
 * error bound it reports (the length or mass).
 */
public interface Integrand {

    /** Number of components. */
    int dimension();

    /** Writes the integrand at parameter {@code t} of sub-interval [a, b] into {@code out}. */
    void evaluate(double a, double b, double t, double[] out);

    /**
     * The size of the error of one sub-interval, in units of component 0, from the componentwise
     * differences {@code kronrodMinusGauss}. The default looks at component 0 only.
     */
    default double errorNorm(double[] kronrodMinusGauss) {
        return Math.abs(kronrodMinusGauss[0]);
    }
}
