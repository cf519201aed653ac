package org.linemass.importer;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.linemass.drawing.Drawing;
import org.linemass.drawing.LengthUnit;
import org.linemass.drawing.UnitSource;
import org.linemass.geometry.CircularArc;
import org.linemass.geometry.Segment;
import org.linemass.geometry.Straight;
import org.linemass.geometry.Vec3;

/**
 * DXF dialects on hand-written fragments (testdata/importer, see its README): R12 entities only,
 * padded group codes with CRLF, comments and junk after EOF, code-page and UTF-8 names, binary DXF
 * with both code widths, header units.
 */
class DialectTest {

    /** Coordinates in the fragments are short decimals; parsing is exact to the last bit. */
    private static final double EXACT = 1e-12;

    private static final org.linemass.geometry.Provenance NO_SOURCE =
            org.linemass.geometry.Provenance.of("", "", 0, "", "");

    private static Drawing file(String name) throws Exception {
        return DxfImporter.read(SharedFiles.testdata().resolve(name), ImportOptions.DEFAULTS);
    }

    private static List<Segment> model(Drawing d) {
        return d.modelSpace().segments();
    }

    @Test
    void r12EntitiesOnly_readsLineAndArcWithAssumedMillimetres() throws Exception {
        Drawing d = file("r12_entities_only.dxf");
        assertEquals("", d.dxfVersion());
        assertEquals(LengthUnit.MILLIMETRE, d.unit());
        assertEquals(UnitSource.ASSUMED, d.unitSource());
        assertEquals("units_assumed", d.notes().get(0).kind());
        assertEquals("drawing units not given (no $INSUNITS); assumed mm (no $MEASUREMENT either, so the metric"
                + " default); give the units with --units to be sure", d.notes().get(0).message());
        List<Segment> s = model(d);
        assertEquals(2, s.size());
        Straight line = (Straight) s.get(0);
        // closed form: |(300, 400)| = 500
        assertEquals(500, line.length(), EXACT);
        assertEquals(5, line.source().line(), "line of the LINE's 0 group");
        CircularArc arc = (CircularArc) s.get(1);
        // closed form: L = r * theta = 50 * pi
        assertEquals(50 * Math.PI, arc.length(), EXACT);
        assertEquals(Vec3.of(150, 0, 0).toString(), round(arc.start()));
        assertEquals(Vec3.of(50, 0, 0).toString(), round(arc.end()));
    }

    @Test
    void paddedCodesAndCrlf_giveTheSameSegments() throws Exception {
        List<Segment> a = model(file("r12_entities_only.dxf"));
        List<Segment> b = model(file("r12_entities_only_padded_crlf.dxf"));
        assertEquals(a.size(), b.size());
        for (int i = 0; i < a.size(); i++) {
            assertEquals(a.get(i).withSource(NO_SOURCE), b.get(i).withSource(NO_SOURCE));
        }
    }

    @Test
    void commentsAndTrailingJunk_areIgnored() throws Exception {
        Drawing d = file("comments_and_trailing_junk.dxf");
        assertEquals(2, model(d).size());
        assertEquals(7, model(d).get(0).source().line(), "two comment lines before the LINE");
    }

    @Test
    void codePage1252_decodesLayerNamesAndTableFlags() throws Exception {
        Drawing d = file("cp1252_layer_r2000.dxf");
        assertEquals("AC1015", d.dxfVersion());
        assertEquals(UnitSource.HEADER, d.unitSource());
        assertEquals(LengthUnit.MILLIMETRE, d.unit());
        assertEquals("STAHL_\u00d86", model(d).get(0).source().layer());
        assertEquals("2A", model(d).get(0).source().handle());
        assertTrue(d.layer("STAHL_\u00d86").defined());
        assertFalse(d.layer("HIDDEN_OFF").on(), "negative colour = off");
        assertTrue(d.layer("FROZEN").frozen(), "flag bit 1 = frozen");
        assertTrue(d.layer("STAHL_\u00d86").visible());
    }

