package org.linemass.drawing;

import java.util.ArrayDeque;
import java.util.Deque;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.function.Function;

/**
 * The one walk of a drawing's insert tree, which instancing, world expansion, entity counts and the
 * importer's not-weighed listing all use. Depth first from a root frame with an explicit stack, so
 * any nesting depth works; each insert of a frame's block is handled in file order:
 * <ol>
 * <li>the layer its layer-0 content takes is worked out ({@link #effectiveLayer});</li>
 * <li>{@link Visitor#entries} says how often to go in (0: not at all, 1: once, or once per array
 *     copy); it sees the child block, null when undefined;</li>
 * <li>an insert of an undefined block goes to {@link Visitor#undefined}, and an insert of a block
 *     that is on the stack (it would place a block inside itself) to {@link Visitor#cycle}; neither
 *     is followed;</li>
 * <li>otherwise {@link Visitor#enter} is called once per entry and returns the child's frame to walk
 *     next, or null to go no deeper (a memoised result, a filter).</li>
 * </ol>
 * A frame is left ({@link Visitor#leave}) after all its inserts, children before parents. The walk
 * ends early when {@link Visitor#stop} says so. What a frame holds, what is memoised and what is
 * counted are the visitor's; the walk keeps only the stack and which blocks are on it. Not
 * thread-safe (one walk per call).
 */
public final class InsertWalk {

    /** The layer that entities inside blocks inherit from. */
    public static final String LAYER_ZERO = "0";

    private InsertWalk() {
    }

    /**
     * What a walk does at each placement.
     *
     * @param <F> the visitor's frame: one placed block and whatever the visitor keeps for it
     */
    public interface Visitor<F> {

        /** The block frame {@code f} places. */
        Block block(F f);

        /** The layer that frame {@code f}'s layer-0 content takes; null for the root (model space). */
        String inherited(F f);

        /**
         * How many times to enter insert {@code ins} of frame {@code parent} (its child block
         * {@code child}, null when undefined, placed with inherited layer {@code inherited}): 0 to
         * pass it by, 1 by default, or its copies to enter each array copy.
         */
        default long entries(F parent, Insert ins, Block child, String inherited) {
            return 1;
        }

        /** Entry {@code entry} (0-based) of insert {@code ins}: the child frame to walk, or null. */
        F enter(F parent, Insert ins, Block child, String inherited, long entry);

        /** Frame {@code f} is done: all its inserts were handled. */
        default void leave(F f) {
        }

        /** Insert {@code ins} names a block the drawing does not define. */
        default void undefined(F parent, Insert ins) {
        }

        /** Insert {@code ins} would place block {@code child}, which is on the stack, inside itself. */
        default void cycle(F parent, Insert ins, Block child) {
        }

        /** True to end the walk now (a limit was reached); frames on the stack are not left. */
        default boolean stop() {
            return false;
        }
    }

    /** The layer an entity on {@code own} lands on, given the layer inherited from its insert (null in model space). */
    public static String effectiveLayer(String own, String inherited) {
        return inherited != null && LAYER_ZERO.equals(own) ? inherited : own;
    }

    /** A frame on the stack and where its walk of the inserts stands. */
    private static final class Node<F> {
        final F frame;
        final String block;
        int next;
        long entry;
        long entries = -1;

        Node(F frame, String block) {
            this.frame = frame;
            this.block = block;
        }
    }

    /** Walks from {@code root}; {@code blocks} finds a block by the name an insert gives (null when undefined). */
    public static <F> void walk(Function<String, Block> blocks, F root, Visitor<F> visitor) {
        Deque<Node<F>> stack = new ArrayDeque<>();
        Map<String, Integer> active = new HashMap<>();
        push(stack, active, root, visitor);
        while (!stack.isEmpty() && !visitor.stop()) {
            Node<F> n = stack.peek();
            List<Insert> inserts = visitor.block(n.frame).inserts();
            if (n.next >= inserts.size()) {
                stack.pop();
                active.merge(n.block, -1, Integer::sum);
                visitor.leave(n.frame);
                continue;
            }
            Insert ins = inserts.get(n.next);
            String inherited = effectiveLayer(ins.source().layer(), visitor.inherited(n.frame));
            Block child = blocks.apply(ins.blockName());
            if (n.entries < 0) {
                n.entries = visitor.entries(n.frame, ins, child, inherited);
                if (n.entries > 0 && child == null) {
                    visitor.undefined(n.frame, ins);
                    n.entries = 0;
                } else if (n.entries > 0 && active.getOrDefault(child.name(), 0) > 0) {
                    visitor.cycle(n.frame, ins, child);
                    n.entries = 0;
                }
            }
            if (n.entry >= n.entries) {
                n.next++;
                n.entry = 0;
                n.entries = -1;
                continue;
            }
            F c = visitor.enter(n.frame, ins, child, inherited, n.entry++);
            if (c != null) {
                push(stack, active, c, visitor);
            }
        }
    }

    private static <F> void push(Deque<Node<F>> stack, Map<String, Integer> active, F frame, Visitor<F> visitor) {
        String name = visitor.block(frame).name();
        stack.push(new Node<>(frame, name));
        active.merge(name, 1, Integer::sum);
    }
}
