/**
 * The engine's front door: {@link org.linemass.engine.Analyzer} turns an imported drawing into
 * world-frame segments in metres, integrates length, mass, first and second moments with known
 * error, joins segments into pieces, finds drawing defects, groups identical pieces and assembles
 * the {@link org.linemass.engine.result.DrawingResult} that reports print. Nothing inside the
 * engine imports this package; the shared types live in {@code settings}, {@code error},
 * {@code piece} and {@code result}.
 */
package org.linemass.engine;
