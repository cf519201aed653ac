package org.linemass.engine.result;

import org.linemass.engine.moments.Sym3;
import org.linemass.geometry.Vec3;

/**
 * Totals for one layer. Length values count duplicated material once ({@code drawnLengthM} is the
 * raw drawn sum). {@code lengthInertiaM3} is {@code ∫ (|r|² I - r r^T) ds} about
 * {@code lengthCentroidM}. Mass values are null when the layer has no section.
 */
public record LayerResult(String name, double lengthM, double drawnLengthM, Vec3 lengthCentroidM,
        Sym3 lengthInertiaM3, String section, Double massKg, Vec3 centroidM, Sym3 inertiaKgM2,
        int pieces, double errorBoundM, boolean visible) {
}
