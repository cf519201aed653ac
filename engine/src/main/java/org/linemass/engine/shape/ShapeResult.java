package org.linemass.engine.shape;

import java.util.List;

/**
 * A piece as a schedule line: its shape code, the standard's dimensions A to E and radius R in
 * metres (null where the shape has none; for shape 77, C is the number of turns), the length by the standard's formula and the exact
 * centre-line length (metres), and notes (a radius below Table 2, a formula length differing from
 * the exact one by more than the standard's rounding, why a shape is 98 or 99).
 */
public record ShapeResult(ShapeCode code, Double aM, Double bM, Double cM, Double dM, Double eM, Double rM,
        Double formulaLengthM, double exactLengthM, boolean belowMinimumRadius, List<String> notes) {

    public ShapeResult {
        notes = List.copyOf(notes);
    }
}
