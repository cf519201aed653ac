package org.linemass.importer.read;

import ch.randelshofer.fastdoubleparser.JavaDoubleParser;
import java.io.IOException;
import java.lang.invoke.MethodHandles;
import java.lang.invoke.VarHandle;
import java.nio.ByteOrder;
import java.nio.channels.ReadableByteChannel;

/**
 * Tokenizer for ASCII DXF: lines end in LF or CRLF; a group code line may be padded with spaces;
 * 999 comments, and values the reader does not want, are stepped over without being held, so only
 * the lines that are read are limited in length. Works on a byte window (never a whole-file String, no regular
 * expressions); numbers are parsed straight from the bytes. A line longer than the configured
 * limit, a code line that is not an integer, or a code without a value line is an input error.
 */
public final class AsciiGroupSource extends GroupSource {

    private static final int MAX_EXCERPT = 40;
    private static final VarHandle LONGS = MethodHandles.byteArrayViewVarHandle(long[].class, ByteOrder.LITTLE_ENDIAN);
    private static final long LF_BYTES = 0x0A0A0A0A0A0A0A0AL;
    private static final long ONE_BYTES = 0x0101010101010101L;
    private static final long HIGH_BITS = 0x8080808080808080L;

    private final ByteWindow w;
    private final int maxLineBytes;
    private long lineNo;
    private int lineStart;
    private int lineEnd;
    private int code;
    private long codeLine;
    /** Absolute byte offset of the current pair's code line. */
    private long codeOffset;

    private AsciiGroupSource(String file, ByteWindow w, int maxLineBytes) {
        super(file);
        this.w = w;
        this.maxLineBytes = ByteWindow.lineLimit(maxLineBytes);
    }

    public static AsciiGroupSource of(String file, byte[] content, int offset, int maxLineBytes) {
        ByteWindow w = ByteWindow.of(content);
        w.pos = offset;
        return new AsciiGroupSource(file, w, maxLineBytes);
    }

    public static AsciiGroupSource of(String file, ReadableByteChannel channel, int maxLineBytes) {
        int capacity = (int) Math.max(1 << 20, ByteWindow.lineLimit(maxLineBytes) + (1L << 16));
        return new AsciiGroupSource(file, ByteWindow.of(channel, capacity), maxLineBytes);
    }

    /** Reads one line into [lineStart, lineEnd); false at end of input. */
    private boolean readLine() throws ReadException, IOException {
        int i = w.pos;
        while (true) {
            byte[] b = w.buf;
            int lim = w.limit;
            i = findNewline(b, i, lim);
            if (i < lim || i - w.pos > maxLineBytes + 1) {
                break;
            }
            int offset = i - w.pos;
            boolean more = w.fill();
            i = w.pos + offset;
            if (!more) {
                break;
            }
        }
        int start = w.pos;
        if (start >= w.limit) {
            return false;
        }
        lineNo++;
        if (i - start > maxLineBytes + 1) {
            throw error(lineNo, "", "", "line longer than " + maxLineBytes + " bytes");
        }
        byte[] b = w.buf;
        int end = i;
        if (end > start && b[end - 1] == '\r') {
            end--;
        }
        lineStart = start;
        lineEnd = end;
        w.pos = i < w.limit ? i + 1 : i;
        return true;
    }

    /** Steps over one line of any length without holding it; false at end of input. */
    private boolean skipLine() throws IOException {
        if (w.pos >= w.limit && (!w.fill() || w.pos >= w.limit)) {
            return false;
        }
        while (true) {
            int i = findNewline(w.buf, w.pos, w.limit);
            if (i < w.limit) {
                w.pos = i + 1;
                lineNo++;
                return true;
            }
            // no line end in the window: drop what was scanned and read on
            w.pos = w.limit;
            if (!w.fill()) {
                lineNo++;
                return true;
            }
        }
    }

    /**
     * Index of the first LF in b[from, limit), or limit. Eight bytes at a time: the classic
     * zero-byte test ((x - 0x01..) & ~x & 0x80..) on the bytes XOR LF; its lowest set bit marks the
     * first LF exactly (false positives can only appear above a true zero byte).
     */
    private static int findNewline(byte[] b, int from, int limit) {
        int i = from;
        while (i + Long.BYTES <= limit) {
            long x = (long) LONGS.get(b, i) ^ LF_BYTES;
            long t = (x - ONE_BYTES) & ~x & HIGH_BITS;
            if (t != 0) {
                return i + (Long.numberOfTrailingZeros(t) >>> 3);
            }
            i += Long.BYTES;
        }
        while (i < limit && b[i] != '\n') {
            i++;
        }
        return i;
    }

    @Override
    public boolean next() throws ReadException, IOException {
        while (true) {
            if (!readLine()) {
                return false;
            }
            codeLine = lineNo;
            codeOffset = w.base + lineStart;
            code = parseCode();
            if (code == 999 || (code != 0 && unwanted.test(code))) {
                if (!skipLine()) {
                    throw error(codeLine, "", "", "group code " + code
                            + " has no value line (odd number of lines: file truncated?)");
                }
                if (code == 999) {
                    continue;
                }
                lineStart = w.pos;
                lineEnd = w.pos;
                return true;
            }
            if (!readLine()) {
                throw error(codeLine, "", "", "group code " + code
                        + " has no value line (odd number of lines: file truncated?)");
            }
            if (code != 999) {
                return true;
            }
        }
    }

