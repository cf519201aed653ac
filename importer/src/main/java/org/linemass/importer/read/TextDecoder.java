package org.linemass.importer.read;

import java.nio.charset.Charset;
import java.nio.charset.StandardCharsets;
import java.util.Arrays;

/**
 * Decodes DXF string values: ASCII fast path, the file's code page otherwise (malformed bytes
 * become U+FFFD, never an exception), and the {@code \U+XXXX} escapes older files use for
 * characters outside their code page. A small pool returns the same String for repeated names.
 */
final class TextDecoder {

    private static final int POOL_SIZE = 1024;
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
        return s.indexOf("\\U+") >= 0 ? unescape(s) : s;
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

    private static String unescape(String s) {
        StringBuilder sb = new StringBuilder(s.length());
        int i = 0;
        while (i < s.length()) {
            if (i + 7 <= s.length() && s.startsWith("\\U+", i) && isHex(s, i + 3, i + 7)) {
                sb.append((char) Integer.parseInt(s.substring(i + 3, i + 7), 16));
                i += 7;
            } else {
                sb.append(s.charAt(i++));
            }
        }
        return sb.toString();
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
