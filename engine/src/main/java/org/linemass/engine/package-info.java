/**
 * The engine: turns an imported drawing into world-frame segments in metres, integrates length,
 * mass, first and second moments with known error, joins segments into pieces, finds drawing
 * defects, groups identical pieces and assembles the result that reports print. The one-call
 * entry point is {@link org.linemass.engine.Analyzer}.
 */
package org.linemass.engine;
