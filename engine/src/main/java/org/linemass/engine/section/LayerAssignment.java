package org.linemass.engine.section;

/**
 * "Layers matching {@code layerGlob} are made of section {@code sectionId}". The glob uses
 * {@code *} and {@code ?} and matches layer names case-insensitively; {@code origin} says where the
 * rule came from (a CSV file and row, or the command line) for error messages.
 */
public record LayerAssignment(String layerGlob, String sectionId, String origin) {
}
