package org.linemass.importer.parse;

import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeMap;
import org.linemass.drawing.ImportNote;

/**
 * Entities that may stand for material but that the importer cannot read as wire: ACIS bodies
 * (REGION, 3DSOLID, BODY, the SURFACE family), proxy entities, MESH, polyface and polygon meshes,
 * 3DFACE (unless its edges are read on request) and the filled outlines SOLID and TRACE. They
 * stay out of the totals; they are counted per layer and type, and a layer that carries them and
 * also wire gets a {@code warning}, since material there may be missing from its totals; a layer
 * with only such entities gets an {@code info} note.
 */
final class NotWeighed {

    static final String KIND = "not_weighed";

    private static final Set<String> TYPES = Set.of("REGION", "3DSOLID", "BODY", "SURFACE", "PLANESURFACE",
            "EXTRUDEDSURFACE", "LOFTEDSURFACE", "REVOLVEDSURFACE", "SWEPTSURFACE", "NURBSURFACE",
            "ACAD_PROXY_ENTITY", "MESH", "POLYFACE_MESH", "POLYGON_MESH", "3DFACE", "SOLID", "TRACE");

    /** Per layer, per type, how many were met (sorted, for stable notes). */
    private final Map<String, Map<String, Integer>> byLayer = new TreeMap<>();

    static boolean isWireLike(String type) {
        return TYPES.contains(type);
    }

    void count(String layer, String type) {
        byLayer.computeIfAbsent(layer, k -> new TreeMap<>()).merge(type, 1, Integer::sum);
    }

    /** One note per layer; {@code wireLayers} are the layers that carry wire. */
    void notes(String file, Set<String> wireLayers, List<ImportNote> out) {
        for (Map.Entry<String, Map<String, Integer>> e : byLayer.entrySet()) {
            StringBuilder what = new StringBuilder();
            e.getValue().forEach((t, n) -> what.append(what.length() == 0 ? "" : ", ").append(n).append(' ').append(t));
            boolean wire = wireLayers.contains(e.getKey());
            String msg = wire
                    ? "layer '" + e.getKey() + "' carries wire and also " + what + " that cannot be weighed (solids,"
                            + " regions, surfaces, proxies, meshes, faces and filled outlines are not read as wire):"
                            + " the layer's totals may be missing material"
                    : "layer '" + e.getKey() + "' holds " + what + " that cannot be weighed and no wire; nothing on"
                            + " it was counted";
            out.add(Notes.of(wire ? "warning" : "info", KIND, file, 0, "", "", e.getKey(), msg));
        }
    }
}
