package org.linemass.engine.section;

import java.util.ArrayList;
import java.util.List;

/**
 * A layer-name pattern with {@code *} (any run of characters) and {@code ?} (one character),
 * matched against the whole name, case-insensitively (layer names in DXF compare without case).
 * Every other character is literal. Immutable.
 *
 * <p>Matching never backtracks: the pattern is split at its stars into pieces; the first piece
 * must sit at the start of the name, the last at its end, and each piece between is placed at its
 * leftmost place after the one before. Leftmost placement is always safe, since a star can absorb
 * whatever a later placement would have skipped. The work is at most (name length) x (pattern
 * length) character comparisons, whatever the pattern, so a long layer name with a pattern like
 * {@code *A*A*A*B} costs a few milliseconds rather than growing exponentially.
 */
public final class LayerGlob {

    private final String text;
    /** Code points of each star-free piece; '?' is kept as {@link #ANY}. */
    private final List<int[]> pieces;

    private static final int ANY = -1;

    private LayerGlob(String text, List<int[]> pieces) {
        this.text = text;
        this.pieces = pieces;
    }

    /** Compiles a glob; IllegalArgumentException for an empty pattern. */
    public static LayerGlob of(String glob) {
        if (glob == null || glob.isEmpty()) {
            throw new IllegalArgumentException("empty layer pattern");
        }
        List<int[]> pieces = new ArrayList<>();
        for (String piece : glob.split("\\*", -1)) {
            pieces.add(piece.codePoints().map(c -> c == '?' ? ANY : c).toArray());
        }
        return new LayerGlob(glob, List.copyOf(pieces));
    }

    /** Whether the whole layer name matches the pattern, ignoring case. */
    public boolean matches(String layer) {
        int[] name = layer.codePoints().toArray();
        if (pieces.size() == 1) {
            int[] only = pieces.get(0);
            return only.length == name.length && fitsAt(only, name, 0);
        }
        int[] first = pieces.get(0);
        int[] last = pieces.get(pieces.size() - 1);
        if (first.length + last.length > name.length) {
            return false;
        }
        // A pattern starting (ending) with a star has an empty first (last) piece, which fits.
        if (!fitsAt(first, name, 0)) {
            return false;
        }
        int end = name.length - last.length;
        if (!fitsAt(last, name, end)) {
            return false;
        }
        int from = first.length;
        for (int i = 1; i < pieces.size() - 1; i++) {
            int at = leftmost(pieces.get(i), name, from, end);
            if (at < 0) {
                return false;
            }
            from = at + pieces.get(i).length;
        }
        return true;
    }

    /** The first index in [from, limit - piece length] where the piece fits, or -1. */
    private static int leftmost(int[] piece, int[] name, int from, int limit) {
        for (int at = from; at + piece.length <= limit; at++) {
            if (fitsAt(piece, name, at)) {
                return at;
            }
        }
        return -1;
    }

    private static boolean fitsAt(int[] piece, int[] name, int at) {
        for (int k = 0; k < piece.length; k++) {
            if (piece[k] != ANY && !sameIgnoringCase(piece[k], name[at + k])) {
                return false;
            }
        }
        return true;
    }

    /** The comparison {@link String#equalsIgnoreCase} makes, one code point at a time. */
    private static boolean sameIgnoringCase(int a, int b) {
        if (a == b) {
            return true;
        }
        int ua = Character.toUpperCase(a);
        int ub = Character.toUpperCase(b);
        return ua == ub || Character.toLowerCase(ua) == Character.toLowerCase(ub);
    }

    @Override
    public String toString() {
        return text;
    }
}
