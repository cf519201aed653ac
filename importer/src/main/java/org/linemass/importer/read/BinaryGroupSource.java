package org.linemass.importer.read;

import ch.randelshofer.fastdoubleparser.JavaDoubleParser;
import java.io.IOException;
import java.nio.channels.ReadableByteChannel;
import java.nio.charset.StandardCharsets;

/**
 * Tokenizer for binary DXF (DXF Reference, binary DXF; FACTS.md §7.6): after the 22-byte sentinel,
 * group codes are 2-byte little-endian integers (R13 and later) or single bytes with 255 escaping
 * to a 2-byte code (older files). Values follow the code's type: NUL-terminated strings,
 * 8-byte little-endian doubles, 2/4/8-byte little-endian integers, 1-byte booleans and binary
 * chunks with a 1-byte length. Positions are byte offsets from the start of the file.
 */
public final class BinaryGroupSource extends GroupSource {

    /** The sentinel: "AutoCAD Binary DXF" CR LF SUB NUL. Private: an array cannot be made read-only. */
    private static final byte[] SENTINEL =
            "AutoCAD Binary DXF\r\n\u001a\u0000".getBytes(StandardCharsets.ISO_8859_1);

    private final ByteWindow w;
    private final int maxStringBytes;
    private Boolean wideCodes;
    private int code;
    private long codePos;
    private Kind kind;
    private int valStart;
    private int valEnd;
    private long intValue;
    private double dblValue;

    private BinaryGroupSource(String file, ByteWindow w, int maxStringBytes) {
        super(file);
        this.w = w;
        this.maxStringBytes = ByteWindow.lineLimit(maxStringBytes);
    }

    /** A source over {@code content}; the caller has checked that it starts with the sentinel. */
    public static BinaryGroupSource of(String file, byte[] content, int maxStringBytes) {
        ByteWindow w = ByteWindow.of(content);
        w.pos = SENTINEL.length;
        return new BinaryGroupSource(file, w, maxStringBytes);
    }

    /** A source over a channel positioned just after the sentinel. */
    public static BinaryGroupSource of(String file, ReadableByteChannel ch, int maxStringBytes) {
        int capacity = (int) Math.max(1 << 20, ByteWindow.lineLimit(maxStringBytes) + (1L << 16));
        ByteWindow w = ByteWindow.of(ch, capacity);
        w.base = SENTINEL.length;
        return new BinaryGroupSource(file, w, maxStringBytes);
    }

    /** Length of the sentinel in bytes, where the groups of a binary file start. */
    public static int sentinelLength() {
        return SENTINEL.length;
    }

    /** Whether the first {@code length} bytes of {@code head} start with the sentinel. */
    public static boolean startsWithSentinel(byte[] head, int length) {
        if (length < SENTINEL.length) {
            return false;
        }
        for (int i = 0; i < SENTINEL.length; i++) {
            if (head[i] != SENTINEL[i]) {
                return false;
            }
        }
        return true;
    }

    @Override
    public boolean next() throws ReadException, IOException {
        if (!w.ensure(1)) {
            return false;
        }
        if (wideCodes == null) {
            // code 0 (the first SECTION) is 00 00 in 2-byte files and 00 followed by text in 1-byte files
            wideCodes = w.ensure(2) && w.buf[w.pos] == 0 && w.buf[w.pos + 1] == 0;
        }
        codePos = w.base + w.pos;
        if (wideCodes) {
            need(2, "group code");
            code = (short) le(2);
        } else {
            int c = w.buf[w.pos++] & 0xff;
            if (c == 255) {
                need(2, "extended group code");
                c = (short) le(2);
            }
            code = c;
        }
        if (!defined(code)) {
            throw error(codePos, "", "", "group code " + code + " is not a DXF group code, so the width of its"
                    + " value is unknown; the binary stream cannot be followed from here (a damaged file, or one"
                    + " written with a wrong value width for an earlier group)");
        }
        kind = kind(code);
        switch (kind) {
            case DOUBLE -> {
                need(8, "8-byte real for group code " + code);
                dblValue = Double.longBitsToDouble(le(8));
            }
            case INT -> {
                int width = intWidth(code);
                need(width, width + "-byte integer for group code " + code);
                long v = le(width);
                intValue = width == 2 ? (short) v : width == 4 ? (int) v : v;
            }
            case BOOL -> {
                need(1, "1-byte boolean for group code " + code);
                intValue = w.buf[w.pos++] & 0xff;
            }
            case BINARY -> {
                need(1, "chunk length for group code " + code);
                int len = w.buf[w.pos++] & 0xff;
                need(len, len + "-byte chunk for group code " + code);
                valStart = w.pos;
                valEnd = w.pos + len;
                w.pos += len;
            }
            default -> {
                if (code != 0 && unwanted.test(code)) {
                    skipString();
                    return true;
                }
                readString();
                if (code == 0) {
                    checkType();
                }
            }
        }
        return true;
    }

