package org.linemass.plan.stock;

/**
 * One stock length a section is bought in, in metres, and how many bars of it are to be had
 * ({@code available} null when unlimited).
 */
public record StockLength(double lengthM, Integer available) {

    public StockLength {
        if (!(lengthM > 0) || !Double.isFinite(lengthM)) {
            throw new IllegalArgumentException("stock length must be positive, got " + lengthM + " m");
        }
        if (available != null && available < 0) {
            throw new IllegalArgumentException("stock count must not be negative, got " + available);
        }
    }
}
