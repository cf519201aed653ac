package org.linemass.engine.result;

import java.util.List;
import org.linemass.engine.moments.Sym3;
import org.linemass.geometry.Vec3;

/**
 * One piece: a maximal run of segments joined end to end (one bent wire, one bar, one tube run).
 * Mass values are null when its layer has no section; {@code inertiaKgM2} is about
 * {@code centroidM}.
 */
public record PieceResult(int id, String layer, String section, double lengthM, Double massKg,
        Vec3 centroidM, Sym3 lengthInertiaM3, Sym3 inertiaKgM2, Vec3 startM, Vec3 endM, boolean closed,
        int segments, String mark, List<Bend> bends, List<SourceRef> sources, double errorBoundM) {

    public PieceResult {
        bends = List.copyOf(bends);
        sources = List.copyOf(sources);
    }
}
