package org.linemass.geometry;

import java.util.List;

/**
 * Where a segment came from: the file, the layer it counts on (after the format's layer-0
 * inheritance inside blocks), the DXF line number of its entity's first group code, the entity
 * handle (may be empty), the DXF entity type, and the chain of block names it came through
 * (outermost first; empty for model space).
 */
public record Provenance(String file, String layer, int line, String handle, String entityType,
        List<String> blockPath) {

    public Provenance {
        blockPath = List.copyOf(blockPath);
        handle = handle == null ? "" : handle;
    }

    public static Provenance of(String file, String layer, int line, String handle, String entityType) {
        return new Provenance(file, layer, line, handle, entityType, List.of());
    }

    public Provenance withLayer(String newLayer) {
        return new Provenance(file, newLayer, line, handle, entityType, blockPath);
    }

    /** This provenance seen through one more block insert (the insert's block name goes first). */
    public Provenance throughBlock(String blockName) {
        List<String> path = new java.util.ArrayList<>(blockPath.size() + 1);
        path.add(blockName);
        path.addAll(blockPath);
        return new Provenance(file, layer, line, handle, entityType, path);
    }

    /** Short human reference such as {@code line 120, handle 2F (LINE)}. */
    public String describe() {
        StringBuilder sb = new StringBuilder();
        sb.append(entityType).append(" at line ").append(line);
        if (!handle.isEmpty()) {
            sb.append(", handle ").append(handle);
        }
        if (!blockPath.isEmpty()) {
            sb.append(", via block ").append(String.join(" > ", blockPath));
        }
        return sb.toString();
    }
}
