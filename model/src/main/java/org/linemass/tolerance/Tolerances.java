package org.linemass.tolerance;

/**
 * Every tolerance linemass uses, in one place, with its unit in the name or the doc.
 *
 * <p>The record holds the tolerances of one analysis: built once per drawing from the user's
 * settings ({@code AnalysisSettings.tolerances} in the engine), then passed whole to each stage, the
 * integration target included. No tolerance depends on the drawing's extent: one stray entity far
 * away must not change how the rest is joined or checked. Rounding noise is judged where it
 * arises, from the magnitude of the coordinates there ({@link #noiseAt}). The static constants below are
 * the fixed numerical tolerances of the algorithms (rounding models, series switch points,
 * similarity tests); they do not depend on the drawing and cannot be set by the user, but they
 * live here so that one file lists every tolerance there is.
 *
 * <p>Invariants checked by the constructor: every value positive and finite, and
 * {@code gapLimitM >= joinM} (a gap is an opening wider than the join tolerance, so a gap limit
 * below it would make every gap a join). This is the only place that rule is checked.
 *
 * @param joinM segment ends closer than this join (metres)
 * @param gapLimitM ends farther apart than {@code joinM} but within this are reported as gaps (metres)
 * @param noiseFloorM distances at or below this are numerical noise, not drafting, wherever they are
 *        (metres); far from the origin the noise is larger, see {@link #noiseAt}
 * @param groupM largest point deviation for two pieces to count as identical (metres)
 * @param integrationRelative target relative error of every integral (dimensionless)
 * @param angleRad angles below this are "straight on" for bends and collinearity (radians)
 */
