package org.linemass.engine.section;

/**
 * One cross-section row: its id (what users type, e.g. {@code B12}, {@code AWG10-CU},
 * {@code TUBE42.4x2.6-S235}), a description, the material name (may be empty when the row gives
 * a mass per metre directly), linear density in kg/m, the outside diameter in metres when the
 * section is round (null otherwise), the minimum inside bend radius in metres when known (null
 * otherwise) and where the numbers came from.
 */
public record Section(String id, String description, String material, double kgPerM, Double diameterM,
        Double minBendRadiusM, String source) {

    public Section {
        if (!(kgPerM > 0) || !Double.isFinite(kgPerM)) {
            throw new IllegalArgumentException("section " + id + ": mass per metre must be positive, got " + kgPerM);
        }
    }
}
