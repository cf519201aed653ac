package org.linemass.reports.dxf;

import java.util.ArrayList;
import java.util.List;

/**
 * Splits ASCII DXF text (decoded one byte per char) into group-code/value pairs, keeping the
 * character offset where each pair's code line starts so that new content can be spliced in
 * without touching the original bytes. Lines may end in LF or CR LF.
 */
final class DxfPairScanner {

    /** One pair: its group code, its value (trimmed), and the offset of the code line. */
    record Pair(int code, String value, int offset, int valueOffset, int valueLength) {
    }

    private DxfPairScanner() {
    }

    /** The pairs of {@code text}; a trailing unpaired line or a non-numeric code ends the scan. */
    static List<Pair> scan(String text) {
        List<Pair> pairs = new ArrayList<>();
        int pos = 0;
        int n = text.length();
        while (pos < n) {
            int codeStart = pos;
            int codeEnd = lineEnd(text, pos);
            int valueStart = next(text, codeEnd);
            if (valueStart >= n && codeEnd >= n) {
                break;
            }
            int valueEnd = lineEnd(text, valueStart);
            int code;
            try {
                code = Integer.parseInt(text.substring(codeStart, codeEnd).trim());
            } catch (NumberFormatException e) {
                break;
            }
            String raw = text.substring(valueStart, valueEnd);
            pairs.add(new Pair(code, raw.trim(), codeStart, valueStart, valueEnd - valueStart));
            pos = next(text, valueEnd);
        }
        return pairs;
    }

    /** End of the line starting at {@code pos}, excluding CR LF or LF. */
    private static int lineEnd(String t, int pos) {
        int lf = t.indexOf('\n', pos);
        int end = lf < 0 ? t.length() : lf;
        if (end > pos && t.charAt(end - 1) == '\r') {
            end--;
        }
        return end;
    }

    /** Start of the line after the one ending at {@code end}. */
    private static int next(String t, int end) {
        int p = end;
        if (p < t.length() && t.charAt(p) == '\r') {
            p++;
        }
        if (p < t.length() && t.charAt(p) == '\n') {
            p++;
        }
        return p;
    }
}
