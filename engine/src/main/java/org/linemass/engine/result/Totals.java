package org.linemass.engine.result;

import org.linemass.engine.moments.Sym3;
import org.linemass.geometry.Vec3;

/**
 * Whole-drawing totals. {@code massKg}, {@code centroidM} and {@code inertiaKgM2} cover the layers
 * that have a section ({@code massComplete} false when some layer with geometry has none; null
 * when no layer has one). Length values cover every counted layer.
 */
public record Totals(double lengthM, double drawnLengthM, Vec3 lengthCentroidM, Sym3 lengthInertiaM3,
        Double massKg, Vec3 centroidM, Sym3 inertiaKgM2, boolean massComplete, double errorBoundM) {
}
