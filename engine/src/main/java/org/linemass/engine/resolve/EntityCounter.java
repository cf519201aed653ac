package org.linemass.engine.resolve;

import java.util.HashMap;
import java.util.Map;
import java.util.TreeMap;
import org.linemass.drawing.Block;
import org.linemass.drawing.Drawing;
import org.linemass.drawing.Insert;
import org.linemass.drawing.InsertWalk;
import org.linemass.engine.result.EntityCounts;

/**
 * Entity counts after block expansion: every entity of a block counts once per copy of the block
 * that the model space places (a MINSERT of r x c counts r c times), whatever its layer (the counts
 * describe the file, not the filtered totals). INSERT entities themselves are counted only as the
 * importer lists them in {@link Block#otherEntityCounts()}. Counts saturate at {@link Long#MAX_VALUE}. Each block
 * is counted once, when the {@link InsertWalk} leaves it (children first); inserts of undefined blocks
 * and inserts that would nest a block in itself add nothing. Stateless entry point.
 */
public final class EntityCounter {

    private EntityCounter() {
    }

    private record Counts(Map<String, Long> curves, Map<String, Long> other) {
    }

    public static EntityCounts count(Drawing drawing) {
        Block model = drawing.modelSpace();
        if (model == null) {
            return new EntityCounts(Map.of(), Map.of(), drawing.paperSpaceEntities());
        }
        Map<String, Counts> done = new HashMap<>();
        InsertWalk.walk(drawing.blocks()::get, model, new InsertWalk.Visitor<Block>() {
            @Override
            public Block block(Block b) {
                return b;
            }

            @Override
            public String inherited(Block b) {
                return null;
            }

            @Override
            public long entries(Block parent, Insert ins, Block child, String inherited) {
                return child != null && done.containsKey(child.name()) ? 0 : 1;
            }

            @Override
            public Block enter(Block parent, Insert ins, Block child, String inherited, long entry) {
                return child;
            }

            @Override
            public void leave(Block b) {
                done.put(b.name(), counts(b, done));
            }
        });
        Counts total = done.get(model.name());
        return new EntityCounts(total.curves(), total.other(), drawing.paperSpaceEntities());
    }

    /** The counts of {@code b}: its own entities and those of every copy of the blocks it inserts. */
    private static Counts counts(Block b, Map<String, Counts> done) {
        Map<String, Long> curves = new TreeMap<>();
        Map<String, Long> other = new TreeMap<>();
        b.curveEntityCounts().forEach((k, v) -> curves.merge(k, (long) v, Saturating::add));
        b.otherEntityCounts().forEach((k, v) -> other.merge(k, (long) v, Saturating::add));
        for (Insert ins : b.inserts()) {
            Counts c = done.get(ins.blockName());
            if (c == null) {
                continue;
            }
            long copies = ins.copies();
            c.curves().forEach((k, v) -> curves.merge(k, Saturating.multiply(v, copies), Saturating::add));
            c.other().forEach((k, v) -> other.merge(k, Saturating.multiply(v, copies), Saturating::add));
        }
        return new Counts(curves, other);
    }
}
