package org.linemass.importer.parse;

import java.util.ArrayDeque;
import java.util.Deque;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeMap;
import org.linemass.drawing.Drawing;
import org.linemass.drawing.ImportNote;
import org.linemass.drawing.Insert;

/**
 * Entities that may stand for material but that the importer cannot read as wire: ACIS bodies
 * (REGION, 3DSOLID, BODY, the SURFACE family), proxy entities, MESH, polyface and polygon meshes,
 * 3DFACE (unless its edges are read on request) and the filled outlines SOLID and TRACE. They
 * stay out of the totals; they are counted per layer and type, and a layer that carries them and
 * also wire gets a {@code warning}, since material there may be missing from its totals; a layer
 * with only such entities gets an {@code info} note.
 *
 * <p>The layer is the one the entity is drawn on: content of a block on layer {@code 0} takes the
 * layer of the insert that places it (through nested layer-0 inserts), so the walk starts at model
 * space and follows the resolved inserts; an entity of a block that model space never places is
 * not listed (it is in no total either). An entity is counted once per block definition and layer
 * it lands on, not once per copy. Each (block, inherited layer) pair is visited once, so the walk
 * costs what the engine's instancing costs. Not thread-safe.
 */
final class NotWeighed {

    static final String KIND = "not_weighed";

    private static final String LAYER_ZERO = "0";

    private static final Set<String> TYPES = Set.of("REGION", "3DSOLID", "BODY", "SURFACE", "PLANESURFACE",
            "EXTRUDEDSURFACE", "LOFTEDSURFACE", "REVOLVEDSURFACE", "SWEPTSURFACE", "NURBSURFACE",
            "ACAD_PROXY_ENTITY", "MESH", "POLYFACE_MESH", "POLYGON_MESH", "3DFACE", "SOLID", "TRACE");

    private NotWeighed() {
    }

    static boolean isWireLike(String type) {
        return TYPES.contains(type);
    }

    /** Counts one entity of {@code type} on {@code layer} of block {@code b}. */
    static void count(BlockBuilder b, String layer, String type) {
        b.notWeighed.computeIfAbsent(layer, k -> new TreeMap<>()).merge(type, 1, Integer::sum);
    }

    /** A block placed with the layer its layer-0 content takes (null in model space). */
    private record Placed(String block, String inherited) {
    }

    /**
     * One note per layer, in layer order, for the blocks as resolved ({@link BlockBuilder#inserts}
     * filled); nothing when no block holds such an entity.
     */
    static void notes(String file, Map<String, BlockBuilder> blocks, List<ImportNote> out) {
        if (blocks.values().stream().allMatch(b -> b.notWeighed.isEmpty())) {
            return;
        }
        Map<String, Map<String, Integer>> byLayer = new TreeMap<>();
        Set<String> wireLayers = new HashSet<>();
        Set<Placed> seen = new HashSet<>();
        Deque<Placed> todo = new ArrayDeque<>();
        Placed root = new Placed(Drawing.MODEL_SPACE, null);
        seen.add(root);
        todo.push(root);
        while (!todo.isEmpty()) {
            Placed p = todo.pop();
            BlockBuilder b = blocks.get(p.block);
            if (b == null) {
                continue;
            }
            for (String layer : b.wireLayers) {
                wireLayers.add(effective(layer, p.inherited));
            }
            b.notWeighed.forEach((layer, types) -> {
                Map<String, Integer> into = byLayer.computeIfAbsent(effective(layer, p.inherited), k -> new TreeMap<>());
                types.forEach((t, n) -> into.merge(t, n, Integer::sum));
            });
            for (Insert ins : b.inserts) {
                Placed q = new Placed(ins.blockName(), effective(ins.source().layer(), p.inherited));
                if (seen.add(q)) {
                    todo.push(q);
                }
            }
        }
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

    /** The layer an entity drawn on {@code own} lands on: layer-0 content takes the inserting layer. */
    private static String effective(String own, String inherited) {
        return inherited != null && LAYER_ZERO.equals(own) ? inherited : own;
    }
}
