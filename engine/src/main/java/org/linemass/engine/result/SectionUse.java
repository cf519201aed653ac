package org.linemass.engine.result;

/** A section used by the drawing, with its linear density and where its data came from. */
public record SectionUse(String section, String description, String material, double kgPerM,
        Double diameterM, String source) {
}
