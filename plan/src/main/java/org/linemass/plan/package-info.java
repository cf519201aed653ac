/**
 * From a bill of materials to an order: {@link org.linemass.plan.JobPlanner} groups the marks of
 * one or more drawings by section, looks up each section's stock and cuts the pieces from it.
 * Stock tables live in {@code .stock}, the one-dimensional cutting-stock optimiser in
 * {@code .cutting}. Lengths are metres, masses kilograms.
 */
package org.linemass.plan;
