package org.linemass.drawing;

/** Where a drawing's length unit came from. */
public enum UnitSource {
    /** $INSUNITS in the file's HEADER. */
    HEADER,
    /** The user's command-line choice, overriding the file. */
    OPTION,
    /** Guessed (no usable $INSUNITS); reports say so. */
    ASSUMED;

    public String jsonName() {
        return name().toLowerCase(java.util.Locale.ROOT);
    }
}
