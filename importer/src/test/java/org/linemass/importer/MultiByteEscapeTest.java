package org.linemass.importer;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.linemass.drawing.Drawing;
import org.linemass.geometry.Segment;

/**
 * {@code \M+nXXXX} escapes in layer and block names of a pre-R2007 file
 * (testdata/importer/mbcs_escape_layer_r2000.dxf, a wire shelf: see the folder's README).
 */
class MultiByteEscapeTest {

    // Microsoft cp932 to Unicode table (CP932.TXT, table version 2.01): 0x9249 -> U+68DA, 0x906A -> U+91DD
    private static final String SHELF_WIRE_D4 = "\u68da\u91dd_D4";
    private static final String SHELF_STAY = "\u68da_STAY";

    private static Drawing shelf() throws Exception {
        return DxfImporter.read(SharedFiles.testdata().resolve("mbcs_escape_layer_r2000.dxf"), ImportOptions.DEFAULTS);
    }

    @Test
    void layerAndBlockNames_areDecodedInTablesEntitiesAndInserts() throws Exception {
        Drawing d = shelf();
        assertTrue(d.layer(SHELF_WIRE_D4).defined(), "LAYER table entry decoded: " + d.layers().keySet());
        List<Segment> model = d.modelSpace().segments();
        assertEquals(SHELF_WIRE_D4, model.get(0).source().layer());
        assertEquals("2B", model.get(0).source().handle());
        assertNotNull(d.blocks().get(SHELF_STAY), "block decoded: " + d.blocks().keySet());
        assertEquals(SHELF_STAY, d.modelSpace().inserts().get(0).blockName());
    }

    @Test
    void malformedEscapes_stayLiteralInNames() throws Exception {
        Drawing d = shelf();
        List<Segment> model = d.modelSpace().segments();
        assertEquals("SHORT_\\M+1906", model.get(1).source().layer(), "three hex digits");
        assertEquals("BAD_\\M+79249_\\M+1GG49", model.get(2).source().layer(), "page 7 and non-hex digits");
        assertTrue(d.layer("SHORT_\\M+1906").defined());
        assertTrue(d.notes().stream().noneMatch(n -> n.severity().equals("error")), d.notes().toString());
    }
}
