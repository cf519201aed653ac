package org.linemass.importer;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.linemass.drawing.Drawing;
import org.linemass.drawing.ImportNote;
import org.linemass.geometry.Segment;

/**
 * What writers other than the format's owner really produce, each as a small hand-written drawing
 * in testdata/importer with values derived by hand in its README: zero scale factors on flat
 * blocks, invisible entities, count groups left out, layer names with blanks.
 */
class OtherWritersTest {

    /** Closed forms evaluated in double precision: a few ulps of the values (about 1e-14 relative). */
    private static final double EXACT = 1e-12;

    private static Drawing read(String name, ImportOptions o) throws DxfInputException {
        return DxfImporter.read(SharedFiles.testdata().resolve(name), o);
    }

    private static List<ImportNote> errors(Drawing d) {
        return d.notes().stream().filter(n -> n.severity().equals("error")).toList();
    }

    @Test
    void zeroScaleOnTheAxisAFlatBlockDoesNotUse_isRead() throws Exception {
        Drawing d = read("insert_zero_scale_flat.dxf", ImportOptions.DEFAULTS);
        assertEquals(List.of(), errors(d));
        Map<String, List<Segment>> layers = ExternalDrawingsTest.visibleByLayer(d);
        LineIntegrals li = LineIntegrals.of(layers.get("RUNGS"));
        // README: line 3-4-5 scaled 2 -> 10, quarter arc of radius 1 scaled 2 -> pi
        assertEquals(10 + Math.PI, li.length, EXACT * li.length);
        double l = 10 + Math.PI;
        assertEquals((134 + 10 * Math.PI) / l, li.centroid.x(), EXACT * 20);
        assertEquals(44 / l, li.centroid.y(), EXACT * 20);
        // the block's plane z = 7 lands on the insertion's z = 5 (a zero scale maps it onto the base)
        assertEquals(5.0, li.centroid.z(), EXACT * 20);
    }

    @Test
    void invisibleEntities_areLeftOutAndCounted_orReadOnRequest() throws Exception {
        Drawing d = read("invisible_entities.dxf", ImportOptions.DEFAULTS);
        LineIntegrals li = LineIntegrals.of(ExternalDrawingsTest.visibleByLayer(d).get("WIRE"));
        // README: the 100 line and one copy of the block's visible 20 line
        assertEquals(120, li.length, EXACT * 120);
        assertEquals(75, li.centroid.x(), EXACT * 300);
        assertEquals(5.0 / 3, li.centroid.y(), EXACT * 300);
        ImportNote note = d.notes().stream().filter(n -> n.message().contains("invisible")).findFirst().orElseThrow();
        assertEquals("3 invisible entities (group code 60 = 1: INSERT 1, LINE 2) were not read; no CAD program draws"
                + " them (--invisible reads them too)", note.message());
        Drawing all = read("invisible_entities.dxf", ImportOptions.DEFAULTS.withInvisible(true));
        LineIntegrals every = LineIntegrals.of(ExternalDrawingsTest.visibleByLayer(all).get("WIRE"));
        // README: 100 + 50 + two copies of (10 + 20)
        assertEquals(210, every.length, EXACT * 210);
        assertTrue(all.notes().stream().noneMatch(n -> n.message().contains("invisible")));
    }

    @Test
    void countGroupsLeftOut_readWhatIsThere() throws Exception {
        Drawing d = read("missing_counts.dxf", ImportOptions.DEFAULTS);
        assertEquals(List.of(), errors(d));
        Map<String, List<Segment>> layers = ExternalDrawingsTest.visibleByLayer(d);
        // README: LWPOLYLINE without 90 through (0,0), (30,0), (30,40): 30 + 40
        assertEquals(70, LineIntegrals.of(layers.get("FRAME")).length, EXACT * 70);
        // README: degree-1 SPLINE without 72/73/74 through (0,0), (0,10), (10,10): 10 + 10
        assertEquals(20, LineIntegrals.of(layers.get("STAY")).length, EXACT * 20);
    }

    @Test
    void layerNamesKeepTheirBlanks() throws Exception {
        Drawing d = read("layer_name_blanks.dxf", ImportOptions.DEFAULTS);
        assertTrue(d.layer(" 1").visible());
        assertFalse(d.layer("1").visible(), "'1' is frozen, ' 1' is not");
        Map<String, Double> lengths = new java.util.TreeMap<>();
        for (TestExpander.Placed p : TestExpander.expand(d)) {
            lengths.merge(p.layer(), LineIntegrals.of(List.of(p.segment())).length, Double::sum);
        }
        // README: 3-4-5 on ' 1', 6-8-10 on '1'
        assertEquals(Map.of(" 1", 5.0, "1", 10.0), lengths);
    }