    /**
     * A record type (the value of a 0 group) is a name of printable ASCII characters; anything
     * else means the stream slipped on an earlier value width, and reading on would invent
     * entity types.
     */
    private void checkType() throws ReadException {
        boolean ok = valEnd > valStart;
        for (int i = valStart; i < valEnd && ok; i++) {
            int c = w.buf[i] & 0xff;
            ok = c > ' ' && c < 0x7f;
        }
        if (!ok) {
            throw error(codePos, "", "", "group code 0 holds '" + valueExcerpt() + "', which is not a record type;"
                    + " the binary stream cannot be followed from here (a damaged file, or one written with a"
                    + " wrong value width for an earlier group)");
        }
    }

    private void readString() throws ReadException, IOException {
        int i = w.pos;
        while (true) {
            while (i < w.limit && w.buf[i] != 0) {
                i++;
            }
            if (i < w.limit) {
                break;
            }
            if (i - w.pos > maxStringBytes) {
                throw error(codePos, "", "", "string value longer than " + maxStringBytes + " bytes");
            }
            int offset = i - w.pos;
            if (!w.fill()) {
                throw error(codePos, "", "", "file ends inside the string value of group code " + code);
            }
            i = w.pos + offset;
        }
        if (i - w.pos > maxStringBytes) {
            throw error(codePos, "", "", "string value longer than " + maxStringBytes + " bytes");
        }
        valStart = w.pos;
        valEnd = i;
        w.pos = i + 1;
    }

    /** Steps over a NUL-terminated string of any length without holding it; it reads as empty. */
    private void skipString() throws ReadException, IOException {
        while (true) {
            int i = w.pos;
            while (i < w.limit && w.buf[i] != 0) {
                i++;
            }
            if (i < w.limit) {
                w.pos = i + 1;
                valStart = w.pos;
                valEnd = w.pos;
                return;
            }
            w.pos = w.limit;
            if (!w.fill()) {
                throw error(codePos, "", "", "file ends inside the string value of group code " + code);
            }
        }
    }

    private void need(int n, String what) throws ReadException, IOException {
        if (!w.ensure(n)) {
            throw error(codePos, "", "", "file ends where a " + what + " was expected");
        }
    }

    private long le(int n) {
        long v = 0;
        for (int k = n - 1; k >= 0; k--) {
            v = (v << 8) | (w.buf[w.pos + k] & 0xffL);
        }
        w.pos += n;
        return v;
    }

    @Override
    public int code() {
        return code;
    }

    @Override
    public long position() {
        return codePos;
    }

    @Override
    public boolean binary() {
        return true;
    }

    @Override
    public double doubleValue() {
        return switch (kind) {
            case DOUBLE -> dblValue;
            case INT, BOOL -> intValue;
            case STRING -> {
                if (valEnd == valStart) {
                    throw new NumberFormatException("empty");
                }
                yield JavaDoubleParser.parseDouble(w.buf, valStart, valEnd - valStart);
            }
            default -> throw new NumberFormatException("binary chunk");
        };
    }

    @Override
    public String stringValue() {
        return switch (kind) {
            case DOUBLE -> Double.toString(dblValue);
            case INT, BOOL -> Long.toString(intValue);
            default -> decoder.decode(w.buf, valStart, valEnd);
        };
    }

    @Override
    public String pooledValue() {
        return kind == Kind.STRING ? decoder.pooled(w.buf, valStart, valEnd) : stringValue();
    }

    @Override
    public String valueExcerpt() {
        String s = stringValue();
        return s.length() > 40 ? s.substring(0, 40) + "..." : s;
    }
}
