package org.linemass.plan.cutting;

/**
 * How the optimiser works: lengths are counted in whole steps of {@code resolutionM} (pieces and
 * kerf rounded up, stock rounded down, so every pattern fits the real bar), and the whole solve of
 * one section gets {@code timeLimitMs} milliseconds of wall time.
 */
public record CutSettings(double resolutionM, long timeLimitMs) {

    /** 1 mm steps: a saw cut is placed no finer than that (common practice, no source); 10 s per section. */
    public static final CutSettings DEFAULT = new CutSettings(0.001, 10_000);

    public CutSettings {
        if (!(resolutionM > 0) || timeLimitMs < 1) {
            throw new IllegalArgumentException("resolution and time limit must be positive, got " + resolutionM
                    + " m and " + timeLimitMs + " ms");
        }
    }
}
