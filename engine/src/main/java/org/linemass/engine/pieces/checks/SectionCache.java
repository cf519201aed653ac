package org.linemass.engine.pieces.checks;

import java.util.HashMap;
import java.util.Map;
import java.util.Optional;
import org.linemass.engine.piece.SectionLookup;
import org.linemass.engine.section.Section;

/**
 * Remembers the section of each layer so that the lookup runs once per layer, and turns a length
 * into the mass it stands for. Mutable cache; not thread-safe.
 */
public final class SectionCache {

    private final SectionLookup lookup;
    private final Map<String, Optional<Section>> cache = new HashMap<>();

    public SectionCache(SectionLookup lookup) {
        this.lookup = lookup;
    }

    public Optional<Section> forLayer(String layer) {
        return cache.computeIfAbsent(layer, l -> {
            Optional<Section> s = lookup.forLayer(l);
            return s == null ? Optional.empty() : s;
        });
    }

    /** Mass of {@code lengthM} of the layer's section in kg; null when the layer has no section. */
    public Double massOf(String layer, double lengthM) {
        return forLayer(layer).map(s -> lengthM * s.kgPerM()).orElse(null);
    }
}
