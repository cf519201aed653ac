package org.linemass.plan.cutting;

/** {@code quantity} pieces of mark {@code mark}, each {@code lengthM} metres long. */
public record Demand(String mark, double lengthM, int quantity) {

    public Demand {
        if (!(lengthM > 0) || !Double.isFinite(lengthM)) {
            throw new IllegalArgumentException("piece length must be positive, got " + lengthM + " m for " + mark);
        }
        if (quantity < 1) {
            throw new IllegalArgumentException("quantity must be at least 1, got " + quantity + " for " + mark);
        }
    }
}