    @Test
    void threeDLine_theOldSpellingOfLine_isRead() throws Exception {
        Drawing d = read("old_3dline_r10.dxf", ImportOptions.DEFAULTS);
        // README: (0,0,0)-(2,3,6): sqrt(4 + 9 + 36) = 7
        assertEquals(7.0, LineIntegrals.of(d.modelSpace().segments()).length, 0.0);
        assertEquals(Map.of("3DLINE", 1), d.modelSpace().curveEntityCounts());
    }

    @Test
    void mline_eachElementLineOnRequest() throws Exception {
        Drawing counted = read("mline_wall.dxf", ImportOptions.DEFAULTS);
        assertTrue(counted.modelSpace().segments().isEmpty(), "by default MLINE is drafting, not wire");
        assertTrue(counted.notes().stream().anyMatch(n -> n.message().startsWith("1 MLINE (drafting")));
        Drawing d = read("mline_wall.dxf", ImportOptions.DEFAULTS.withMlinesAndLeaders(true));
        assertEquals(List.of(), errors(d));
        List<Segment> s = d.modelSpace().segments();
        assertEquals(4, s.size());
        // README: element +0.5 runs (0,0.5)-(9.5,0.5)-(9.5,10): 19; element -0.5 (0,-0.5)-(10.5,-0.5)-(10.5,10): 21
        assertEquals(19, LineIntegrals.of(s.subList(0, 2)).length, EXACT * 40);
        assertEquals(21, LineIntegrals.of(s.subList(2, 4)).length, EXACT * 40);
        assertEquals(9.5, s.get(0).end().x(), EXACT * 40);
        assertEquals(0.5, s.get(0).end().y(), EXACT * 40);
        assertEquals("WALL", s.get(0).source().layer());
    }

    @Test
    void leader_vertexPathOnRequest() throws Exception {
        Drawing d = read("leader_note.dxf", ImportOptions.DEFAULTS.withMlinesAndLeaders(true));
        assertEquals(List.of(), errors(d));
        Map<String, List<Segment>> layers = ExternalDrawingsTest.visibleByLayer(d);
        // README: straight path (0,0)-(3,4)-(9,12): 5 + 10
        assertEquals(15, LineIntegrals.of(layers.get("NOTES")).length, EXACT * 15);
        // README: spline path through collinear (0,20), (1,20), (3,20): the interpolating cubic of points on a
        // line with chord-length parameters is that line, length 3
        assertEquals(3, LineIntegrals.of(layers.get("CURVED")).length, 1e-9 * 3);
        assertTrue(read("leader_note.dxf", ImportOptions.DEFAULTS).modelSpace().segments().isEmpty());
    }

    @Test
    void facesAndBodies_areListedNotWeighed_faceEdgesOnRequest() throws Exception {
        Drawing d = read("faces_and_bodies.dxf", ImportOptions.DEFAULTS);
        List<String> notes = d.notes().stream().filter(n -> n.kind().equals("not_weighed"))
                .map(n -> n.severity() + ": " + n.message()).toList();
        assertEquals(List.of("warning: layer 'PANEL' carries wire and also 2 3DSOLID, 1 REGION that cannot be weighed"
                + " (solids, regions, surfaces, proxies, meshes, faces and filled outlines are not read as wire): the"
                + " layer's totals may be missing material", "info: layer 'SHEET' holds 3 3DFACE that cannot be"
                + " weighed and no wire; nothing on it was counted"), notes);
        Drawing e = read("faces_and_bodies.dxf", ImportOptions.DEFAULTS.withFaceEdges(true));
        LineIntegrals sheet = LineIntegrals.of(ExternalDrawingsTest.visibleByLayer(e).get("SHEET"));
        // README: rectangle 4 x 3 all edges 14; the same with its second edge (3) invisible 11; triangle 3-4-5: 12
        assertEquals(37, sheet.length, EXACT * 37);
        assertEquals(Map.of("3DFACE", 3, "LINE", 1), e.modelSpace().curveEntityCounts());
    }

    @Test
    void notWeighed_layerZeroBlockContentTakesTheInsertingLayer() throws Exception {
        Drawing d = read("not_weighed_layer0_blocks.dxf", ImportOptions.DEFAULTS);
        List<String> notes = d.notes().stream().filter(n -> n.kind().equals("not_weighed"))
                .map(n -> n.severity() + " " + n.layer() + ": " + n.message()).toList();
        // testdata/importer/README.md: layer-0 content lands on the inserting layer; UNUSED is never placed
        String unread = " that cannot be weighed (solids, regions, surfaces, proxies, meshes, faces and filled outlines"
                + " are not read as wire): the layer's totals may be missing material";
        assertEquals(List.of(
                "info BOX: layer 'BOX' holds 1 REGION that cannot be weighed and no wire; nothing on it was counted",
                "warning FRAME: layer 'FRAME' carries wire and also 1 3DSOLID" + unread,
                "warning SHEET: layer 'SHEET' carries wire and also 1 3DSOLID" + unread), notes);
    }
}
