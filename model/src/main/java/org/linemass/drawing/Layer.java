package org.linemass.drawing;

/**
 * A layer from the LAYER table, or one referenced by an entity without a table entry
 * ({@code defined == false}, then on and thawed). {@code on} is false when the table colour is
 * negative; {@code frozen} is bit 1 of the layer flags.
 */
public record Layer(String name, boolean on, boolean frozen, int colour, boolean defined) {

    public static Layer undefined(String name) {
        return new Layer(name, true, false, 7, false);
    }

    public boolean visible() {
        return on && !frozen;
    }
}
