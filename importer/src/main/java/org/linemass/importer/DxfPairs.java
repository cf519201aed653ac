package org.linemass.importer;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import org.linemass.importer.read.AsciiGroupSource;
import org.linemass.importer.read.BinaryGroupSource;
import org.linemass.importer.read.ReadException;

/**
 * The group pairs of an ASCII DXF held in memory, with the byte places of their lines, read by the
 * importer's own tokenizer (the one {@link DxfImporter} reads with): for writers that copy a drawing
 * and splice new content in without touching its bytes. A UTF-8 byte order mark is stepped over;
 * 999 comments are not pairs; values are decoded one byte per character (ISO-8859-1, so that they
 * match the bytes one for one) and trimmed. The pairs run up to and including {@code 0 EOF}; what
 * follows it is not read. Stateless.
 */
public final class DxfPairs {

    /**
     * One pair.
     *
     * @param code the group code
     * @param value the value, trimmed
     * @param offset byte offset of the code line
     * @param valueOffset byte offset of the value line
     * @param valueLength length of the value line in bytes, without its line end
     */
    public record Pair(int code, String value, int offset, int valueOffset, int valueLength) {
    }

    private static final byte[] UTF8_BOM = {(byte) 0xEF, (byte) 0xBB, (byte) 0xBF};

    private DxfPairs() {
    }

    /** True when {@code content} starts with the binary DXF sentinel. */
    public static boolean isBinary(byte[] content) {
        return BinaryGroupSource.startsWithSentinel(content, content.length);
    }

    /**
     * The pairs of {@code content} up to and including {@code 0 EOF}.
     *
     * @throws DxfInputException for binary DXF, when the pairs break before {@code 0 EOF} (a code
     *     line that is not a number, a code without its value line) or when there is no {@code 0 EOF}
     *     (then at the line after the last pair); the message names {@code file} and the line
     */
    public static List<Pair> upToEof(String file, byte[] content) throws DxfInputException {
        if (isBinary(content)) {
            throw new DxfInputException(file, 0, "", "", "binary DXF has no text pairs");
        }
        boolean bom = content.length >= 3 && content[0] == UTF8_BOM[0] && content[1] == UTF8_BOM[1]
                && content[2] == UTF8_BOM[2];
        AsciiGroupSource src = AsciiGroupSource.of(file, content, bom ? UTF8_BOM.length : 0, Integer.MAX_VALUE);
        src.charset(StandardCharsets.ISO_8859_1);
        List<Pair> pairs = new ArrayList<>();
        try {
            while (src.next()) {
                String value = src.stringValue().trim();
                pairs.add(new Pair(src.code(), value, (int) src.pairOffset(), (int) src.valueOffset(),
                        src.valueLength()));
                if (src.code() == 0 && value.equals("EOF")) {
                    return pairs;
                }
            }
        } catch (ReadException e) {
            throw new DxfInputException(file, (int) Math.min(e.position(), Integer.MAX_VALUE), "", "", e.problem());
        } catch (IOException e) {
            // an in-memory source does no I/O
            throw new org.linemass.errors.InternalException("reading pairs from memory failed: " + e.getMessage(), e);
        }
        // the line after the last pair, where 0/EOF should have been
        int after = pairs.isEmpty() ? 1 : (int) Math.min(src.position() + 2, Integer.MAX_VALUE);
        throw new DxfInputException(file, after, "", "", "the drawing does not end with 0/EOF");
    }
}
