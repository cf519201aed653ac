package org.linemass.reports;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;
import org.linemass.engine.result.DrawingResult;
import org.linemass.geometry.CircularArc;
import org.linemass.geometry.Provenance;
import org.linemass.geometry.Segment;
import org.linemass.geometry.Straight;
import org.linemass.geometry.Vec3;
import org.junit.jupiter.api.Test;

class PieceShapesTest {

    /** Sampled points lie on the exact circle up to rounding: 1e-12 m on a 0.1 m radius. */
    private static final double ON_CURVE = 1e-12;

    @Test
    void of_samplesEachPieceTheResultCarriesById() {
        DrawingResult fixture = Fixtures.flatFrame("a.dxf");
        List<Segment> barA = List.of(new Straight(Vec3.ZERO, new Vec3(1, 0, 0),
                Provenance.of("a.dxf", "BARS", 120, "2A", "LINE")));
        List<Segment> barB = List.of(new Straight(new Vec3(0, 0.5, 0), new Vec3(1, 0.5, 0),
                Provenance.of("a.dxf", "BARS", 134, "2B", "LINE")));
        List<Segment> ring = List.of(CircularArc.of(new Vec3(0.5, 0.25, 0), 0.1, Vec3.X, Vec3.Y, 0, 2 * Math.PI,
                new Provenance("a.dxf", Fixtures.SCRIPT_LAYER, 150, "", "CIRCLE", List.of("RING_BLOCK"))));
        DrawingResult r = new DrawingResult(fixture.drawing(), fixture.entities(), fixture.layers(),
                fixture.pieces(), fixture.groups(), fixture.findings(), fixture.totals(), fixture.sections(),
                fixture.incompleteReasons(), Map.of(2, barB, 1, barA, 3, ring));
        Map<Integer, List<Vec3>> shapes = PieceShapes.of(r);
        assertEquals(List.of(Vec3.ZERO, new Vec3(1, 0, 0)), shapes.get(1));
        assertEquals(List.of(new Vec3(0, 0.5, 0), new Vec3(1, 0.5, 0)), shapes.get(2));
        List<Vec3> circle = shapes.get(3);
        assertTrue(circle.size() > 16, "the ring is sampled, not drawn as a point");
        for (Vec3 p : circle) {
            assertEquals(0.1, p.distance(new Vec3(0.5, 0.25, 0)), ON_CURVE);
        }
        assertEquals(3, shapes.size());
        assertEquals(shapes, Report.of(r).pieceShapes(), "a report of the result carries the same shapes");
    }

    @Test
    void of_resultWithoutSegments_noShapes() {
        DrawingResult fixture = Fixtures.flatFrame("a.dxf");
        assertTrue(PieceShapes.of(fixture).isEmpty());
        assertFalse(Report.of(fixture).pieceShapes().containsKey(1));
    }
}