    @Test
    void utf8ForR2007AndLater_evenWithOtherCodePage() throws Exception {
        byte[] name = "BÜGEL".getBytes(java.nio.charset.StandardCharsets.UTF_8);
        String latin = new String(name, java.nio.charset.StandardCharsets.ISO_8859_1);
        Drawing d = Dxf.create().add(0, "SECTION", 2, "HEADER", 9, "$ACADVER", 1, "AC1021", 9, "$DWGCODEPAGE", 3,
                "ANSI_1252", 0, "ENDSEC").entities().add(0, "LINE", 8, latin, 11, 1).end().read();
        assertEquals("BÜGEL", model(d).get(0).source().layer());
    }

    @Test
    void otherCodePages_decodeTheirBytes() throws Exception {
        // windows-1251 0xC4 is U+0414 (Cyrillic De); IBM850 0x9D is U+00D8 (O with stroke): the code page tables
        String[][] cases = {{"ANSI_1251", "\u00c4", "\u0414"}, {"DOS850", "\u009d", "\u00d8"}, {"UNKNOWN_9", "\u00d8", "\u00d8"}};
        for (String[] c : cases) {
            Drawing d = Dxf.create().add(0, "SECTION", 2, "HEADER", 9, "$ACADVER", 1, "AC1015", 9, "$DWGCODEPAGE", 3,
                    c[0], 0, "ENDSEC").entities().add(0, "LINE", 8, "L" + c[1], 11, 1).end().read();
            assertEquals("L" + c[2], model(d).get(0).source().layer(), c[0]);
        }
    }

    @Test
    void escapedUnicodeInOldFiles_isDecoded() throws Exception {
        Drawing d = Dxf.create().entities().add(0, "LINE", 8, "RING_\\U+00D8", 11, 1).end().read();
        assertEquals("RING_\u00d8", model(d).get(0).source().layer());
    }

    @Test
    void badUtf8_becomesReplacementCharacters() throws Exception {
        String bad = new String(new byte[] {'L', (byte) 0xFF, (byte) 0xC3}, java.nio.charset.StandardCharsets.ISO_8859_1);
        Drawing d = Dxf.create().add(0, "SECTION", 2, "HEADER", 9, "$ACADVER", 1, "AC1032", 0, "ENDSEC")
                .entities().add(0, "LINE", 8, bad, 11, 1).end().read();
        assertEquals("L\uFFFD\uFFFD", model(d).get(0).source().layer());
    }

    @Test
    void binaryDxf_bothCodeWidths_equalTheAsciiReading() throws Exception {
        Dxf dxf = Dxf.create().add(0, "SECTION", 2, "HEADER", 9, "$ACADVER", 1, "AC1015", 9, "$INSUNITS", 70, 1,
                0, "ENDSEC").entities()
                .add(0, "LINE", 5, "1F", 8, "WIRE", 10, 1.5, 20, -2.25, 30, 0.125, 11, 3, 21, 4, 31, 5)
                .add(0, "LWPOLYLINE", 5, "20", 8, "WIRE", 90, 2, 70, 1, 10, 0, 20, 0, 42, 1, 10, 2, 20, 0)
                .add(0, "SPLINE", 5, "21", 8, "WIRE", 70, 8, 71, 1, 72, 4, 73, 2, 74, 0, 40, 0, 40, 0, 40, 1, 40, 1,
                        10, 0, 20, 0, 30, 0, 10, 1, 20, 1, 30, 1)
                .add(0, "TEXT", 8, "NOTE", 290, 1, 310, "0A0B0C", 1, "hello")
                .end();
        Drawing ascii = dxf.read();
        for (boolean wide : new boolean[] {true, false}) {
            Drawing bin = DxfImporter.read(Dxf.NAME, dxf.binary(wide), ImportOptions.DEFAULTS);
            assertTrue(bin.binary());
            assertEquals("AC1015", bin.dxfVersion());
            assertEquals(LengthUnit.INCH, bin.unit());
            List<Segment> a = model(ascii);
            List<Segment> b = model(bin);
            assertEquals(a.size(), b.size(), () -> bin.notes().toString());
            for (int i = 0; i < a.size(); i++) {
                assertEquals(a.get(i).withSource(NO_SOURCE), b.get(i).withSource(NO_SOURCE));
                assertEquals(a.get(i).source().handle(), b.get(i).source().handle());
            }
            assertEquals(1, bin.modelSpace().otherEntityCounts().get("TEXT"));
        }
    }

