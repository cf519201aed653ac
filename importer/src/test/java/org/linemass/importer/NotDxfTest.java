package org.linemass.importer;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Files that are not DXF are refused with one line naming the file and saying what it is and
 * what to do. The first bytes are the formats' published signatures: DWG files start with their
 * release code "AC10nn" (AC1032 for the 2018 format), ZIP local file headers with "PK" 3 4, PDF
 * with "%PDF-", JPEG with FF D8 FF, GIF with "GIF89a".
 */
class NotDxfTest {

    private static String refusal(String name, String head) {
        byte[] b = head.getBytes(StandardCharsets.ISO_8859_1);
        return assertThrows(DxfInputException.class, () -> DxfImporter.read(name, b, ImportOptions.DEFAULTS))
                .getMessage();
    }

    @Test
    void dwg() {
        assertEquals("frame.dxf: this is a DWG drawing (signature AC1032), not DXF; save it as DXF from the program"
                + " that made it and read that file", refusal("frame.dxf", "AC1032\u0000\u0000\u0000\u0000\u0000"));
    }

    @Test
    void dwgFromAFile_namesTheFile(@TempDir Path dir) throws Exception {
        Path f = dir.resolve("bench.dwg");
        Files.write(f, "AC1015\u0000\u0000\u0000\u0000\u0000\u0000\u0001".getBytes(StandardCharsets.ISO_8859_1));
        DxfInputException e = assertThrows(DxfInputException.class, () -> DxfImporter.read(f, ImportOptions.DEFAULTS));
        assertEquals(f + ": this is a DWG drawing (signature AC1015), not DXF; save it as DXF from the program that"
                + " made it and read that file", e.getMessage());
    }

    @Test
    void zipPdfAndImages() {
        assertEquals("a.dxf: this is a ZIP archive, not a DXF drawing; unpack it and read the DXF file inside",
                refusal("a.dxf", "PK\u0003\u0004\u0014\u0000"));
        assertEquals("b.dxf: this is a PDF document, not a DXF drawing; export the drawing as DXF from the program"
                + " that made it", refusal("b.dxf", "%PDF-1.7\n"));
        assertEquals("c.dxf: this is an image (JPEG), not a DXF drawing; linemass reads DXF drawings (lines, arcs,"
                + " polylines, splines), not pictures", refusal("c.dxf", "\u00ff\u00d8\u00ff\u00e0\u0000\u0010JFIF"));
        assertEquals("d.dxf: this is an image (GIF), not a DXF drawing; linemass reads DXF drawings (lines, arcs,"
                + " polylines, splines), not pictures", refusal("d.dxf", "GIF89a\u0001\u0000"));
    }

    @Test
    void textThatMerelyMentionsAC10_isNotTakenForDwg() {
        // "AC10" followed by letters is no DWG signature: the ordinary not-a-group-code message
        assertEquals("e.dxf:1: expected a group code (an integer), got 'AC10XY'", refusal("e.dxf", "AC10XY\n0\n"));
    }
}
