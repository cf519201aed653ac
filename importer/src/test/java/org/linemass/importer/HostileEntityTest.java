package org.linemass.importer;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.List;
import java.util.Optional;
import org.junit.jupiter.api.Test;
import org.linemass.drawing.Drawing;
import org.linemass.drawing.ImportNote;

/** The remaining entity-level and structure-level rejections, each with its exact message. */
class HostileEntityTest {

    private static String skippedMessage(Dxf dxf, ImportOptions o) throws DxfInputException {
        Drawing d = DxfImporter.read(Dxf.NAME, dxf.ascii(), o);
        List<ImportNote> errors = d.notes().stream().filter(ImportNote::skippedGeometry).toList();
        assertEquals(1, errors.size(), () -> "notes: " + d.notes());
        return errors.get(0).message();
    }

    private static String skipped(Object... pairs) throws DxfInputException {
        return skippedMessage(Dxf.create().entities().add(pairs).end(), ImportOptions.DEFAULTS);
    }

    private static String fails(Dxf dxf) {
        return assertThrows(DxfInputException.class, () -> dxf.read()).getMessage();
    }

    @Test
    void splineRejections() throws Exception {
        assertEquals("declares 3 fit points but has 2",
                skipped(0, "SPLINE", 71, 3, 74, 3, 11, 0, 21, 0, 11, 1, 21, 1));
        assertEquals("has no control points and 1 fit points (need at least 2)",
                skipped(0, "SPLINE", 71, 3, 74, 1, 11, 0, 21, 0));
        assertEquals("fit points are all equal; no curve to interpolate",
                skipped(0, "SPLINE", 71, 3, 74, 2, 11, 4, 21, 4, 11, 4, 21, 4));
        assertEquals("start tangent is zero",
                skipped(0, "SPLINE", 71, 3, 74, 2, 12, 0, 22, 0, 32, 0, 11, 0, 21, 0, 11, 1, 21, 0));
        assertEquals("degree 0 is not supported (1 to 32)", skipped(0, "SPLINE", 71, 0, 72, 2, 73, 1, 40, 0, 40, 1,
                10, 0, 20, 0));
        assertEquals("has 2 control points; degree 3 needs at least 4", skipped(0, "SPLINE", 71, 3, 72, 6, 73, 2,
                40, 0, 40, 0, 40, 0, 40, 1, 40, 1, 40, 1, 10, 0, 20, 0, 10, 1, 20, 0));
        assertEquals("parameter range is empty (knot[1] = knot[2] = 1.0)", skipped(0, "SPLINE", 71, 1, 72, 4, 73, 2,
                40, 0, 40, 1, 40, 1, 40, 2, 10, 0, 20, 0, 10, 1, 20, 0));
        assertEquals("weight 1 must be positive, got -1.0", skipped(0, "SPLINE", 71, 1, 72, 4, 73, 2, 40, 0, 40, 0,
                40, 1, 40, 1, 10, 0, 20, 0, 41, 1, 10, 1, 20, 0, 41, -1));
        assertEquals("declares 5000 knots, more than the limit 4096", skippedMessage(Dxf.create().entities()
                .add(0, "SPLINE", 71, 1, 72, 5000, 73, 2).end(), new ImportOptions(Optional.empty(), 64, 1 << 20,
                4096, 4096)));
        assertEquals("knot (group code 40) is not a usable number: NaN", skipped(0, "SPLINE", 71, 1, 72, 4, 73, 2,
                40, 0, 40, "NaN", 40, 1, 40, 1, 10, 0, 20, 0, 10, 1, 20, 0));
    }

    /** Found by the mutation campaign: a denormal radius gave a finding a NaN place (an internal error, exit 3). */
    @Test
    void tinyRadius_isSkipped() throws Exception {
        assertEquals("ARC radius 4.9E-324 is below 1.0E-99 drawing units, too small to measure",
                skipped(0, "ARC", 10, 45, 20, 15, 40, "4.9e-324", 50, 45, 51, 135));
    }

