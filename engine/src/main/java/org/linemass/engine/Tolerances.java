package org.linemass.engine;

/**
 * Every tolerance the engine uses, in one place, with units in the names. Built once per drawing
 * from the user's settings and the drawing's extent, then passed to each stage.
 *
 * @param joinM segment ends closer than this join (metres)
 * @param gapLimitM ends farther apart than {@code joinM} but within this are reported as gaps (metres)
 * @param noiseM distances below this are numerical noise, not drafting (metres; about 1e-9 of the extent)
 * @param groupM largest point deviation for two pieces to count as identical (metres)
 * @param integrationRelative target relative error of every integral (dimensionless)
 * @param angleRad angles below this are "straight on" for bends and collinearity (radians)
 */
public record Tolerances(double joinM, double gapLimitM, double noiseM, double groupM,
        double integrationRelative, double angleRad) {

    public Tolerances {
        check("join tolerance", joinM);
        check("gap limit", gapLimitM);
        check("noise", noiseM);
        check("group tolerance", groupM);
        check("integration tolerance", integrationRelative);
        check("angle tolerance", angleRad);
        if (gapLimitM < joinM) {
            throw new IllegalArgumentException("gap limit " + gapLimitM + " m is below the join tolerance "
                    + joinM + " m");
        }
    }

    private static void check(String what, double v) {
        if (!(v > 0) || !Double.isFinite(v)) {
            throw new IllegalArgumentException(what + " must be positive and finite, got " + v);
        }
    }

    /** Default relative integration error target. */
    public static final double DEFAULT_INTEGRATION_RELATIVE = 1e-10;

    /** Default join tolerance: 0.01 mm, a tenth of a typical drafting precision (common practice, no source). */
    public static final double DEFAULT_JOIN_M = 1e-5;

    /** Default gap limit: 5 mm (common practice, no source: larger openings are usually deliberate). */
    public static final double DEFAULT_GAP_LIMIT_M = 5e-3;

    /**
     * Defaults for a drawing of the given extent (bounding-box diagonal, metres): the join tolerance
     * is 0.01 mm but never below 1e-9 of the extent; noise is 1e-9 of the extent.
     */
    public static Tolerances defaultsFor(double extentM) {
        double extent = extentM > 0 && Double.isFinite(extentM) ? extentM : 1.0;
        double noise = Math.max(1e-9 * extent, 1e-12);
        double join = Math.max(DEFAULT_JOIN_M, noise);
        return new Tolerances(join, Math.max(DEFAULT_GAP_LIMIT_M, join), noise, Math.max(join, 1e-4),
                DEFAULT_INTEGRATION_RELATIVE, Math.toRadians(0.01));
    }

    public Tolerances withJoin(double m) {
        return new Tolerances(m, Math.max(gapLimitM, m), noiseM, Math.max(groupM, m), integrationRelative, angleRad);
    }

    public Tolerances withGapLimit(double m) {
        return new Tolerances(joinM, m, noiseM, groupM, integrationRelative, angleRad);
    }

    public Tolerances withGroup(double m) {
        return new Tolerances(joinM, gapLimitM, noiseM, m, integrationRelative, angleRad);
    }

    public Tolerances withIntegrationRelative(double r) {
        return new Tolerances(joinM, gapLimitM, noiseM, groupM, r, angleRad);
    }
}
