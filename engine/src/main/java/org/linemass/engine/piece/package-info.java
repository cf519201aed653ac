/**
 * The piece value the stages share: {@link org.linemass.engine.piece.Piece} (segments in order on
 * one layer, with its bends) and the {@link org.linemass.engine.piece.SectionLookup} the checks and
 * marks read. Below the piece stage ({@code pieces}) and its sub-stages, so they do not import each
 * other in a circle.
 */
package org.linemass.engine.piece;
