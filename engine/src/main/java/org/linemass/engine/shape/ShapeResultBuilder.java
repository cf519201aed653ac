package org.linemass.engine.shape;

import java.util.List;
import java.util.Locale;

/**
 * Collects a {@link ShapeResult}'s fields while a piece is classified; single use, not thread-safe.
 * {@link #done} adds the note that the formula length differs from the exact length by more than the
 * allowed difference.
 */
final class ShapeResultBuilder {

    private final double exact;
    private final boolean below;
    private final List<String> notes;
    private final double allowedM;
    private Double[] dims = new Double[6];
    private Double length;

    /**
     * @param exact exact centre-line length, metres
     * @param below whether a bend is below the minimum radius
     * @param notes the notes so far (added to)
     * @param allowedM formula and exact lengths further apart than this are noted, metres
     */
    ShapeResultBuilder(double exact, boolean below, List<String> notes, double allowedM) {
        this.exact = exact;
        this.below = below;
        this.notes = notes;
        this.allowedM = allowedM;
    }

    ShapeResultBuilder dims(Double a, Double b, Double c, Double d, Double e, Double r) {
        dims = new Double[] {a, b, c, d, e, r};
        return this;
    }

    ShapeResultBuilder length(double l) {
        length = l;
        return this;
    }

    ShapeResultBuilder note(String text) {
        notes.add(text);
        return this;
    }

    ShapeResult done(ShapeCode code) {
        if (length != null && Math.abs(length - exact) > allowedM) {
            notes.add(String.format(Locale.ROOT, "formula length differs from the exact length by %.0f mm",
                    (length - exact) * 1000));
        }
        return new ShapeResult(code, dims[0], dims[1], dims[2], dims[3], dims[4], dims[5], length, exact, below,
                notes);
    }
}