    @Test
    void binaryFromFile_readsThroughTheChannel(@org.junit.jupiter.api.io.TempDir Path dir) throws Exception {
        Dxf dxf = Dxf.create().entities().add(0, "LINE", 8, "W", 10, 0, 20, 0, 30, 0, 11, 6, 21, 8, 31, 0).end();
        Path f = dir.resolve("b.dxf");
        Files.write(f, dxf.binary(true));
        Drawing d = DxfImporter.read(f, ImportOptions.DEFAULTS);
        // closed form: |(6, 8)| = 10
        assertEquals(10, ((Straight) model(d).get(0)).length(), EXACT);
    }

    @Test
    void inputFile_isOpenedReadOnlyAndLeftUnchanged(@org.junit.jupiter.api.io.TempDir Path dir) throws Exception {
        Path f = dir.resolve("ro.dxf");
        byte[] content = Dxf.create().entities().add(0, "LINE", 11, 1).end().ascii();
        Files.write(f, content);
        java.nio.file.attribute.FileTime before = Files.getLastModifiedTime(f);
        f.toFile().setWritable(false);
        Drawing d = DxfImporter.read(f, ImportOptions.DEFAULTS);
        assertEquals(1, model(d).size());
        assertEquals(before, Files.getLastModifiedTime(f));
        org.junit.jupiter.api.Assertions.assertArrayEquals(content, Files.readAllBytes(f));
    }

    @Test
    void units_headerOptionAndMeasurementHint() throws Exception {
        Dxf inchHint = Dxf.create().add(0, "SECTION", 2, "HEADER", 9, "$INSUNITS", 70, 0, 9, "$MEASUREMENT", 70, 0,
                0, "ENDSEC").entities().end();
        Drawing d = inchHint.read();
        assertEquals(LengthUnit.INCH, d.unit());
        assertEquals(UnitSource.ASSUMED, d.unitSource());
        assertEquals("drawing units not given ($INSUNITS is 0 (unitless)); assumed in ($MEASUREMENT 0 (imperial));"
                + " give the units with --units to be sure", d.notes().get(0).message());
        Drawing o = DxfImporter.read(Dxf.NAME, inchHint.ascii(), ImportOptions.DEFAULTS.withUnit(LengthUnit.METRE));
        assertEquals(LengthUnit.METRE, o.unit());
        assertEquals(UnitSource.OPTION, o.unitSource());
        assertTrue(o.notes().isEmpty());
        for (LengthUnit u : LengthUnit.values()) {
            if (u == LengthUnit.UNITLESS) {
                continue;
            }
            Drawing h = Dxf.create().add(0, "SECTION", 2, "HEADER", 9, "$INSUNITS", 70, u.insunits(), 0, "ENDSEC")
                    .entities().end().read();
            assertEquals(u, h.unit(), "$INSUNITS " + u.insunits());
            assertEquals(UnitSource.HEADER, h.unitSource());
        }
        Drawing over = DxfImporter.read(Dxf.NAME, Dxf.create().add(0, "SECTION", 2, "HEADER", 9, "$INSUNITS", 70, 6,
                0, "ENDSEC").entities().end().ascii(), ImportOptions.DEFAULTS.withUnit(LengthUnit.FOOT));
        assertEquals(LengthUnit.FOOT, over.unit(), "an override wins over the header");
        assertEquals(UnitSource.OPTION, over.unitSource());
    }

    @Test
    void utf8ByteOrderMark_isSkipped() throws Exception {
        byte[] body = Dxf.create().entities().add(0, "LINE", 11, 1).end().ascii();
        byte[] withBom = new byte[body.length + 3];
        withBom[0] = (byte) 0xEF;
        withBom[1] = (byte) 0xBB;
        withBom[2] = (byte) 0xBF;
        System.arraycopy(body, 0, withBom, 3, body.length);
        assertEquals(1, model(DxfImporter.read(Dxf.NAME, withBom, ImportOptions.DEFAULTS)).size());
    }

    private static String round(Vec3 v) {
        return Vec3.of(Math.rint(v.x() * 1e9) / 1e9 + 0.0, Math.rint(v.y() * 1e9) / 1e9 + 0.0,
                Math.rint(v.z() * 1e9) / 1e9 + 0.0).toString();
    }
}
