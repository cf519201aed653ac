package org.linemass.engine.field;

/**
 * The integral of an expression over every piece of one layer.
 *
 * @param layer the layer
 * @param pieces number of pieces
 * @param lengthM total length of those pieces
 * @param value the integral (units of the expression times metres)
 * @param errorBound bound on the absolute error of {@code value}
 */
public record LayerValue(String layer, int pieces, double lengthM, double value, double errorBound) {
}
