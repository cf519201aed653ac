package org.linemass.importer.read;

import java.nio.ByteBuffer;
import java.nio.charset.CharacterCodingException;
import java.nio.charset.Charset;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import java.util.Arrays;

/**
 * Decodes DXF string values: ASCII fast path, the file's code page otherwise (malformed bytes
 * become U+FFFD, never an exception), and the two escapes older files use for characters outside
 * their code page: {@code \U+XXXX} (a UTF-16 code unit) and {@code \M+nXXXX}, a double-byte
 * character XXXX of the East Asian code page that the digit n names (1 Japanese cp932, 2
 * Traditional Chinese cp950, 3 Korean Wansung cp949, 4 Korean Johab cp1361, 5 Simplified Chinese
 * cp936). An escape that is malformed (short or non-hex digits, another digit), whose code page
 * the JVM lacks, or whose two bytes do not decode to exactly one character stays as literal text.
 * Values without a backslash skip the escape scan. A small pool returns the same String for
 * repeated names.
 */
final class TextDecoder {

    private static final int POOL_SIZE = 1024;

    /** Length of {@code \U+XXXX}. */
    private static final int UNICODE_ESCAPE = 7;
    /** Length of {@code \M+nXXXX}. */
    private static final int MULTIBYTE_ESCAPE = 8;

    /**
     * Java charsets of the {@code \M+n} code pages, index n; null where n is unused or the JVM
     * does not have the charset (the escape is then kept as text).
     */
    private static final Charset[] MULTIBYTE_PAGES = {null, available("MS932"), available("x-windows-950"),
        available("x-windows-949"), available("x-Johab"), available("GBK")};
    private static final int POOL_MAX_BYTES = 64;

    private Charset charset = Charset.forName("windows-1252");
    private final byte[][] poolKeys = new byte[POOL_SIZE][];
    private final String[] poolValues = new String[POOL_SIZE];

    void charset(Charset cs) {
        if (!cs.equals(charset)) {
            charset = cs;
            Arrays.fill(poolKeys, null);
            Arrays.fill(poolValues, null);
        }
    }

    String decode(byte[] b, int from, int to) {
        boolean ascii = true;
        for (int i = from; i < to; i++) {
            if (b[i] < 0) {
                ascii = false;
                break;
            }
        }
        String s = ascii ? new String(b, from, to - from, StandardCharsets.ISO_8859_1)
                : new String(b, from, to - from, charset);
        return s.indexOf('\\') >= 0 ? unescape(s) : s;
    }

    String pooled(byte[] b, int from, int to) {
        int len = to - from;
        if (len > POOL_MAX_BYTES) {
            return decode(b, from, to);
        }
        int h = 1;
        for (int i = from; i < to; i++) {
            h = 31 * h + b[i];
        }
        int slot = (h ^ (h >>> 16)) & (POOL_SIZE - 1);
        byte[] key = poolKeys[slot];
        if (key != null && sameBytes(key, b, from, len)) {
            return poolValues[slot];
        }
        String s = decode(b, from, to);
        poolKeys[slot] = Arrays.copyOfRange(b, from, to);
        poolValues[slot] = s;
        return s;
    }

    /** Plain loop: for the few bytes of a name it beats the vectorised mismatch's set-up. */
    private static boolean sameBytes(byte[] key, byte[] b, int from, int len) {
        if (key.length != len) {
            return false;
        }
        for (int i = 0; i < len; i++) {
            if (key[i] != b[from + i]) {
                return false;
            }
        }
        return true;
    }

    /** Replaces the well-formed escapes of {@code s}; package-private for tests. */
    static String unescape(String s) {
        StringBuilder sb = new StringBuilder(s.length());
        int i = 0;
        while (i < s.length()) {
            if (i + UNICODE_ESCAPE <= s.length() && s.startsWith("\\U+", i) && isHex(s, i + 3, i + UNICODE_ESCAPE)) {
                sb.append((char) Integer.parseInt(s.substring(i + 3, i + UNICODE_ESCAPE), 16));
                i += UNICODE_ESCAPE;
                continue;
            }
            if (i + MULTIBYTE_ESCAPE <= s.length() && s.startsWith("\\M+", i)) {
                String c = multibyte(s, i);
                if (c != null) {
                    sb.append(c);
                    i += MULTIBYTE_ESCAPE;
                    continue;
                }
            }
            sb.append(s.charAt(i++));
        }
        return sb.toString();
    }

    /** The character of the {@code \M+nXXXX} escape at {@code at}, or null to keep it as text. */
    private static String multibyte(String s, int at) {
        int page = s.charAt(at + 3) - '0';
        if (page < 1 || page >= MULTIBYTE_PAGES.length || MULTIBYTE_PAGES[page] == null
                || !isHex(s, at + 4, at + MULTIBYTE_ESCAPE)) {
            return null;
        }
        int code = Integer.parseInt(s.substring(at + 4, at + MULTIBYTE_ESCAPE), 16);
        byte[] pair = {(byte) (code >>> 8), (byte) code};
        try {
            String c = MULTIBYTE_PAGES[page].newDecoder().onMalformedInput(CodingErrorAction.REPORT)
                    .onUnmappableCharacter(CodingErrorAction.REPORT).decode(ByteBuffer.wrap(pair)).toString();
            // two single-byte characters (a lead byte below 0x80) are not one double-byte character
            return c.codePointCount(0, c.length()) == 1 ? c : null;
        } catch (CharacterCodingException e) {
            return null;
        }
    }

    private static Charset available(String name) {
        try {
            return Charset.isSupported(name) ? Charset.forName(name) : null;
        } catch (IllegalArgumentException e) {
            return null;
        }
    }

    private static boolean isHex(String s, int from, int to) {
        for (int i = from; i < to; i++) {
            if (Character.digit(s.charAt(i), 16) < 0) {
                return false;
            }
        }
        return true;
    }
}
