package org.linemass.importer.read;

import java.nio.charset.StandardCharsets;
import java.util.Optional;

/**
 * Recognises files that are not DXF by their first bytes (their published signatures), so the
 * refusal can say what the file is and what to do: a DWG drawing ("AC10" and two digits, the
 * release code every DWG file starts with), a ZIP archive ("PK" 3 4, which also covers office
 * documents), a PDF ("%PDF-"), PNG, JPEG, GIF, TIFF and BMP images, and gzip. A DXF file starts
 * with a group code (ASCII) or the binary sentinel, never with one of these.
 */
public final class ForeignFormat {

    private ForeignFormat() {
    }

    /** What to tell the user about a file starting with {@code head[0, length)}, if it is a known non-DXF format. */
    public static Optional<String> of(byte[] head, int length) {
        if (starts(head, length, "AC10") && length >= 6 && digit(head[4]) && digit(head[5])) {
            String release = new String(head, 0, 6, StandardCharsets.ISO_8859_1);
            return Optional.of("this is a DWG drawing (signature " + release + "), not DXF; save it as DXF from the"
                    + " program that made it and read that file");
        }
        if (starts(head, length, "PK\u0003\u0004") || starts(head, length, "PK\u0005\u0006")) {
            return Optional.of("this is a ZIP archive, not a DXF drawing; unpack it and read the DXF file inside");
        }
        if (starts(head, length, "%PDF-")) {
            return Optional.of("this is a PDF document, not a DXF drawing; export the drawing as DXF from the program"
                    + " that made it");
        }
        if (starts(head, length, "\u0089PNG") || starts(head, length, "\u00ff\u00d8\u00ff")
                || starts(head, length, "GIF8") || starts(head, length, "II*\u0000")
                || starts(head, length, "MM\u0000*") || starts(head, length, "BM")) {
            return Optional.of("this is an image (" + image(head, length) + "), not a DXF drawing; linemass reads"
                    + " DXF drawings (lines, arcs, polylines, splines), not pictures");
        }
        if (starts(head, length, "\u001f\u008b")) {
            return Optional.of("this is a gzip-compressed file, not a DXF drawing; uncompress it and read the DXF"
                    + " file inside");
        }
        return Optional.empty();
    }

    private static String image(byte[] head, int length) {
        if (starts(head, length, "\u0089PNG")) {
            return "PNG";
        }
        if (starts(head, length, "\u00ff\u00d8\u00ff")) {
            return "JPEG";
        }
        if (starts(head, length, "GIF8")) {
            return "GIF";
        }
        return starts(head, length, "BM") ? "BMP" : "TIFF";
    }

    private static boolean digit(byte b) {
        return b >= '0' && b <= '9';
    }

    private static boolean starts(byte[] head, int length, String signature) {
        byte[] s = signature.getBytes(StandardCharsets.ISO_8859_1);
        if (length < s.length) {
            return false;
        }
        for (int i = 0; i < s.length; i++) {
            if (head[i] != s[i]) {
                return false;
            }
        }
        return true;
    }
}
