package org.linemass.engine.section;

/**
 * A material: its id (what users type, e.g. {@code steel}, {@code aluminium-6061}), a name, its
 * density in kg/m^3 and where the value came from.
 */
public record Material(String id, String name, double densityKgM3, String source) {

    public Material {
        if (!(densityKgM3 > 0) || !Double.isFinite(densityKgM3)) {
            throw new IllegalArgumentException("material " + id + ": density must be positive, got " + densityKgM3);
        }
    }
}
