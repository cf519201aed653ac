package org.linemass.geometry;

import java.util.List;
import java.util.Objects;

/**
 * Where a segment came from: the file, the layer it counts on (after the format's layer-0
 * inheritance inside blocks), the DXF line number of its entity's first group code, the entity
 * handle (may be empty), the DXF entity type, and the chain of block names it came through
 * (outermost first; empty for model space).
 *
 * <p>A value with the accessors, exact equality and text form of a record of those six
 * components. A handle in canonical form (1 to 16 upper-case hexadecimal digits without leading
 * zeros, as DXF writers emit them) is held as a number and its text rebuilt on request, so a large
 * drawing does not keep one string per entity; any other handle text is kept as given.
 */
public final class Provenance {

    private static final int MAX_HEX_DIGITS = 16;

    private final String file;
    private final String layer;
    private final String entityType;
    private final List<String> blockPath;
    /** The handle text when it is not canonical hexadecimal, else null. */
    private final String handleText;
    private final long handleBits;
    private final int line;

    public Provenance(String file, String layer, int line, String handle, String entityType,
            List<String> blockPath) {
        this.file = file;
        this.layer = layer;
        this.line = line;
        this.entityType = entityType;
        this.blockPath = List.copyOf(blockPath);
        String h = handle == null ? "" : handle;
        long bits = canonicalHex(h);
        this.handleBits = bits;
        this.handleText = h.isEmpty() ? "" : bits < 0 && !isAllF(h) ? h : null;
    }

    private Provenance(String file, String layer, int line, String handleText, long handleBits,
            String entityType, List<String> blockPath) {
        this.file = file;
        this.layer = layer;
        this.line = line;
        this.handleText = handleText;
        this.handleBits = handleBits;
        this.entityType = entityType;
        this.blockPath = blockPath;
    }

    public static Provenance of(String file, String layer, int line, String handle, String entityType) {
        return new Provenance(file, layer, line, handle, entityType, List.of());
    }

    public String file() {
        return file;
    }

    public String layer() {
        return layer;
    }

    public int line() {
        return line;
    }

    /** The entity handle text ("" when the entity has none). */
    public String handle() {
        return handleText != null ? handleText : Long.toHexString(handleBits).toUpperCase(java.util.Locale.ROOT);
    }

    public String entityType() {
        return entityType;
    }

    public List<String> blockPath() {
        return blockPath;
    }

    public Provenance withLayer(String newLayer) {
        return new Provenance(file, newLayer, line, handleText, handleBits, entityType, blockPath);
    }

    /** This provenance seen through one more block insert (the insert's block name goes first). */
    public Provenance throughBlock(String blockName) {
        List<String> path = new java.util.ArrayList<>(blockPath.size() + 1);
        path.add(blockName);
        path.addAll(blockPath);
        return new Provenance(file, layer, line, handleText, handleBits, entityType, List.copyOf(path));
    }

    /** Short human reference such as {@code line 120, handle 2F (LINE)}. */
    public String describe() {
        StringBuilder sb = new StringBuilder();
        sb.append(entityType).append(" at line ").append(line);
        String handle = handle();
        if (!handle.isEmpty()) {
            sb.append(", handle ").append(handle);
        }
        if (!blockPath.isEmpty()) {
            sb.append(", via block ").append(String.join(" > ", blockPath));
        }
        return sb.toString();
    }

    @Override
    public boolean equals(Object o) {
        return o == this || o instanceof Provenance p && line == p.line && handleBits == p.handleBits
                && Objects.equals(handleText, p.handleText) && Objects.equals(file, p.file)
                && Objects.equals(layer, p.layer) && Objects.equals(entityType, p.entityType)
                && blockPath.equals(p.blockPath);
    }

    @Override
    public int hashCode() {
        int h = Objects.hash(file, layer, line, entityType, blockPath);
        return 31 * h + (handleText != null ? handleText.hashCode() : Long.hashCode(handleBits));
    }

    @Override
    public String toString() {
        return "Provenance[file=" + file + ", layer=" + layer + ", line=" + line + ", handle=" + handle()
                + ", entityType=" + entityType + ", blockPath=" + blockPath + "]";
    }

    /**
     * The value of a canonical upper-case hexadecimal handle, or -1 when {@code h} is not one
     * (empty, lower case, leading zero, too long, other characters). "FFFFFFFFFFFFFFFF" is also -1
     * and is told apart by the caller.
     */
    private static long canonicalHex(String h) {
        int n = h.length();
        if (n == 0 || n > MAX_HEX_DIGITS || (h.charAt(0) == '0' && n > 1)) {
            return -1;
        }
        long v = 0;
        for (int i = 0; i < n; i++) {
            char c = h.charAt(i);
            int d;
            if (c >= '0' && c <= '9') {
                d = c - '0';
            } else if (c >= 'A' && c <= 'F') {
                d = c - 'A' + 10;
            } else {
                return -1;
            }
            v = (v << 4) | d;
        }
        return v;
    }

    private static boolean isAllF(String h) {
        return h.equals("FFFFFFFFFFFFFFFF");
    }
}
