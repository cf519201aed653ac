package org.linemass.engine.shape;

/**
 * The BS 8666:2005 shape codes this tool recognises, each with the standard's length formula (BS 8666:2005
 * Table 3, as reproduced on reinforcement suppliers' shape-code pages: midlandsteelreinforcement.co.uk,
 * valbruna.co.uk, obconstruction.co.uk and a copy of the industry association's shape sheet; 11 and 12 also
 * in the team's reference sheet). The shapes' drawings (which leg is which, how the bends turn) were not
 * seen in the standard itself: for 25, 33, 34, 36, 41, 44, 47, 51, 52 and 63 they follow a public
 * open-source model of the standard's shapes (2020 edition) and are unverified against the printed table. In the formulas
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
    /**
     * A 90 degree bend then a 180 degree bend the same way (a bar with a semicircular hook): legs A and B,
     * C the width of the semicircle, D the tail. L = A + B + C + (D) - 1.5r - 3d.
     */
    S22("22", "A + B + C + (D) - 1.5r - 3d"),
    /** Two 90 degree bends turning opposite ways (a joggle). L = A + B + (C) - r - 2d. */
    S23("23", "A + B + (C) - r - 2d"),
    /** Two bends of another angle turning opposite ways (a crank). L = A + B + (C). */
    S26("26", "A + B + (C)"),
    /** Three 90 degree bends turning the same way. L = A + B + C + (D) - 1.5r - 3d. */
    S31("31", "A + B + C + (D) - 1.5r - 3d"),
    /**
     * Two bends of other angles turning the same way: end legs A and B, middle leg E (free), C and D the
     * rises of A and B across E. L = A + B + (E).
     */
    S25("25", "A + B + (E)"),
    /** Three 180 degree bends the same way (a double loop): L = 2A + 1.7B + 2(C) - 4d. */
    S33("33", "2A + 1.7B + 2(C) - 4d"),
    /**
     * A crank (two equal bends of another angle, opposite ways; D the offset) then a 90 degree bend the
     * way of the second: L = A + B + C + (E) - 0.5r - d.
     */
    S34("34", "A + B + C + (E) - 0.5r - d"),
    /**
     * A bend of another angle then two 90 degree bends, all the same way (A the inclined end leg, E its
     * rise): L = A + B + C + (D) - r - 2d.
     */
    S36("36", "A + B + C + (D) - r - 2d"),
    /** Four 90 degree bends the same way. L = A + B + C + D + (E) - 2r - 4d. */
    S41("41", "A + B + C + D + (E) - 2r - 4d"),
    /** Four 90 degree bends, out, in, in, out (a top hat). L = A + B + C + D + (E) - 2r - 4d. */
    S44("44", "A + B + C + D + (E) - 2r - 4d"),
    /** A U with a 180 degree hook at each end, turned inwards: L = 2A + B + 2C + 1.5r - 3d. */
    S47("47", "2A + B + 2C + 1.5r - 3d"),
    /** A closed link of five 90 degree bends, the end legs lapping: L = 2(A + B + (C)) - 2.5r - 5d. */
    S51("51", "2(A + B + (C)) - 2.5r - 5d"),
    /**
     * A closed link of three 90 degree bends and a 135 degree hook at each end: L = 2(A + B + (C)) - 1.5r - 3d
     * (formula of the 2020 edition as published in a public model of the standard; the 2005 formula was not
     * found: unverified).
     */
    S52("52", "2(A + B + (C)) - 1.5r - 3d"),
    /** A closed link of six 90 degree bends, one side doubled: L = 2A + 3B + 2(C) - 3r - 6d. */
    S63("63", "2A + 3B + 2(C) - 3r - 6d"),
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
