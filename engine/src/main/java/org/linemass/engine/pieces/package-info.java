/**
 * From a pile of world segments to pieces and findings: joining ends within the join tolerance,
 * removing material drawn twice, bends, drawing checks (gaps, duplicates, overlaps, T-junctions,
 * crossings, tiny segments, tight bends) and grouping identical pieces into marks.
 * The entry point is {@link org.linemass.engine.pieces.PieceAnalyzer}; the stages live in
 * {@code .dedup} (material drawn twice), {@code .join} (end matching and runs), {@code .checks}
 * (findings and bends), {@code .marks} (identical pieces) and {@code .geom} (curve helpers and
 * spatial indexes; the only place JTS is used).
 */
package org.linemass.engine.pieces;