public record Tolerances(double joinM, double gapLimitM, double noiseFloorM, double groupM,
        double integrationRelative, double angleRad) {

    public Tolerances {
        requirePositive("join tolerance", joinM);
        requirePositive("gap limit", gapLimitM);
        requirePositive("noise", noiseFloorM);
        requirePositive("group tolerance", groupM);
        requirePositive("integration tolerance", integrationRelative);
        requirePositive("angle tolerance", angleRad);
        requireGapCoversJoin(gapLimitM, joinM);
    }

    /**
     * Checks a user-given tolerance.
     *
     * @throws IllegalArgumentException naming {@code what} when {@code v} is not positive and finite
     */
    public static void requirePositive(String what, double v) {
        if (!(v > 0) || !Double.isFinite(v)) {
            throw new IllegalArgumentException(what + " must be positive and finite, got " + v);
        }
    }

    /**
     * The rule between the two end tolerances: the gap limit is at least the join tolerance.
     *
     * @throws IllegalArgumentException with both values (metres) when {@code gapLimitM < joinM}
     */
    public static void requireGapCoversJoin(double gapLimitM, double joinM) {
        if (gapLimitM < joinM) {
            throw new IllegalArgumentException("gap limit " + millimetres(gapLimitM) + " is below the join tolerance "
                    + millimetres(joinM));
        }
    }

    /** A length for messages in millimetres, the unit these tolerances are typed in: "0.01 mm", not "1.0E-5 m". */
    static String millimetres(double metres) {
        if (!Double.isFinite(metres)) {
            return metres + " m";
        }
        return new java.math.BigDecimal(metres * 1000).round(new java.math.MathContext(6)).stripTrailingZeros()
                .toPlainString() + " mm";
    }

    /** Default relative integration error target (dimensionless). */
    public static final double DEFAULT_INTEGRATION_RELATIVE = 1e-10;

    /** Default join tolerance: 0.01 mm, a tenth of a typical drafting precision (common practice, no source). */
    public static final double DEFAULT_JOIN_M = 1e-5;

    /** Default gap limit: 5 mm (common practice, no source: larger openings are usually deliberate). */
    public static final double DEFAULT_GAP_LIMIT_M = 5e-3;

    /** Default group tolerance: 0.1 mm (common practice, no source: well inside a bar's cutting tolerance). */
    public static final double DEFAULT_GROUP_M = 1e-4;

    /**
     * Noise floor (metres): 10 nm, a thousandth of the default join tolerance, and above the rounding
     * of coordinates written with six decimals of a millimetre (0.5 nm each). Common practice, no source.
     */
    public static final double NOISE_FLOOR_M = 1e-8;

    /**
     * Rounding noise of a coordinate, in units in the last place of its magnitude (dimensionless):
     * a point read, transformed through a few nested inserts and measured against another rounds by a
     * few ulps each step; 64 leaves room for that. Common practice, no source.
     */
    public static final double NOISE_ULPS = 64;

    /**
     * The defaults: join 0.01 mm, gap limit 5 mm, group 0.1 mm, noise floor {@link #NOISE_FLOOR_M},
     * integration {@link #DEFAULT_INTEGRATION_RELATIVE}, angle 0.01 degree. The same for every drawing,
     * whatever its extent.
     */
    public static Tolerances defaults() {
        return new Tolerances(DEFAULT_JOIN_M, DEFAULT_GAP_LIMIT_M, NOISE_FLOOR_M, DEFAULT_GROUP_M,
                DEFAULT_INTEGRATION_RELATIVE, Math.toRadians(0.01));
    }

    /**
     * Rounding noise at a place whose coordinates are at most {@code magnitudeM} in absolute value
     * (metres, the largest of |x|, |y|, |z| of the points involved, {@code Vec3.maxAbs}): the noise floor, or
     * {@link #NOISE_ULPS} units in the last place of the magnitude where that is larger (beyond about
     * 700 km from the origin). Distances at or below it are rounding, not drafting. A non-finite
     * magnitude gives an infinite noise.
     */
    public double noiseAt(double magnitudeM) {
        double m = Math.abs(magnitudeM);
        if (!Double.isFinite(m)) {
            return Double.POSITIVE_INFINITY;
        }
        return Math.max(noiseFloorM, NOISE_ULPS * Math.ulp(m));
    }

    public Tolerances withJoin(double m) {
        return new Tolerances(m, Math.max(gapLimitM, m), noiseFloorM, Math.max(groupM, m), integrationRelative,
                angleRad);
    }

    public Tolerances withGapLimit(double m) {
        return new Tolerances(joinM, m, noiseFloorM, groupM, integrationRelative, angleRad);
    }

    public Tolerances withGroup(double m) {
        return new Tolerances(joinM, gapLimitM, noiseFloorM, m, integrationRelative, angleRad);
    }

    public Tolerances withIntegrationRelative(double r) {
        return new Tolerances(joinM, gapLimitM, noiseFloorM, groupM, r, angleRad);
    }

    // ---- far entities (engine.pieces.checks.RemoteCheck; fixed, not user-set) ----

    /**
     * An entity is remote when the opening between it and the main body exceeds this many times the
     * body's size (dimensionless). Common practice, no source: a detail or a second view drawn beside
     * a part sits within a few times its size; a thousand times is a slip.
     */
    public static final double REMOTE_GAP_FACTOR = 1000;

    /**
     * The main body's size counts as at least this when it is smaller (metres), so that an opening
     * under a kilometre is never remote. Common practice, no source.
     */
    public static final double REMOTE_MIN_SIZE_M = 1.0;

    // ---- fixed numerical tolerances of the algorithms (not drawing-dependent, not user-set) ----

    /**
     * Relative slack on an arc's or ellipse's parameter span above a full turn (dimensionless):
     * a span up to {@code 2 pi (1 + this)} is accepted, since a full turn computed from degrees
     * or from two angles rounds to a little above 2 pi.
     */
    public static final double FULL_TURN_SLACK = 1e-12;

    /**
     * Relative tolerance under which a mapped circle is still a circle (dimensionless): the images
     * of its two unit axes differ in length by at most this times the larger, and their dot product
     * is at most this times its square. Rounding of a rigid or uniform map stays far below.
     */
    public static final double CIRCLE_KEPT_RELATIVE = 1e-12;

    /** Relative tolerance for recognising a similarity (rotation, mirror, uniform scale) (dimensionless). */
    public static final double SIMILARITY_RELATIVE = 1e-12;

    /**
     * Relative error of lengths transformed by a map accepted as a similarity (dimensionless): its
     * squared column norms and products are within {@link #SIMILARITY_RELATIVE} of {@code s^2 I}, so
     * every direction is stretched by {@code s} to within about 1.5 times that; 3 times is charged.
     */
    public static final double SIMILARITY_SLACK = 3 * SIMILARITY_RELATIVE;

    /** Rounding added to the error bound of moments moved by a similarity, relative to the new mass. */
    public static final double TRANSFORM_ROUNDING = 4 * Math.ulp(1.0);

    /** Relative rounding slack of subtracting moments (64 units of double rounding). */
    public static final double REMOVAL_SLACK = 64 * Math.ulp(1.0);

    /** Rounding bound of the closed-form moments, in units of double rounding of the length. */
    public static final double CLOSED_FORM_ROUNDING_ULPS = 8;

    /** Units of double rounding charged per piece for the summation inside the adaptive rule. */
    public static final double QUADRATURE_ROUNDING_FACTOR = 50;

    /** Half-sweeps (radians) below which the circular-arc moment functions are summed as series. */
    public static final double ARC_SERIES_BELOW_RAD = 1.5;

    /**
     * Angles (radians) below which sin(a)/a is its three-term Taylor polynomial: the first left-out
     * term, a^6/5040, is then below 1e-27, far under double rounding.
     */
    public static final double SINC_SERIES_BELOW_RAD = 1e-4;

    /** A series is summed until a term is at most this fraction of the sum (dimensionless; below half an ulp). */
    public static final double SERIES_TERM_RELATIVE = 1e-17;

    /** A sampled speed below this fraction of a span's largest counts as nearly zero (dimensionless). */
    public static final double NEAR_ZERO_SPEED = 1e-3;

    /** Fraction of the parameter range used for a one-sided difference when a derivative vanishes. */
    public static final double TANGENT_STEP_FRACTION = 1e-6;

    /**
     * Components of a unit normal closer than this to the largest are tied (dimensionless): far
     * above the rounding of an SVD normal (about 1e-15), far below any tilt a drafter draws.
     */
    public static final double NORMAL_TIE = 1e-9;

    /**
     * Polyline bulges smaller than this are straight (dimensionless): the sagitta is then below
     * 1e-12 of the chord, under the rounding of the coordinates themselves, while the radius would
     * exceed 1e11 chords.
     */
    public static final double STRAIGHT_BULGE = 2e-12;

    /**
     * Relative allowance for rounding in the chord sum and the control polygon's length that
     * bracket a spline's length (dimensionless): a few hundred units of double rounding. Common
     * practice, no source.
     */
    public static final double LENGTH_BRACKET_ROUNDING = 1e-13;

    /**
     * Largest weight ratio within one span of a spline integrated on the spline as given
     * (dimensionless); spans with a larger ratio are integrated half by half on local copies with
     * graded cuts. Conic arcs written as splines have ratios up to a few; 16 leaves them alone. No
     * source: chosen to keep ordinary splines on the path they have always taken.
     */
    public static final double SPLIT_WEIGHT_RATIO = 16;

    /**
     * Relative accuracy of a strongly weighted spline's length in the drawing checks
     * (dimensionless): far below anything they compare. Common practice, no source.
     */
    public static final double CHECK_LENGTH_RELATIVE = 1e-9;

    /**
     * Relative slack (dimensionless) between a piece's length by the piece stage's fixed rule and by
     * the grouping's arc-length tables, when grouping decides from the first which pieces need the
     * second at all: both are accurate to far better (well below a micrometre on metres of drawn
     * curve). Common practice, no source.
     */
    public static final double GROUP_LENGTH_SCREEN_RELATIVE = 1e-5;

    // ---- bends, coils and schedule shapes (engine.bender, engine.shape; fixed, not user-set) ----

    /**
     * Bend angles within this of 90, 135 or 180 degrees count as those angles when a bar is given a
     * shape code (degrees). Common practice, no source: drawn angles are exact to far better, and a
     * shop's bender holds about half a degree.
     */
    public static final double SHAPE_ANGLE_DEG = 0.5;

    /**
     * Rotations of the bending plane within this of 0 or 180 degrees keep two bends in one plane for a
     * shape code (degrees): rounding of a drawn plane is far below; any deliberate tilt far above.
     */
    public static final double SHAPE_PLANE_DEG = 1e-6;

    /**
     * Slack when an inside radius is compared with a radius table in whole millimetres (metres): half a
     * millimetre, since BS 8666:2005 Table 2 prints whole millimetres (87 for 87.5 on 25 mm bars).
     */
    public static final double RADIUS_TABLE_SLACK_M = 5e-4;

    /** A section diameter is a table bar size when within this of it (millimetres; rounding of mm to m). */
    public static final double BAR_SIZE_MATCH_MM = 1e-6;

    /**
     * Legs a symmetric shape code takes as equal may differ by this before a note says so (metres): one
     * millimetre, the resolution of a schedule.
     */
    public static final double SHAPE_LEG_MATCH_M = 1e-3;

    /** A straight shorter than this is no straight at all in a shape (metres; rounding of zero-length feeds). */
    public static final double SHAPE_NO_STRAIGHT_M = 1e-12;

    /**
     * Bends within this of a half turn have parallel legs and no corner point, and signed plane rotations
     * within it of -180 degrees are written as +180 (radians, and degrees for the rotation): double
     * rounding of an angle is about 1e-16, so 1e-9 only catches rounding.
     */
    public static final double BEND_HALF_TURN_SLACK = 1e-9;

    /**
     * Cross products of two unit tangents shorter than this give no bend axis (dimensionless): the bend is
     * then a reversal whose plane is taken from the bend before it.
     */
    public static final double BEND_AXIS_MIN = 1e-12;

    /**
     * Parameter step, as a share of an element's parameter range, for a one-sided tangent at a spline
     * knot (dimensionless): the tangent's direction then moves by about 1e-9 of the element's turning.
     */
    public static final double BEND_TANGENT_STEP = 1e-9;

    /**
     * Sine of the angle between two sampled tangents below which their binormal is noise, not a change
     * of turning direction (dimensionless).
     */
    public static final double BEND_INFLECTION_NOISE = 1e-9;

    /** A curved run winding at least 1 minus this many turns is a coil (turns; rounding of a full turn). */
    public static final double COIL_TURN_SLACK = 1e-9;
}
