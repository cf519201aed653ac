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
}
