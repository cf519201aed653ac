package org.linemass.drawing;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.linemass.geometry.Affine;
import org.linemass.geometry.Provenance;
import org.linemass.geometry.Vec3;

/**
 * The insert-tree walk on small hand-made trees: the order frames are entered and left, layer-0
 * inheritance through nesting (DXF Reference, BLOCK: entities on layer 0 take the layer of the
 * insert), array copies, undefined blocks, cycles and an early stop.
 */
class InsertWalkTest {

    private static Insert insert(String block, String layer, int columns) {
        return new Insert(block, Affine.IDENTITY, columns, 1, new Vec3(1, 0, 0), Vec3.ZERO,
                Provenance.of("t.dxf", layer, 1, "", "INSERT"));
    }

    private static Block block(String name, Insert... inserts) {
        return new Block(name, Vec3.ZERO, List.of(), List.of(inserts), Map.of(), Map.of());
    }

    private record Frame(Block block, String inherited) {
    }

    /** Records every call as one line, entering each array copy. */
    private static List<String> walk(Map<String, Block> blocks, Block root, long stopAfter) {
        List<String> log = new ArrayList<>();
        InsertWalk.walk(blocks::get, new Frame(root, null), new InsertWalk.Visitor<Frame>() {
            @Override
            public Block block(Frame f) {
                return f.block();
            }

            @Override
            public String inherited(Frame f) {
                return f.inherited();
            }

            @Override
            public long entries(Frame parent, Insert ins, Block child, String inherited) {
                return ins.copies();
            }

            @Override
            public Frame enter(Frame parent, Insert ins, Block child, String inherited, long entry) {
                log.add("enter " + child.name() + "#" + entry + " on " + inherited);
                return new Frame(child, inherited);
            }

            @Override
            public void leave(Frame f) {
                log.add("leave " + f.block().name());
            }

            @Override
            public void undefined(Frame parent, Insert ins) {
                log.add("undefined " + ins.blockName());
            }

            @Override
            public void cycle(Frame parent, Insert ins, Block child) {
                log.add("cycle " + child.name() + " in " + parent.block().name());
            }

            @Override
            public boolean stop() {
                return log.size() >= stopAfter;
            }
        });
        return log;
    }

    @Test
    void walk_depthFirstInFileOrder_layerZeroInheritsThroughNesting() {
        Map<String, Block> blocks = new HashMap<>();
        blocks.put("LEAF", block("LEAF"));
        // MID places LEAF on layer 0 (it passes MID's inherited layer on) and on layer OWN (its own)
        blocks.put("MID", block("MID", insert("LEAF", "0", 1), insert("LEAF", "OWN", 1)));
        Block model = block(Drawing.MODEL_SPACE, insert("MID", "FRAME", 2), insert("GONE", "FRAME", 1));
        assertEquals(List.of("enter MID#0 on FRAME", "enter LEAF#0 on FRAME", "leave LEAF", "enter LEAF#0 on OWN",
                "leave LEAF", "leave MID", "enter MID#1 on FRAME", "enter LEAF#0 on FRAME", "leave LEAF",
                "enter LEAF#0 on OWN", "leave LEAF", "leave MID", "undefined GONE", "leave " + Drawing.MODEL_SPACE),
                walk(blocks, model, Long.MAX_VALUE));
    }

    @Test
    void walk_blockOnTheStack_isACycleNotFollowed_andStopEndsTheWalk() {
        Map<String, Block> blocks = new HashMap<>();
        blocks.put("A", block("A", insert("B", "0", 1)));
        blocks.put("B", block("B", insert("A", "0", 1)));
        Block model = block(Drawing.MODEL_SPACE, insert("A", "W", 1));
        assertEquals(List.of("enter A#0 on W", "enter B#0 on W", "cycle A in B", "leave B", "leave A",
                "leave " + Drawing.MODEL_SPACE), walk(blocks, model, Long.MAX_VALUE));
        assertEquals(List.of("enter A#0 on W", "enter B#0 on W"), walk(blocks, model, 2));
    }

    @Test
    void effectiveLayer_onlyLayerZeroInsideABlockInherits() {
        assertEquals("W", InsertWalk.effectiveLayer("0", "W"));
        assertEquals("RAIL", InsertWalk.effectiveLayer("RAIL", "W"));
        assertEquals("0", InsertWalk.effectiveLayer("0", null));
    }
}
