package org.linemass.importer.read;

import java.io.IOException;
import java.nio.charset.Charset;

/**
 * A stream of DXF (group code, value) pairs. After {@link #next()} returns true the current pair's
 * code, position and value are available until the following call. Comments (999) are skipped.
 * Values are converted on request; the caller decides the type from the group code.
 */
public abstract class GroupSource {

    /** Value kinds by group code (DXF Reference, group code value types). */
    public enum Kind { STRING, DOUBLE, INT, BOOL, BINARY }

    private final String file;
    final TextDecoder decoder = new TextDecoder();

    private long lastErrorPosition;

    /**
     * Group codes whose values the reader will not look at (set by the record reader for the
     * record being read): such a value is stepped over without being held, so its length is not
     * limited, and reads as empty text. Code 0 is always read.
     */
    java.util.function.IntPredicate unwanted = c -> false;

    /** Sets the codes whose values are stepped over unread (see {@link #unwanted}). */
    public final void unwanted(java.util.function.IntPredicate codes) {
        this.unwanted = codes;
    }

    GroupSource(String file) {
        this.file = file;
    }

    public final String file() {
        return file;
    }

    /** Advances to the next pair; false at the clean end of the input. */
    public abstract boolean next() throws ReadException, IOException;

    public abstract int code();

    /** DXF line number of the current group code line (ASCII) or its byte offset (binary). */
    public abstract long position();

    public abstract boolean binary();

    /** The current value as a number; NumberFormatException when it is not one. */
    public abstract double doubleValue();

    /** The current value decoded as text (trailing CR removed; no other trimming). */
    public abstract String stringValue();

    /** The current value decoded through a small pool, for names that repeat (types, layers). */
    public abstract String pooledValue();

    /**
     * The current value as a handle number when its text, blanks around it ignored, is canonical
     * upper-case hexadecimal (1 to 16 digits, no leading zero); -1 for any other text, including
     * sixteen F digits (whose value is -1), which callers then keep as text.
     */
    public long hexValue() {
        String t = stringValue().trim();
        byte[] b = t.getBytes(java.nio.charset.StandardCharsets.ISO_8859_1);
        return t.length() == b.length ? hex(b, 0, b.length) : -1;
    }

    /** {@link #hexValue()} of the bytes [s, e). */
    static long hex(byte[] b, int s, int e) {
        int n = e - s;
        if (n == 0 || n > Long.BYTES * 2 || (b[s] == '0' && n > 1)) {
            return -1;
        }
        long v = 0;
        for (int i = s; i < e; i++) {
            int c = b[i];
            int d;
            if (c >= '0' && c <= '9') {
                d = c - '0';
            } else if (c >= 'A' && c <= 'F') {
                d = c - ('A' - 10);
            } else {
                return -1;
            }
            v = (v << 4) | d;
        }
        return v;
    }

    /** A short printable excerpt of the raw value for error messages. */
    public abstract String valueExcerpt();

    /** Sets the code page for strings of pre-2007 files (UTF-8 files ignore it). */
    public final void charset(Charset cs) {
        decoder.charset(cs);
    }

    /** Builds the input error for the current position, in the location style of this source. */
    public final ReadException error(long where, String entityType, String handle, String problem) {
        lastErrorPosition = where;
        return error(file, binary(), where, entityType, handle, problem);
    }

    public static ReadException error(String file, boolean binary, long where, String entityType,
            String handle, String problem) {
        return new ReadException(file, binary, where, entityType, handle, problem);
    }

    /** Position passed to the most recent {@link #error(long, String, String, String)}. */
    public final long lastErrorPosition() {
        return lastErrorPosition;
    }

    /** Value kind of a group code. */
    public static Kind kind(int code) {
        if (code < 0) {
            return Kind.STRING;
        }
        if (code <= 9) {
            return Kind.STRING;
        }
        if (code <= 59) {
            return Kind.DOUBLE;
        }
        if (code <= 99) {
            return code >= 80 && code < 90 ? Kind.STRING : Kind.INT;
        }
        if (code >= 110 && code <= 149) {
            return Kind.DOUBLE;
        }
        if ((code >= 160 && code <= 179) || (code >= 270 && code <= 289) || (code >= 370 && code <= 389)
                || (code >= 400 && code <= 409) || (code >= 420 && code <= 429) || (code >= 440 && code <= 459)
                || (code >= 1060 && code <= 1071)) {
            return Kind.INT;
        }
        if ((code >= 210 && code <= 239) || (code >= 460 && code <= 469) || (code >= 1010 && code <= 1059)) {
            return Kind.DOUBLE;
        }
        if (code >= 290 && code <= 299) {
            return Kind.BOOL;
        }
        if ((code >= 310 && code <= 319) || code == 1004) {
            return Kind.BINARY;
        }
        return Kind.STRING;
    }

    /**
     * Byte width of an integer value in binary DXF (DXF Reference, "Group Code Value Types"):
     * 90-99, 420-429, 440-449, 450-459 (long) and 1071 are 32-bit; 160-169 are 64-bit; the other
     * integer ranges (60-79, 170-179, 270-289, 370-389, 400-409, 1060-1070) are 16-bit.
     */
    static int intWidth(int code) {
        if ((code >= 90 && code <= 99) || (code >= 420 && code <= 429) || (code >= 440 && code <= 459)
                || code == 1071) {
            return 4;
        }
        if (code >= 160 && code <= 169) {
            return 8;
        }
        return 2;
    }

    /**
     * True for the group codes the DXF Reference's table of value types defines: 0-79, 90-102,
     * 105, 110-149, 160-179, 210-239, 270-481, 999 and 1000-1071. A binary reader cannot know the
     * width of any other code's value, so meeting one means the stream has slipped (or the file
     * is not what it claims) and nothing after it can be trusted.
     */
    public static boolean defined(int code) {
        return (code >= 0 && code <= 79) || (code >= 90 && code <= 102) || code == 105
                || (code >= 110 && code <= 149) || (code >= 160 && code <= 179) || (code >= 210 && code <= 239)
                || (code >= 270 && code <= 481) || code == 999 || (code >= 1000 && code <= 1071);
    }
}
