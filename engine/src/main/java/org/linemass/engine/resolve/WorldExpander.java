package org.linemass.engine.resolve;

import java.util.ArrayList;
import java.util.List;
import org.linemass.drawing.Block;
import org.linemass.drawing.Drawing;
import org.linemass.drawing.Insert;
import org.linemass.drawing.InsertWalk;
import org.linemass.geometry.Affine;
import org.linemass.geometry.Provenance;
import org.linemass.geometry.Segment;

/**
 * The expanded world segments (metres) of the counted layers, for joining and checks: every copy
 * of every block placed by its full transform, with the effective layer and the block path (outermost
 * first) in its provenance. Same rules as {@link BlockInstancer} (layer filters, layer-0
 * inheritance, frozen inserts, arrays, cycles and undefined blocks skipped), on the same walk
 * ({@link InsertWalk}, one entry per array copy). Stops after {@code limit} distinct segments (the
 * caller checks the count first). Exact coincident copies of one entity are collected once and
 * counted ({@link CoincidentCopies}). Order: model space entities in file order, each insert's
 * copies column by column, depth first.
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
        Frame root = new Frame(model, null, world, null);
        emit(root, rules, out, limit);
        InsertWalk.walk(drawing.blocks()::get, root, new InsertWalk.Visitor<Frame>() {
            @Override
            public Block block(Frame f) {
                return f.block;
            }

            @Override
            public String inherited(Frame f) {
                return f.inherited;
            }

            @Override
            public long entries(Frame parent, Insert ins, Block child, String inherited) {
                boolean empty = child != null && !occupied.placesSegments(child.name(), inherited);
                return !rules.insertShown(inherited) || empty ? 0 : ins.copies();
            }

            @Override
            public Frame enter(Frame parent, Insert ins, Block child, String inherited, long entry) {
                int i = (int) (entry / ins.rows());
                int j = (int) (entry % ins.rows());
                Frame c = new Frame(child, inherited, ins.placement(i, j).andThen(parent.map),
                        new PathNode(child.name(), parent.path));
                emit(c, rules, out, limit);
                return c;
            }

            @Override
            public boolean stop() {
                return out.size() >= limit;
            }
        });
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