    @Test
    void ellipseRejections() throws Exception {
        assertEquals("ELLIPSE needs a non-zero major axis and a positive axis ratio, got Vec3[x=0.0, y=0.0, z=0.0] and 0.5",
                skipped(0, "ELLIPSE", 11, 0, 21, 0, 31, 0, 40, 0.5));
        assertEquals("ELLIPSE needs a non-zero major axis and a positive axis ratio, got Vec3[x=1.0, y=0.0, z=0.0] and -0.5",
                skipped(0, "ELLIPSE", 11, 1, 21, 0, 31, 0, 40, -0.5));
        assertEquals("ELLIPSE major axis Vec3[x=0.0, y=0.0, z=2.0] is parallel to its normal Vec3[x=0.0, y=0.0, z=1.0]",
                skipped(0, "ELLIPSE", 11, 0, 21, 0, 31, 2, 40, 0.5));
    }

    @Test
    void insertRejections() throws Exception {
        Dxf base = Dxf.create().add(0, "SECTION", 2, "BLOCKS", 0, "BLOCK", 2, "A", 0, "ENDBLK", 0, "ENDSEC");
        assertEquals("has no block name (group code 2)",
                skippedMessage(copy(base).entities().add(0, "INSERT", 10, 1).end(), ImportOptions.DEFAULTS));
        assertEquals("x scale (group code 41) is not a usable number: Infinity",
                skippedMessage(copy(base).entities().add(0, "INSERT", 2, "A", 41, "Infinity").end(),
                        ImportOptions.DEFAULTS));
        assertEquals("negative row count (group code 71): -3",
                skippedMessage(copy(base).entities().add(0, "INSERT", 2, "A", 71, -3).end(), ImportOptions.DEFAULTS));
        assertEquals("column count (group code 70) is not an integer: 2.5",
                skippedMessage(copy(base).entities().add(0, "INSERT", 2, "A", 70, 2.5).end(), ImportOptions.DEFAULTS));
    }

    private static Dxf copy(Dxf d) {
        Dxf c = Dxf.create();
        c.add(d.lines().toArray());
        return c;
    }

    @Test
    void polylineRejections() throws Exception {
        assertEquals("VERTEX value for group code 20 is not a number: 'north'", skipped(0, "POLYLINE", 70, 0,
                0, "VERTEX", 10, 0, 20, "north", 0, "VERTEX", 10, 1, 0, "SEQEND"));
        assertEquals("has more than 2 vertices", skippedMessage(Dxf.create().entities().add(0, "POLYLINE",
                0, "VERTEX", 10, 0, 0, "VERTEX", 10, 1, 0, "VERTEX", 10, 2, 0, "SEQEND").end(),
                new ImportOptions(Optional.empty(), 64, 1 << 20, 100, 2)));
        assertEquals("coordinate (group code 30) is out of range: 1.0E200 (limit 1.0E99)",
                skipped(0, "POLYLINE", 30, 1e200, 0, "VERTEX", 10, 0, 0, "VERTEX", 10, 1, 0, "SEQEND"));
        assertEquals("bulge (group code 42) is not a usable number: NaN",
                skipped(0, "LWPOLYLINE", 90, 2, 10, 0, 20, 0, 42, "NaN", 10, 1, 20, 0));
    }

