package org.linemass.engine.moments;

/**
 * A running sum of doubles with Neumaier's improved Kahan compensation, for the moment sums of the
 * engine and the totals the reports add up over many rows (thousands of drawings' masses and
 * lengths). Not thread-safe.
 */
public final class CompensatedSum {

    private double sum;
    private double compensation;

    /** Adds {@code x}; returns this sum. */
    public CompensatedSum add(double x) {
        double t = sum + x;
        if (Math.abs(sum) >= Math.abs(x)) {
            compensation += (sum - t) + x;
        } else {
            compensation += (x - t) + sum;
        }
        sum = t;
        return this;
    }

    /** The sum so far (0 when nothing was added). */
    public double value() {
        return sum + compensation;
    }
}
