/**
 * From a pile of world segments to pieces and findings: joining ends within the join tolerance,
 * removing material drawn twice, bends, drawing checks (gaps, duplicates, overlaps, T-junctions,
 * crossings, tiny segments, tight bends) and grouping identical pieces into marks.
 * The entry point is {@link org.linemass.engine.pieces.PieceAnalyzer}.
 */
package org.linemass.engine.pieces;
