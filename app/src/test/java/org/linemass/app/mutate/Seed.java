package org.linemass.app.mutate;

import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;

/**
 * A drawing mutants are made from: its name, its bytes, and for ASCII DXF its group pairs (code
 * line, value line) as text, with the line ending the file uses. Bytes are read as ISO-8859-1 so
 * that every byte survives the round trip through text unchanged.
 */
public final class Seed {

    private static final String BINARY_SENTINEL = "AutoCAD Binary DXF";

    private final String name;
    private final byte[] bytes;
    private List<String[]> pairs;
    private String eol;

    public Seed(String name, byte[] bytes) {
        this.name = name;
        this.bytes = bytes;
    }

    public String name() {
        return name;
    }

    /** The original bytes (do not modify). */
    public byte[] bytes() {
        return bytes;
    }

    public boolean binary() {
        return new String(bytes, 0, Math.min(bytes.length, BINARY_SENTINEL.length()), StandardCharsets.ISO_8859_1)
                .equals(BINARY_SENTINEL);
    }

    /**
     * The group pairs {code, value} of an ASCII drawing (a copy the caller may change), or null
     * for a binary drawing or one with an odd number of lines.
     */
    public List<String[]> pairs() {
        if (binary()) {
            return null;
        }
        if (pairs == null) {
            String text = new String(bytes, StandardCharsets.ISO_8859_1);
            eol = text.contains("\r\n") ? "\r\n" : "\n";
            String[] lines = text.split("\r?\n", -1);
            int n = lines.length;
            if (n > 0 && lines[n - 1].isEmpty()) {
                n--;
            }
            if (n % 2 != 0) {
                pairs = List.of();
            } else {
                List<String[]> p = new ArrayList<>(n / 2);
                for (int i = 0; i < n; i += 2) {
                    p.add(new String[] {lines[i], lines[i + 1]});
                }
                pairs = p;
            }
        }
        if (pairs.isEmpty()) {
            return null;
        }
        List<String[]> copy = new ArrayList<>(pairs.size());
        pairs.forEach(p -> copy.add(p.clone()));
        return copy;
    }

    /** Writes pairs back as the bytes of a DXF file with this seed's line ending. */
    public byte[] join(List<String[]> p) {
        StringBuilder sb = new StringBuilder(bytes.length + 256);
        for (String[] pair : p) {
            sb.append(pair[0]).append(eol).append(pair[1]).append(eol);
        }
        return sb.toString().getBytes(StandardCharsets.ISO_8859_1);
    }

    /** The group code of a pair as a number, or -1 when it is not one. */
    static int code(String[] pair) {
        try {
            return Integer.parseInt(pair[0].strip());
        } catch (NumberFormatException e) {
            return -1;
        }
    }
}
