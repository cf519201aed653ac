package org.linemass.drawing;

import java.util.List;
import java.util.Map;

/**
 * An imported drawing, still in drawing units, blocks not expanded. {@code blocks} holds every
 * block definition by name, including {@link #MODEL_SPACE}; paper-space content is not included
 * (its entity count is in {@code paperSpaceEntities}). {@code dxfVersion} is the $ACADVER string
 * or empty when the file has no header.
 */
public record Drawing(String file, String dxfVersion, boolean binary, LengthUnit unit, UnitSource unitSource,
        Map<String, Layer> layers, Map<String, Block> blocks, long paperSpaceEntities,
        List<ImportNote> notes) {

    /** Name under which model space is stored in {@link #blocks()}. */
    public static final String MODEL_SPACE = "*Model_Space";

    public Drawing {
        layers = Map.copyOf(layers);
        blocks = Map.copyOf(blocks);
        notes = List.copyOf(notes);
    }

    public Block modelSpace() {
        return blocks.get(MODEL_SPACE);
    }

    public Layer layer(String name) {
        Layer l = layers.get(name);
        return l != null ? l : Layer.undefined(name);
    }

    /** True when some entity was skipped because it was malformed: totals are then incomplete. */
    public boolean incomplete() {
        return notes.stream().anyMatch(ImportNote::skippedGeometry);
    }
}
