package org.linemass.engine.result;

import java.util.List;
import org.linemass.geometry.Vec3;

/**
 * One drawing defect or notice: its kind (see {@link FindingKind}), severity, where it is (world
 * metres; null when it has no place, e.g. assumed units), its size in metres where it has one
 * (gap width, overlapping length), the layer, the entities involved, the mass it concerns in kg
 * (e.g. the mass counted twice by a duplicate) and a plain-language message.
 */
public record Finding(String kind, Severity severity, Vec3 atM, Double sizeM, String layer,
        List<SourceRef> entities, Double massKg, String message) {

    public Finding {
        entities = List.copyOf(entities);
    }
}
