/**
 * The moment algebra: {@link org.linemass.engine.moments.Moments} (mass, centroid, central second
 * moment, error bound) with combination by the parallel-axis rule and transformation by a
 * similarity, and the symmetric tensor type it uses.
 */
package org.linemass.engine.moments;
