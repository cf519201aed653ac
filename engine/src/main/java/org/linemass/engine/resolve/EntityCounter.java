package org.linemass.engine.resolve;

import java.util.ArrayDeque;
import java.util.Deque;
import java.util.HashMap;
import java.util.HashSet;
import java.util.Map;
import java.util.Set;
import java.util.TreeMap;
import org.linemass.drawing.Block;
import org.linemass.drawing.Drawing;
import org.linemass.drawing.Insert;
import org.linemass.engine.result.EntityCounts;

/**
 * Entity counts after block expansion: every entity of a block counts once per copy of the block
 * that the model space places (a MINSERT of r x c counts r c times), whatever its layer (the counts
 * describe the file, not the filtered totals). INSERT entities themselves are counted only as the
 * importer lists them in {@link Block#otherEntityCounts()}. Counts saturate at {@link Long#MAX_VALUE}. Each block
 * is counted once (post-order walk with an explicit stack); inserts of undefined blocks and inserts
 * that would nest a block in itself add nothing. Stateless entry point.
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
        Set<String> onStack = new HashSet<>();
        Deque<Block> stack = new ArrayDeque<>();
        Deque<Integer> next = new ArrayDeque<>();
        stack.push(model);
        next.push(0);
        onStack.add(model.name());
        while (!stack.isEmpty()) {
            Block b = stack.peek();
            int i = next.pop();
            if (i < b.inserts().size()) {
                next.push(i + 1);
                Block child = drawing.blocks().get(b.inserts().get(i).blockName());
                if (child != null && !done.containsKey(child.name()) && !onStack.contains(child.name())) {
                    stack.push(child);
                    next.push(0);
                    onStack.add(child.name());
                }
                continue;
            }
            stack.pop();
            onStack.remove(b.name());
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
            done.put(b.name(), new Counts(curves, other));
        }
        Counts total = done.get(model.name());
        return new EntityCounts(total.curves(), total.other(), drawing.paperSpaceEntities());
    }
}
