package org.linemass.importer.parse;

import java.util.Arrays;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeMap;
import java.util.function.Consumer;
import org.linemass.drawing.Block;
import org.linemass.drawing.Drawing;
import org.linemass.drawing.ImportNote;
import org.linemass.drawing.Insert;
import org.linemass.drawing.InsertWalk;

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
 * space and follows the resolved inserts ({@link InsertWalk}, the walk the engine's instancing
 * uses); an entity of a block that model space never places is not listed (it is in no total
 * either). An entity is counted once per block definition and layer it lands on, not once per
 * copy. Each (block, inherited layer) pair is visited once, so the walk costs what the engine's
 * instancing costs. Not thread-safe.
 */
final class NotWeighed {

    static final String KIND = "not_weighed";

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
    private record Placed(Block block, String inherited) {
    }

    /**
     * One note per layer, in layer order, for the blocks as built ({@code built}, inserts resolved)
     * with what was counted while reading them ({@code blocks}); nothing when no block holds such an
     * entity.
     */
    static void notes(String file, Map<String, BlockBuilder> blocks, Map<String, Block> built, List<ImportNote> out) {
        Block model = built.get(Drawing.MODEL_SPACE);
        if (model == null || blocks.values().stream().allMatch(b -> b.notWeighed.isEmpty())) {
            return;
        }
        Map<String, Map<String, Integer>> byLayer = new TreeMap<>();
        Set<String> wireLayers = new HashSet<>();
        Set<List<String>> seen = new HashSet<>();
        Consumer<Placed> take = p -> {
            BlockBuilder b = blocks.get(p.block().name());
            for (String layer : b.wireLayers) {
                wireLayers.add(InsertWalk.effectiveLayer(layer, p.inherited()));
            }
            b.notWeighed.forEach((layer, types) -> {
                Map<String, Integer> into = byLayer.computeIfAbsent(InsertWalk.effectiveLayer(layer, p.inherited()),
                        k -> new TreeMap<>());
                types.forEach((t, n) -> into.merge(t, n, Integer::sum));
            });
        };
        Placed root = new Placed(model, null);
        take.accept(root);
        InsertWalk.walk(built::get, root, new InsertWalk.Visitor<Placed>() {
            @Override
            public Block block(Placed p) {
                return p.block();
            }

            @Override
            public String inherited(Placed p) {
                return p.inherited();
            }

            @Override
            public long entries(Placed parent, Insert ins, Block child, String inherited) {
                // each (block, inherited layer) once: its content lands on the same layers every time
                return child == null || seen.add(Arrays.asList(child.name(), inherited)) ? 1 : 0;
            }

            @Override
            public Placed enter(Placed parent, Insert ins, Block child, String inherited, long entry) {
                Placed p = new Placed(child, inherited);
                take.accept(p);
                return p;
            }
        });
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
