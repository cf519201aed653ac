package org.linemass.engine.result;

import java.util.Map;
import java.util.TreeMap;

/**
 * Entity counts after block expansion: per DXF type carrying wire geometry ({@code curves},
 * POLYLINE split into POLYLINE2D/POLYLINE3D), per type present but carrying none
 * ({@code noGeometry}), and entities in paper space (not counted).
 */
public record EntityCounts(Map<String, Long> curves, Map<String, Long> noGeometry, long paperSpace) {

    public EntityCounts {
        curves = java.util.Collections.unmodifiableMap(new TreeMap<>(curves));
        noGeometry = java.util.Collections.unmodifiableMap(new TreeMap<>(noGeometry));
    }
}
