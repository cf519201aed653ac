package org.linemass.importer;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Optional;
import org.junit.jupiter.api.Test;
import org.linemass.drawing.Drawing;
import org.linemass.geometry.Straight;

/**
 * Values the importer does not need (comments, extended data, the text of entities without wire)
 * are stepped over without being held, so only the values it keeps are limited in length: a
 * drawing with a comment longer than the line limit is read, a layer name that long is refused.
 */
class LongUnusedValueTest {

    /** A small line limit, so the test values are small too. */
    private static final ImportOptions LIMIT_1000 = new ImportOptions(Optional.empty(), 64, 1000, 1000, 1000);

    private static final String LONG = "x".repeat(5000);

    private static Dxf drawing(int code, String value) {
        return Dxf.create().entities()
                .add(0, "LINE", 8, "FRAME", 10, 0, 20, 0, 30, 0, 11, 3, 21, 4, 31, 0)
                .add(0, "MTEXT", 8, "NOTES", 1, "label", 3, code == 3 ? value : "a")
                .add(0, "LINE", 8, "FRAME", 999, code == 999 ? value : "c", 1000, code == 1000 ? value : "d",
                        10, 0, 20, 0, 30, 0, 11, 6, 21, 8, 31, 0).end();
    }

    private static void assertBothLinesRead(Drawing d) {
        assertEquals(2, d.modelSpace().segments().size());
        // 3-4-5 and 6-8-10 (Pythagoras), exact in binary floating point
        assertEquals(5.0, ((Straight) d.modelSpace().segments().get(0)).length(), 0.0);
        assertEquals(10.0, ((Straight) d.modelSpace().segments().get(1)).length(), 0.0);
    }

    @Test
    void longCommentExtendedDataAndText_areSteppedOver_ascii() throws Exception {
        for (int code : new int[] {999, 1000, 3}) {
            assertBothLinesRead(DxfImporter.read(Dxf.NAME, drawing(code, LONG).ascii(), LIMIT_1000));
        }
    }

    @Test
    void longExtendedDataAndText_areSteppedOver_binary() throws Exception {
        for (int code : new int[] {1000, 3}) {
            assertBothLinesRead(DxfImporter.read(Dxf.NAME, drawing(code, LONG).binary(true), LIMIT_1000));
        }
    }

    @Test
    void aLongValueThatIsKept_isStillLimited() {
        Dxf d = Dxf.create().entities().add(0, "LINE", 8, LONG, 10, 0, 20, 0, 30, 0, 11, 3, 21, 4, 31, 0).end();
        DxfInputException e = assertThrows(DxfInputException.class,
                () -> DxfImporter.read(Dxf.NAME, d.ascii(), LIMIT_1000));
        assertTrue(e.getMessage().contains("line longer than 1000 bytes"), e.getMessage());
    }
}
