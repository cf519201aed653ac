package org.linemass.engine.resolve;

import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.Deque;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.linemass.drawing.Block;
import org.linemass.drawing.Drawing;
import org.linemass.drawing.Insert;
import org.linemass.geometry.Affine;
import org.linemass.geometry.Provenance;
import org.linemass.geometry.Segment;

/**
 * The expanded world segments (metres) of the counted layers, for joining and checks: every copy
 * of every block placed by its full transform, with the effective layer and the block path (outermost
 * first) in its provenance. Same rules as {@link BlockInstancer} (layer filters, layer-0
 * inheritance, frozen inserts, arrays, cycles and undefined blocks skipped). Walks with an explicit
 * stack and stops after {@code limit} distinct segments (the caller checks the count first). Exact
 * coincident copies of one entity are collected once and counted ({@link CoincidentCopies}). Order:
 * model space entities in file order, each insert's copies column by column, depth first.
 */
final class WorldExpander {

    private WorldExpander() {
    }

    private static final class Frame {
        final Block block;
        final String inherited;
        final Affine map;
        final PathNode path;
        List<String> materialised;
        int nextInsert;
        long copy;

        Frame(Block block, String inherited, Affine map, PathNode path) {
            this.block = block;
            this.inherited = inherited;
            this.map = map;
            this.path = path;
        }

        /** The block path as a list, built once per frame on first use (outermost first). */
        List<String> path() {
            if (materialised == null) {
                java.util.LinkedList<String> l = new java.util.LinkedList<>();
                for (PathNode n = path; n != null; n = n.parent) {
                    l.addFirst(n.name);
                }
                materialised = List.copyOf(l);
            }
            return materialised;
        }
    }

    /** A persistent block path (innermost last), so that deep nesting costs O(depth) and not O(depth^2). */
    private record PathNode(String name, PathNode parent) {
    }

    /** Whether a block placed under an inherited layer holds any counted segment (see BlockInstancer). */
    @FunctionalInterface
    interface Occupancy {
        boolean placesSegments(String block, String inherited);
    }

    /**
     * @param occupied lets the walk skip inserts of blocks that place nothing, so an array or nest of
     *        10^12 empty copies costs nothing
     */
    static CoincidentCopies expand(Drawing drawing, LayerRules rules, Affine world, long limit, Occupancy occupied) {
        CoincidentCopies out = new CoincidentCopies();
        Block model = drawing.modelSpace();
        if (model == null) {
            return out;
        }
        Map<String, Integer> active = new HashMap<>();
        Deque<Frame> stack = new ArrayDeque<>();
        Frame root = new Frame(model, null, world, null);
        emit(root, rules, out, limit);
        stack.push(root);
        active.merge(model.name(), 1, Integer::sum);
        while (!stack.isEmpty() && out.size() < limit) {
            Frame f = stack.peek();
            if (f.nextInsert >= f.block.inserts().size()) {
                stack.pop();
                active.merge(f.block.name(), -1, Integer::sum);
                continue;
            }
            Insert ins = f.block.inserts().get(f.nextInsert);
            String inherited = LayerRules.effective(ins.source().layer(), f.inherited);
            Block child = drawing.blocks().get(ins.blockName());
            if (f.copy >= ins.copies() || !rules.insertShown(inherited) || child == null
                    || active.getOrDefault(child.name(), 0) > 0 || !occupied.placesSegments(child.name(), inherited)) {
                f.nextInsert++;
                f.copy = 0;
                continue;
            }
            int i = (int) (f.copy / ins.rows());
            int j = (int) (f.copy % ins.rows());
            f.copy++;
            Affine map = ins.placement(i, j).andThen(f.map);
            Frame c = new Frame(child, inherited, map, new PathNode(child.name(), f.path));
            emit(c, rules, out, limit);
            stack.push(c);
            active.merge(child.name(), 1, Integer::sum);
        }
        return out;
    }

    private static void emit(Frame f, LayerRules rules, CoincidentCopies out, long limit) {
        for (Segment seg : f.block.segments()) {
            if (out.size() >= limit) {
                return;
            }
            Provenance p = seg.source();
            String layer = LayerRules.effective(p.layer(), f.inherited);
            if (!rules.counts(layer)) {
                continue;
            }
            List<String> path = f.path();
            if (!p.blockPath().isEmpty()) {
                List<String> joined = new ArrayList<>(path);
                joined.addAll(p.blockPath());
                path = joined;
            }
            Provenance q = new Provenance(p.file(), layer, p.line(), p.handle(), p.entityType(), path);
            out.add(seg.transformed(f.map).withSource(q));
        }
    }
}
