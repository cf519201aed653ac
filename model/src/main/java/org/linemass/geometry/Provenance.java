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
 * drawing does not keep one string per entity; any other handle text is kept as given. File,
 * layer, entity type and block path are held in a scope object shared with other provenances.
 */
public final class Provenance {

    private static final int MAX_HEX_DIGITS = 16;
    private static final byte[] HEX = "0123456789ABCDEF".getBytes(java.nio.charset.StandardCharsets.ISO_8859_1);

    /** Slots of the scope cache (a power of two). */
    private static final int SCOPE_SLOTS = 256;

    /**
     * Recently used scopes, so the provenances of one file, layer, type and block path share one
     * scope object. Direct-mapped, one table per thread: imports or analyses running side by side
     * share no mutable state. Bounded, so each thread keeps at most a few hundred small values.
     */
    private static final ThreadLocal<Scope[]> SCOPES = ThreadLocal.withInitial(() -> new Scope[SCOPE_SLOTS]);

    /** The components many provenances have in common. */
    record Scope(String file, String layer, String entityType, List<String> blockPath) {
    }

    private final Scope scope;
    /** The handle text when it is not canonical hexadecimal, else null. */
    private final String handleText;
    private final long handleBits;
    private final int line;

    public Provenance(String file, String layer, int line, String handle, String entityType,
            List<String> blockPath) {
        this.scope = scope(file, layer, entityType, List.copyOf(blockPath));
        this.line = line;
        String h = handle == null ? "" : handle;
        long bits = canonicalHex(h);
        this.handleBits = bits;
        this.handleText = h.isEmpty() ? "" : bits < 0 && !isAllF(h) ? h : null;
    }

    /** From stored components (see {@link ProvenanceColumns}); {@code handleText} null means canonical. */
    Provenance(Scope scope, int line, String handleText, long handleBits) {
        this.scope = scope;
        this.line = line;
        this.handleText = handleText;
        this.handleBits = handleBits;
    }

    private static Scope scope(String file, String layer, String entityType, List<String> blockPath) {
        int h = 31 * (31 * (31 * Objects.hashCode(file) + Objects.hashCode(layer)) + Objects.hashCode(entityType))
                + blockPath.hashCode();
        int slot = (h ^ (h >>> 16)) & (SCOPE_SLOTS - 1);
        Scope[] scopes = SCOPES.get();
        Scope s = scopes[slot];
        if (s != null && Objects.equals(s.file(), file) && Objects.equals(s.layer(), layer)
                && Objects.equals(s.entityType(), entityType) && s.blockPath().equals(blockPath)) {
            return s;
        }
        s = new Scope(file, layer, entityType, blockPath);
        scopes[slot] = s;
        return s;
    }

    public static Provenance of(String file, String layer, int line, String handle, String entityType) {
        return new Provenance(file, layer, line, handle, entityType, List.of());
    }

    /**
     * As {@link #of(String, String, int, String, String)} with the handle given by its value: the
     * handle text is the value in upper-case hexadecimal without leading zeros (the value is read
     * as unsigned, so -1 stands for sixteen F digits).
     */
    public static Provenance ofHandleValue(String file, String layer, int line, long handle, String entityType) {
        return new Provenance(scope(file, layer, entityType, List.of()), line, null, handle);
    }

    Scope scope() {
        return scope;
    }

    /** The handle text when it is not canonical hexadecimal ("" for no handle), else null. */
    String handleText() {
        return handleText;
    }

    /** The canonical handle's value (meaningful when {@link #handleText()} is null). */
    long handleBits() {
        return handleBits;
    }

    public String file() {
        return scope.file();
    }

    public String layer() {
        return scope.layer();
    }

    public int line() {
        return line;
    }

    /** The entity handle text ("" when the entity has none). */
    public String handle() {
        if (handleText != null) {
            return handleText;
        }
        byte[] digits = new byte[MAX_HEX_DIGITS];
        int i = MAX_HEX_DIGITS;
        long v = handleBits;
        do {
            digits[--i] = HEX[(int) (v & 0xF)];
            v >>>= 4;
        } while (v != 0);
        return new String(digits, i, MAX_HEX_DIGITS - i, java.nio.charset.StandardCharsets.ISO_8859_1);
    }

    public String entityType() {
        return scope.entityType();
    }

    public List<String> blockPath() {
        return scope.blockPath();
    }

    public Provenance withLayer(String newLayer) {
        return new Provenance(scope(scope.file(), newLayer, scope.entityType(), scope.blockPath()), line,
                handleText, handleBits);
    }

    /** This provenance seen through one more block insert (the insert's block name goes first). */
    public Provenance throughBlock(String blockName) {
        List<String> path = new java.util.ArrayList<>(scope.blockPath().size() + 1);
        path.add(blockName);
        path.addAll(scope.blockPath());
        return new Provenance(scope(scope.file(), scope.layer(), scope.entityType(), List.copyOf(path)), line,
                handleText, handleBits);
    }

    /** Short human reference such as {@code line 120, handle 2F (LINE)}. */
    public String describe() {
        StringBuilder sb = new StringBuilder();
        sb.append(scope.entityType()).append(" at line ").append(line);
        String handle = handle();
        if (!handle.isEmpty()) {
            sb.append(", handle ").append(handle);
        }
        if (!scope.blockPath().isEmpty()) {
            sb.append(", via block ").append(String.join(" > ", scope.blockPath()));
        }
        return sb.toString();
    }

    @Override
    public boolean equals(Object o) {
        return o == this || o instanceof Provenance p && line == p.line && handleBits == p.handleBits
                && Objects.equals(handleText, p.handleText) && (scope == p.scope || scope.equals(p.scope));
    }

    @Override
    public int hashCode() {
        int h = 31 * scope.hashCode() + line;
        return 31 * h + (handleText != null ? handleText.hashCode() : Long.hashCode(handleBits));
    }

    @Override
    public String toString() {
        return "Provenance[file=" + scope.file() + ", layer=" + scope.layer() + ", line=" + line + ", handle="
                + handle() + ", entityType=" + scope.entityType() + ", blockPath=" + scope.blockPath() + "]";
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
