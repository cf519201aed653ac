package org.linemass.importer;

import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import org.linemass.drawing.Block;
import org.linemass.drawing.Drawing;
import org.linemass.drawing.Insert;
import org.linemass.geometry.Affine;
import org.linemass.geometry.Segment;

/**
 * Test-only block expansion, written independently of the engine: every model-space segment and
 * every copy placed by inserts (arrays included), in world coordinates, with the layer it counts
 * on: an entity on layer "0" inside a block takes the layer of the insert that places it,
 * recursively (corpus README, "Conventions").
 */
final class TestExpander {

    record Placed(Segment segment, String layer, String entityKey) {
    }

    private record Frame(String block, Affine map, String inheritedLayer, String path) {
    }

    private TestExpander() {
    }

    /** Curve entity counts per DXF type over all expanded copies (from Block.curveEntityCounts). */
    static Map<String, Long> expandedCounts(Drawing d) {
        Map<String, Long> counts = new TreeMap<>();
        expand(d, counts);
        return counts;
    }

    static List<Placed> expand(Drawing d) {
        return expand(d, new TreeMap<>());
    }

    private static List<Placed> expand(Drawing d, Map<String, Long> counts) {
        List<Placed> out = new ArrayList<>();
        ArrayDeque<Frame> todo = new ArrayDeque<>();
        todo.push(new Frame(Drawing.MODEL_SPACE, Affine.IDENTITY, null, ""));
        while (!todo.isEmpty()) {
            Frame f = todo.pop();
            Block b = d.blocks().get(f.block);
            b.curveEntityCounts().forEach((k, v) -> counts.merge(k, (long) v, Long::sum));
            for (Segment s : b.segments()) {
                String layer = effective(s.source().layer(), f.inheritedLayer);
                out.add(new Placed(s.transformed(f.map), layer, f.path + "#" + s.source().line()));
            }
            for (Insert ins : b.inserts()) {
                String layer = effective(ins.source().layer(), f.inheritedLayer);
                for (int i = 0; i < ins.columns(); i++) {
                    for (int j = 0; j < ins.rows(); j++) {
                        Affine m = ins.placement(i, j).andThen(f.map);
                        todo.push(new Frame(ins.blockName(), m, layer,
                                f.path + "/" + ins.source().line() + "[" + i + "," + j + "]"));
                    }
                }
            }
        }
        return out;
    }

    private static String effective(String own, String inherited) {
        return own.equals("0") && inherited != null ? inherited : own;
    }
}
