package org.linemass.engine.result;

import java.util.List;
import org.linemass.engine.moments.Sym3;
import org.linemass.geometry.Vec3;

/**
 * One piece: a maximal run of segments joined end to end (one bent wire, one bar, one tube run).
 * Mass values are null when its layer has no section; {@code inertiaKgM2} is about
 * {@code centroidM}. {@code form} is how it is bent (bender data and coils; {@link PieceForm#NONE}
 * when not worked out).
 */
public record PieceResult(int id, String layer, String section, double lengthM, Double massKg,
        Vec3 centroidM, Sym3 lengthInertiaM3, Sym3 inertiaKgM2, Vec3 startM, Vec3 endM, boolean closed,
        int segments, String mark, List<Bend> bends, List<SourceRef> sources, double errorBoundM,
        PieceForm form) {

    public PieceResult {
        bends = List.copyOf(bends);
        sources = List.copyOf(sources);
        form = form == null ? PieceForm.NONE : form;
    }

    /** A piece result without bending data ({@link PieceForm#NONE}). */
    public PieceResult(int id, String layer, String section, double lengthM, Double massKg, Vec3 centroidM,
            Sym3 lengthInertiaM3, Sym3 inertiaKgM2, Vec3 startM, Vec3 endM, boolean closed, int segments,
            String mark, List<Bend> bends, List<SourceRef> sources, double errorBoundM) {
        this(id, layer, section, lengthM, massKg, centroidM, lengthInertiaM3, inertiaKgM2, startM, endM, closed,
                segments, mark, bends, sources, errorBoundM, PieceForm.NONE);
    }
}
