package org.linemass.engine.result;

/** The finding kinds the engine reports; the strings are the stable JSON values. */
public final class FindingKind {

    public static final String GAP = "gap";
    public static final String JOINED_ACROSS_GAP = "joined_across_gap";
    public static final String DUPLICATE = "duplicate";
    public static final String OVERLAP = "overlap";
    public static final String T_JUNCTION = "t_junction";
    public static final String CROSSING = "crossing";
    public static final String BRANCH = "branch";
    /** A piece joined end to end across layers by a layer join (info: which layers, which one it is on). */
    public static final String JOINED_ACROSS_LAYERS = "joined_across_layers";
    public static final String ZERO_LENGTH = "zero_length";
    public static final String TINY_SEGMENT = "tiny_segment";
    public static final String SELF_CROSSING = "self_crossing";
    public static final String TIGHT_BEND = "tight_bend";
    public static final String SHARP_CORNER = "sharp_corner";
    public static final String NO_SECTION = "no_section";
    public static final String UNITS_ASSUMED = "units_assumed";
    public static final String SKIPPED_ENTITY = "skipped_entity";
    public static final String IGNORED_ENTITY = "ignored_entity";
    /** A spline without knots read with the clamped uniform knot vector (a warning; the curve is used). */
    public static final String KNOTS_ASSUMED = "knots_assumed";
    /** Paper-space entities read into model space on request (a warning: sheet scale may differ). */
    public static final String PAPER_SPACE_READ = "paper_space_read";
    public static final String LIMIT_REACHED = "limit_reached";
    /** A layer filter, section assignment or density rule that matches no layer of the drawing (a warning). */
    public static final String UNMATCHED_RULE = "unmatched_rule";

    /**
     * An entity or small cluster of them far from the rest of the model (a warning with the distance;
     * still weighed and joined like the rest).
     */
    public static final String REMOTE_ENTITY = "remote_entity";

    /**
     * A layer whose moments exceed the range of double numbers (an error: implausible units,
     * coordinates or section data); the layer is left out of the totals.
     */
    public static final String OVERFLOW = "overflow";

    private FindingKind() {
    }
}
