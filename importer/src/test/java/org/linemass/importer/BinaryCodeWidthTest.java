package org.linemass.importer;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.nio.ByteBuffer;
import java.nio.ByteOrder;
import java.nio.charset.StandardCharsets;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.api.Test;
import org.linemass.drawing.Drawing;
import org.linemass.geometry.Straight;

/**
 * The width of every value-type range of binary DXF, written byte by byte here (not through the
 * importer's or the {@code Dxf} helper's tables) from the DXF Reference, "Group Code Value
 * Types": one group of each range inside a LINE, followed by the LINE's end point, which only
 * comes out right when the reader stepped over the value with the reference's width. A stream
 * that slipped stops with a message instead of producing a drawing.
 */
class BinaryCodeWidthTest {

    private static final byte[] SENTINEL = "AutoCAD Binary DXF\r\n\u001a\u0000".getBytes(StandardCharsets.ISO_8859_1);

    private final ByteArrayOutputStream out = new ByteArrayOutputStream();

    private void code(int c) {
        out.write(c & 0xff);
        out.write((c >>> 8) & 0xff);
    }

    private void str(int c, String s) {
        code(c);
        out.writeBytes(s.getBytes(StandardCharsets.ISO_8859_1));
        out.write(0);
    }

    private void dbl(int c, double v) {
        code(c);
        out.writeBytes(ByteBuffer.allocate(8).order(ByteOrder.LITTLE_ENDIAN).putDouble(v).array());
    }

    private void intOf(int c, long v, int width) {
        code(c);
        for (int i = 0; i < width; i++) {
            out.write((int) (v >>> (8 * i)) & 0xff);
        }
    }

    /** A drawing of one LINE (0,0,0)-(3,4,0) holding group {@code c} written with {@code width} bytes. */
    private byte[] lineWith(int c, String type, int width) {
        out.writeBytes(SENTINEL);
        str(0, "SECTION");
        str(2, "ENTITIES");
        str(0, "LINE");
        str(8, "0");
        dbl(10, 0);
        dbl(20, 0);
        dbl(30, 0);
        switch (type) {
            case "string" -> str(c, "AB");
            case "double" -> dbl(c, 1.5);
            case "bool" -> intOf(c, 1, 1);
            default -> intOf(c, 7, width);
        }
        dbl(11, 3);
        dbl(21, 4);
        dbl(31, 0);
        str(0, "ENDSEC");
        str(0, "EOF");
        return out.toByteArray();
    }

    /** DXF Reference, "Group Code Value Types": code, type, bytes of the value in binary DXF. */
    @ParameterizedTest(name = "group {0}: {1}, {2} bytes")
    @CsvSource({
        "62, int, 2", "90, int, 4", "160, int, 8", "169, int, 8", "170, int, 2", "280, int, 2", "290, bool, 1",
        "370, int, 2", "400, int, 2", "420, int, 4", "429, int, 4", "440, int, 4", "449, int, 4",
        "450, int, 4", "459, int, 4", "460, double, 8", "469, double, 8", "470, string, 0", "479, string, 0",
        "480, string, 0", "481, string, 0", "999, string, 0", "1000, string, 0", "1010, double, 8",
        "1059, double, 8", "1060, int, 2", "1070, int, 2", "1071, int, 4"})
    void eachRangeIsSteppedOverWithTheReferenceWidth(int c, String type, int width) throws Exception {
        Drawing d = DxfImporter.read("w.dxf", lineWith(c, type, width), ImportOptions.DEFAULTS);
        Straight s = (Straight) d.modelSpace().segments().get(0);
        assertEquals(5.0, s.length(), 0.0, "exact: the 3-4-5 line");
    }

    @Test
    void aLongWrittenWithTheWrongWidth_stopsWithAMessage() {
        // group 450 written as 8 bytes, as a reader with the wrong table would expect: the stream slips
        DxfInputException e = assertThrows(DxfInputException.class,
                () -> DxfImporter.read("w.dxf", lineWith(450, "int", 8), ImportOptions.DEFAULTS));
        assertTrue(e.getMessage().contains("the binary stream cannot be followed from here"), e.getMessage());
        assertTrue(e.getMessage().startsWith("w.dxf:byte "), e.getMessage());
    }

    @Test
    void aGroupCodeOutsideTheReferenceTable_stopsWithAMessage() {
        for (int undefined : new int[] {150, 200, 250, 500, 1072}) {
            out.reset();
            DxfInputException e = assertThrows(DxfInputException.class,
                    () -> DxfImporter.read("w.dxf", lineWith(undefined, "int", 2), ImportOptions.DEFAULTS));
            assertTrue(e.getMessage().contains("group code " + undefined + " is not a DXF group code"), e.getMessage());
        }
    }
}
