package org.linemass.engine.field;

/**
 * The integral of an expression over one piece.
 *
 * @param pieceId the piece id (as in the drawing result)
 * @param layer the piece's layer
 * @param lengthM the piece's length
 * @param value the integral (units of the expression times metres)
 * @param errorBound bound on the absolute error of {@code value}
 */
public record PieceValue(int pieceId, String layer, double lengthM, double value, double errorBound) {
}
