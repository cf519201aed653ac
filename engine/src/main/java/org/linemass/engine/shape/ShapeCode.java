package org.linemass.engine.shape;

/**
 * The BS 8666:2005 shape codes this tool recognises, each with the standard's length formula (BS 8666:2005
 * Table 3, as reproduced on reinforcement suppliers' shape-code pages: midlandsteelreinforcement.co.uk,
 * valbruna.co.uk, obconstruction.co.uk; 11 and 12 also in the team's reference sheet). In the formulas
 * r is the standard (Table 2) radius, R a larger radius, d the bar size; bracketed dimensions are the
 * free ones. {@code OTHER} is 99, "all other shapes", and {@code ISOMETRIC} 98, a shape in three
 * dimensions that needs an isometric sketch.
 */
public enum ShapeCode {
    /** Straight. L = A. */
    S00("00", "A"),
    /** One 90 degree bend of standard radius. L = A + (B) - 0.5r - d. */
    S11("11", "A + (B) - 0.5r - d"),
    /** One 90 degree bend of a larger radius R. L = A + (B) - 0.43R - 1.2d. */
    S12("12", "A + (B) - 0.43R - 1.2d"),
    /** One 180 degree bend. L = A + 0.57B + (C) - 1.6d. */
    S13("13", "A + 0.57B + (C) - 1.6d"),
    /** One bend of another angle. L = A + (C). */
    S15("15", "A + (C)"),
    /** Two 90 degree bends turning the same way (a channel). L = A + B + (C) - r - 2d. */
    S21("21", "A + B + (C) - r - 2d"),
    /** Two 90 degree bends then a 180 degree bend, all the same way. L = A + B + C + (D) - 1.5r - 3d. */
    S22("22", "A + B + C + (D) - 1.5r - 3d"),
    /** Two 90 degree bends turning opposite ways (a joggle). L = A + B + (C) - r - 2d. */
    S23("23", "A + B + (C) - r - 2d"),
    /** Two bends of another angle turning opposite ways (a crank). L = A + B + (C). */
    S26("26", "A + B + (C)"),
    /** Three 90 degree bends turning the same way. L = A + B + C + (D) - 1.5r - 3d. */
    S31("31", "A + B + C + (D) - 1.5r - 3d"),
    /** A bar curved to one radius, no straight. L = A. */
    S67("67", "A"),
    /** A helix. L = C pi (A - d), A the outside diameter, C the number of turns. */
    S77("77", "C pi (A - d)"),
    /** A shape in three dimensions: an isometric sketch is needed. */
    ISOMETRIC("98", "sketch"),
    /** Any other shape: a dimensioned sketch is needed. */
    OTHER("99", "sketch");

    private final String code;
    private final String formula;

    ShapeCode(String code, String formula) {
        this.code = code;
        this.formula = formula;
    }

    /** The two-digit code. */
    public String code() {
        return code;
    }

    /** The standard's length formula as text. */
    public String formula() {
        return formula;
    }
}
