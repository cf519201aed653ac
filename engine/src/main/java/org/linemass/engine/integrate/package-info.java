/**
 * Line integrals along exact curves with a known error: closed forms for straights and circular
 * arcs of constant density ({@link org.linemass.engine.integrate.StraightMoments},
 * {@link org.linemass.engine.integrate.ArcMoments}), our own adaptive Gauss-Kronrod (G10-K21)
 * vector integrator ({@link org.linemass.engine.integrate.AdaptiveGaussKronrod}) for everything
 * else, and the one-call entry point {@link org.linemass.engine.integrate.MomentIntegrator} that
 * picks between them. Every result carries a bound on the absolute error of its length or mass.
 */
package org.linemass.engine.integrate;
