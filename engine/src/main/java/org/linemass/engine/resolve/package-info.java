/**
 * From an imported drawing (drawing units, blocks not expanded) to world metres: unit conversion,
 * layer filters, layer-0 inheritance through inserts, MINSERT arrays, nesting to any depth
 * (iteratively), per-layer moments by instancing (each block integrated once and transformed per
 * rigid insert), entity counts after expansion, and a bounded list of expanded world segments for
 * joining and checks. The entry point is {@link org.linemass.engine.resolve.Resolver}.
 */
package org.linemass.engine.resolve;
