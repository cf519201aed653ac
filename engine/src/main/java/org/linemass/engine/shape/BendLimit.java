package org.linemass.engine.shape;

/**
 * The smallest inside bend radius a piece's section is known to take, and on what basis: a section
 * table's own column, a published table (BS 8666:2005 Table 2 for reinforcing bar), or common practice
 * (wire and tube, labelled as such). {@code insideRadiusM} is null when no minimum is known; the basis
 * then says so, so that a piece with no tight bends is not read as checked. {@code diameterM} is the
 * section's outside diameter (metres, 0 when not round), which turns a centre-line radius into an
 * inside one.
 */
public record BendLimit(Double insideRadiusM, double diameterM, String basis) {

    public BendLimit {
        if (basis == null || basis.isEmpty()) {
            throw new IllegalArgumentException("a bend limit needs its basis, got " + basis);
        }
        if (!(diameterM >= 0) || !Double.isFinite(diameterM)) {
            throw new IllegalArgumentException("diameter must be 0 or positive, got " + diameterM + " m");
        }
        if (insideRadiusM != null && !(insideRadiusM > 0 && Double.isFinite(insideRadiusM))) {
            throw new IllegalArgumentException("minimum inside radius must be positive, got " + insideRadiusM + " m");
        }
    }

    /** No minimum known; {@code why} says for what. */
    public static BendLimit none(String why) {
        return new BendLimit(null, 0, why);
    }

    /** Whether a minimum is known. */
    public boolean known() {
        return insideRadiusM != null;
    }
}
