package org.linemass.plan.revision;

/**
 * How close two pieces must be to be matched, in metres: {@code placeM} for their centroids (and
 * for the shared end of a piece changed in place), {@code shapeM} for their cut lengths and
 * principal radii of gyration.
 */
public record MatchTolerance(double placeM, double shapeM) {

    /** 1 mm for both: well below any move or change a revision means, above a drawing's rounding. */
    public static final MatchTolerance DEFAULT = new MatchTolerance(0.001, 0.001);

    public MatchTolerance {
        if (!(placeM > 0) || !Double.isFinite(placeM) || !(shapeM > 0) || !Double.isFinite(shapeM)) {
            throw new IllegalArgumentException("match tolerances must be positive and finite, got place " + placeM
                    + " m and shape " + shapeM + " m");
        }
    }
}