    private int parseCode() throws ReadException {
        byte[] b = w.buf;
        int s = lineStart;
        int e = lineEnd;
        while (s < e && (b[s] == ' ' || b[s] == '\t')) {
            s++;
        }
        while (e > s && (b[e - 1] == ' ' || b[e - 1] == '\t' || b[e - 1] == '\r')) {
            e--;
        }
        boolean neg = false;
        if (s < e && b[s] == '-') {
            neg = true;
            s++;
        }
        if (s == e || e - s > 6) {
            throw badCode();
        }
        int v = 0;
        for (int i = s; i < e; i++) {
            int d = b[i] - '0';
            if (d < 0 || d > 9) {
                throw badCode();
            }
            v = v * 10 + d;
        }
        return neg ? -v : v;
    }

    private ReadException badCode() {
        return error(lineNo, "", "", "expected a group code (an integer), got '" + excerpt() + "'");
    }

    @Override
    public int code() {
        return code;
    }

    /** Byte offset in the input of the current pair's code line (where a copy can splice before it). */
    public long pairOffset() {
        return codeOffset;
    }

    /** Byte offset in the input of the current pair's value line. */
    public long valueOffset() {
        return w.base + lineStart;
    }

    /** Length in bytes of the current pair's value line, without its line end. */
    public int valueLength() {
        return lineEnd - lineStart;
    }

    @Override
    public long position() {
        return codeLine;
    }

    @Override
    public boolean binary() {
        return false;
    }

    @Override
    public double doubleValue() {
        byte[] b = w.buf;
        int s = lineStart;
        int e = lineEnd;
        while (s < e && b[s] == ' ') {
            s++;
        }
        while (e > s && (b[e - 1] == ' ' || b[e - 1] == '\t')) {
            e--;
        }
        if (e == s) {
            throw new NumberFormatException("empty");
        }
        double fast = plainDecimal(b, s, e);
        return fast == fast ? fast : JavaDoubleParser.parseDouble(b, s, e - s);
    }

    /** Exact powers of ten up to 1e22 (all exactly representable as doubles). */
    private static final double[] POW10 = new double[23];

    static {
        POW10[0] = 1;
        for (int i = 1; i < POW10.length; i++) {
            POW10[i] = POW10[i - 1] * 10;
        }
    }

    /** Most significant digits the fast path takes: 10^15 < 2^53, so the digits form an exact long-to-double. */
    private static final int FAST_DIGITS = 15;

    /**
     * A plain decimal {@code [+-]digits[.digits]} with at most 15 digits, as the quotient of two
     * exactly representable doubles, which IEEE division rounds correctly (the classic fast path
     * of decimal conversion); NaN when the text is not of that simple form, for the full parser.
     */
    private static double plainDecimal(byte[] b, int s, int e) {
        int i = s;
        boolean neg = false;
        if (b[i] == '-' || b[i] == '+') {
            neg = b[i] == '-';
            i++;
        }
        long m = 0;
        int digits = 0;
        int frac = -1;
        for (; i < e; i++) {
            int d = b[i] - '0';
            if (d >= 0 && d <= 9) {
                m = m * 10 + d;
                digits++;
                if (frac >= 0) {
                    frac++;
                }
            } else if (b[i] == '.' && frac < 0) {
                frac = 0;
            } else {
                return Double.NaN;
            }
        }
        if (digits == 0 || digits > FAST_DIGITS) {
            return Double.NaN;
        }
        double v = frac > 0 ? m / POW10[frac] : m;
        return neg ? -v : v;
    }

    @Override
    public String stringValue() {
        return decoder.decode(w.buf, lineStart, lineEnd);
    }

    @Override
    public String pooledValue() {
        int e = lineEnd;
        byte[] b = w.buf;
        while (e > lineStart && (b[e - 1] == ' ' || b[e - 1] == '\t')) {
            e--;
        }
        return decoder.pooled(b, lineStart, e);
    }

    @Override
    public long hexValue() {
        byte[] b = w.buf;
        int s = lineStart;
        int e = lineEnd;
        while (s < e && (b[s] & 0xff) <= ' ') {
            s++;
        }
        while (e > s && (b[e - 1] & 0xff) <= ' ') {
            e--;
        }
        return hex(b, s, e);
    }

    @Override
    public String valueExcerpt() {
        return excerpt();
    }

    private String excerpt() {
        int len = Math.min(lineEnd - lineStart, MAX_EXCERPT);
        StringBuilder sb = new StringBuilder(len);
        for (int i = lineStart; i < lineStart + len; i++) {
            int c = w.buf[i] & 0xff;
            sb.append(c >= 0x20 && c < 0x7f ? (char) c : '?');
        }
        if (lineEnd - lineStart > MAX_EXCERPT) {
            sb.append("...");
        }
        return sb.toString();
    }
}
