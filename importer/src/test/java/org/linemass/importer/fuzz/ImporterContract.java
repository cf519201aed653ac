package org.linemass.importer.fuzz;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import org.linemass.drawing.Block;
import org.linemass.drawing.Drawing;
import org.linemass.drawing.ImportNote;
import org.linemass.drawing.Insert;
import org.linemass.geometry.Box3;
import org.linemass.geometry.Segment;
import org.linemass.importer.DxfImporter;
import org.linemass.importer.DxfInputException;
import org.linemass.importer.ImportOptions;

/**
 * What the importer promises for any input whatever, checked on one input:
 * <ul>
 * <li>the only thing that leaves {@link DxfImporter#read(String, byte[], ImportOptions)} is a
 * {@link DxfInputException} whose message is one line starting with the file name; any other
 * exception or error fails the fuzz test as it is;</li>
 * <li>that exception is not the importer's last-resort wrapper around a runtime exception, a
 * StackOverflowError or an OutOfMemoryError (those are crashes the wrapper merely hides);</li>
 * <li>a drawing that is returned holds only usable numbers: finite parameter ranges, end points,
 * bounding boxes and insert placements, array counts of at least one, one-line notes.</li>
 * </ul>
 */
final class ImporterContract {

    static final String NAME = "fuzz.dxf";

    /**
     * Beginnings of the importer's last-resort messages (DxfImporter.guarded): they say a
     * RuntimeException or a StackOverflowError/OutOfMemoryError was caught, i.e. a crash.
     */
    private static final String[] CRASH_WRAPPERS = {
        "internal error while reading the drawing", "drawing too large or too deeply nested to read"};

    private ImporterContract() {
    }

    static void check(byte[] content) {
        Drawing d;
        try {
            d = DxfImporter.read(NAME, content, ImportOptions.DEFAULTS);
        } catch (DxfInputException e) {
            String m = e.getMessage();
            assertTrue(m.startsWith(NAME), () -> "message must name the file: " + m);
            assertFalse(m.contains("\n") || m.contains("\r"), () -> "message must be one line: " + m);
            for (String w : CRASH_WRAPPERS) {
                if (e.problem().startsWith(w)) {
                    fail("crash hidden as an input error: " + m);
                }
            }
            return;
        }
        checkDrawing(d);
    }

    private static void checkDrawing(Drawing d) {
        assertTrue(d.modelSpace() != null, "model space is always present");
        for (Block b : d.blocks().values()) {
            for (Segment s : b.segments()) {
                checkSegment(s);
            }
            for (Insert i : b.inserts()) {
                assertTrue(i.placement().isFinite(), () -> "insert placement not finite: " + i);
                assertTrue(i.columnStep().isFinite() && i.rowStep().isFinite(), () -> "array step not finite: " + i);
                assertTrue(i.columns() >= 1 && i.rows() >= 1, () -> "array counts: " + i);
            }
        }
        for (ImportNote n : d.notes()) {
            assertTrue(n.message() != null && !n.message().isEmpty(), () -> "empty note: " + n);
            assertFalse(n.message().contains("\n") || n.message().contains("\r"),
                    () -> "note must be one line: " + n);
        }
    }

    private static void checkSegment(Segment s) {
        double t0 = s.tStart();
        double t1 = s.tEnd();
        assertTrue(Double.isFinite(t0) && Double.isFinite(t1) && t0 <= t1,
                () -> "parameter range [" + t0 + ", " + t1 + "] of " + s.source());
        assertTrue(s.start().isFinite() && s.end().isFinite(), () -> "end points not finite: " + s);
        Box3 box = s.bounds();
        assertTrue(box.min().isFinite() && box.max().isFinite(), () -> "bounds not finite: " + s);
    }
}
