package org.linemass.engine.resolve;

/** Long arithmetic that sticks at {@link Long#MAX_VALUE} instead of overflowing (counts are non-negative). */
final class Saturating {

    private Saturating() {
    }

    static long add(long a, long b) {
        long r = a + b;
        return (r < 0 || r < a) ? Long.MAX_VALUE : r;
    }

    static long multiply(long a, long b) {
        if (a == 0 || b == 0) {
            return 0;
        }
        long hi = Math.multiplyHigh(a, b);
        long lo = a * b;
        return (hi != 0 || lo < 0) ? Long.MAX_VALUE : lo;
    }
}
