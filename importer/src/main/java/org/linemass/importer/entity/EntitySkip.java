package org.linemass.importer.entity;

/**
 * Thrown by a converter when one entity cannot be used (bad numbers, inconsistent counts,
 * degenerate geometry). The caller skips that entity, records an error note with this one-line
 * message and carries on with the rest of the drawing.
 */
public final class EntitySkip extends Exception {

    private static final long serialVersionUID = 1L;

    public EntitySkip(String message) {
        super(message, null, false, false);
    }
}