    @Test
    void structureRejections() throws DxfInputException {
        assertEquals("t.dxf:5: LINE: expected '0 ENDSEC' to close the HEADER section",
                fails(Dxf.create().add(0, "SECTION", 2, "HEADER", 0, "LINE").entities().end()));
        // a HEADER the file ends in is read, with a warning naming the line (structure recovery)
        assertEquals(java.util.List.of("file structure repaired at line 1: the file ends inside the HEADER section (no"
                + " '0 ENDSEC'); nothing follows it"), warnings(Dxf.create().add(0, "SECTION", 2, "HEADER", 9,
                        "$ACADVER", 1, "AC1015")));
        assertEquals("t.dxf:7: HEADER: value of group code 70 is not a number: 'mm'",
                fails(Dxf.create().add(0, "SECTION", 2, "HEADER", 9, "$INSUNITS", 70, "mm", 0, "ENDSEC")));
        assertEquals("t.dxf:13: LAYER: value of group code 62 is not a number: 'red'",
                fails(Dxf.create().add(0, "SECTION", 2, "TABLES", 0, "TABLE", 2, "LAYER", 0, "LAYER", 2, "A",
                        62, "red", 0, "ENDTAB", 0, "ENDSEC")));
        assertEquals("t.dxf:5: BLOCK: block 'A' has a base point that is not finite: Vec3[x=NaN, y=0.0, z=0.0]",
                fails(Dxf.create().add(0, "SECTION", 2, "BLOCKS", 0, "BLOCK", 2, "A", 10, "NaN", 0, "ENDBLK",
                        0, "ENDSEC")));
        assertEquals(java.util.List.of("file structure repaired at line 9: '0 EOF' inside the OBJECTS section (no"
                + " '0 ENDSEC' before it); the section was closed there"), warnings(Dxf.create().add(0, "SECTION", 2,
                        "OBJECTS", 0, "DICTIONARY", 0, "LINE", 0, "EOF")));
    }

    private static java.util.List<String> warnings(Dxf dxf) throws DxfInputException {
        return dxf.read().notes().stream().filter(n -> n.kind().equals("structure_repaired"))
                .map(org.linemass.drawing.ImportNote::message).toList();
    }

    @Test
    void binaryStructureRejections() {
        byte[] b = Dxf.create().entities().add(0, "TEXT", 1, "unterminated").binary(true);
        byte[] cut = java.util.Arrays.copyOf(b, b.length - 1);
        assertEquals("t.dxf:byte 50: TEXT: file ends inside the string value of group code 1",
                assertThrows(DxfInputException.class, () -> DxfImporter.read(Dxf.NAME, cut, ImportOptions.DEFAULTS))
                        .getMessage());
        byte[] esc = {'A', 'u', 't', 'o', 'C', 'A', 'D', ' ', 'B', 'i', 'n', 'a', 'r', 'y', ' ', 'D', 'X', 'F', '\r',
            '\n', 0x1a, 0, 0, 'S', 'E', 'C', 'T', 'I', 'O', 'N', 0, (byte) 255, 1};
        assertEquals("t.dxf:byte 31: SECTION: file ends where a extended group code was expected",
                assertThrows(DxfInputException.class, () -> DxfImporter.read(Dxf.NAME, esc, ImportOptions.DEFAULTS))
                        .getMessage());
    }

    @Test
    void duplicateBlockAndStrayRecords_areWarnings() throws Exception {
        Drawing d = Dxf.create().add(0, "SECTION", 2, "BLOCKS", 0, "BLOCK", 2, "A", 0, "LINE", 11, 1, 0, "ENDBLK",
                0, "LINE", 0, "BLOCK", 2, "A", 0, "LINE", 11, 2, 0, "LINE", 11, 3, 0, "ENDBLK", 0, "ENDSEC").entities()
                .end().read();
        List<String> warnings = d.notes().stream().filter(n -> n.severity().equals("warning"))
                .map(n -> n.kind() + ": " + n.message()).toList();
        assertEquals(List.of("stray_record: record outside any BLOCK definition; ignored",
                "duplicate_block: block 'A' is defined again; the first definition is used",
                "units_assumed: drawing units not given (no $INSUNITS); assumed mm (no $MEASUREMENT either, so the"
                        + " metric default); give the units with --units to be sure").stream().sorted().toList(),
                warnings.stream().sorted().toList());
        assertEquals(1, d.blocks().get("A").segments().size());
    }
}
