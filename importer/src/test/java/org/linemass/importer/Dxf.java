package org.linemass.importer;

import java.io.ByteArrayOutputStream;
import java.nio.ByteBuffer;
import java.nio.ByteOrder;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import org.linemass.drawing.Drawing;

/** Test helper: writes small ASCII or binary DXF content from group code / value pairs and reads it. */
final class Dxf {

    static final String NAME = "t.dxf";

    private final List<String> lines = new ArrayList<>();

    static Dxf create() {
        return new Dxf();
    }

    /** Appends pairs given as code, value, code, value... */
    Dxf add(Object... pairs) {
        if (pairs.length % 2 != 0) {
            throw new IllegalArgumentException("pairs need an even count, got " + pairs.length);
        }
        for (Object o : pairs) {
            lines.add(String.valueOf(o));
        }
        return this;
    }

    Dxf entities() {
        return add(0, "SECTION", 2, "ENTITIES");
    }

    Dxf end() {
        return add(0, "ENDSEC", 0, "EOF");
    }

    /** The pairs of an ASCII DXF text (LF or CRLF), comments dropped: for re-writing it as binary. */
    static Dxf parse(String text) {
        String[] l = text.split("\r?\n", -1);
        Dxf d = create();
        for (int i = 0; i + 1 < l.length; i += 2) {
            if (!l[i].trim().equals("999")) {
                d.lines.add(l[i].trim());
                d.lines.add(l[i + 1]);
            }
            if (l[i].trim().equals("0") && l[i + 1].equals("EOF")) {
                break;
            }
        }
        return d;
    }

    List<String> lines() {
        return lines;
    }

    String text() {
        return String.join("\n", lines) + "\n";
    }

    byte[] ascii() {
        return text().getBytes(StandardCharsets.ISO_8859_1);
    }

    Drawing read() throws DxfInputException {
        return DxfImporter.read(NAME, ascii(), ImportOptions.DEFAULTS);
    }

    /**
     * The same pairs as a binary DXF with 2-byte codes (R13 and later), or 1-byte codes with the
     * 255 escape (older), value types by code range.
     */
    byte[] binary(boolean wideCodes) {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        out.writeBytes("AutoCAD Binary DXF\r\n\u001a\u0000".getBytes(StandardCharsets.ISO_8859_1));
        for (int i = 0; i < lines.size(); i += 2) {
            int code = Integer.parseInt(lines.get(i).trim());
            String v = lines.get(i + 1);
            if (wideCodes) {
                out.writeBytes(le(code, 2));
            } else if (code < 255) {
                out.write(code);
            } else {
                out.write(255);
                out.writeBytes(le(code, 2));
            }
            // value types by code range: DXF Reference, group code value types (FACTS.md §7.1, §7.6)
            if ((code >= 10 && code <= 59) || (code >= 110 && code <= 149) || (code >= 210 && code <= 239)
                    || (code >= 460 && code <= 469) || (code >= 1010 && code <= 1059)) {
                out.writeBytes(ByteBuffer.allocate(8).order(ByteOrder.LITTLE_ENDIAN)
                        .putDouble(Double.parseDouble(v)).array());
            } else if ((code >= 60 && code <= 79) || (code >= 170 && code <= 179) || (code >= 270 && code <= 289)
                    || (code >= 370 && code <= 389) || (code >= 400 && code <= 409) || (code >= 1060 && code <= 1070)) {
                out.writeBytes(le(Long.parseLong(v.trim()), 2));
            } else if ((code >= 90 && code <= 99) || (code >= 420 && code <= 429) || (code >= 440 && code <= 459)
                    || code == 1071) {
                out.writeBytes(le(Long.parseLong(v.trim()), 4));
            } else if (code >= 160 && code <= 169) {
                out.writeBytes(le(Long.parseLong(v.trim()), 8));
            } else if (code >= 290 && code <= 299) {
                out.write(Integer.parseInt(v.trim()));
            } else if ((code >= 310 && code <= 319) || code == 1004) {
                byte[] b = hex(v);
                out.write(b.length);
                out.writeBytes(b);
            } else {
                out.writeBytes(v.getBytes(StandardCharsets.ISO_8859_1));
                out.write(0);
            }
        }
        return out.toByteArray();
    }

    private static byte[] le(long v, int n) {
        byte[] b = new byte[n];
        for (int i = 0; i < n; i++) {
            b[i] = (byte) (v >>> (8 * i));
        }
        return b;
    }

    private static byte[] hex(String s) {
        byte[] b = new byte[s.length() / 2];
        for (int i = 0; i < b.length; i++) {
            b[i] = (byte) Integer.parseInt(s.substring(2 * i, 2 * i + 2), 16);
        }
        return b;
    }
}
