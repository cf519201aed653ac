/**
 * Line integrals along exact curves with a known error: closed forms for straights and circular
 * arcs of constant density ({@link org.linemass.engine.integrate.StraightMoments},
 * {@link org.linemass.engine.integrate.ArcMoments}), a fixed 20-point Gauss-Legendre rule per spline
 * span or ellipse part with a proved a-priori bound (SpanQuadrature, FixedPieces) where that bound
 * meets the target, our own adaptive Gauss-Kronrod (G10-K21) vector integrator
 * ({@link org.linemass.engine.integrate.AdaptiveGaussKronrod}) for everything else, the one-call
 * entry point {@link org.linemass.engine.integrate.MomentIntegrator} that picks between them, and
 * fast speeds and fixed-rule lengths of parts of curves for the checks and marks
 * ({@link org.linemass.engine.integrate.CurveSpeed}). Every result carries a bound on the absolute error of its length or mass.
 */
package org.linemass.engine.integrate;
