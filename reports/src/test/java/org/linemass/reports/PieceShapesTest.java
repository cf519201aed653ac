package org.linemass.reports;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;
import org.linemass.engine.pieces.Piece;
import org.linemass.engine.result.DrawingResult;
import org.linemass.engine.result.PieceResult;
import org.linemass.geometry.CircularArc;
import org.linemass.geometry.Provenance;
import org.linemass.geometry.Straight;
import org.linemass.geometry.Vec3;
import org.junit.jupiter.api.Test;

class PieceShapesTest {

    /** Sampled points lie on the exact circle up to rounding: 1e-12 m on a 0.1 m radius. */
    private static final double ON_CURVE = 1e-12;

    @Test
    void of_matchesPiecesToResultsByEndsAndSources() {
        DrawingResult fixture = Fixtures.flatFrame("a.dxf");
        Piece barB = new Piece("BARS", List.of(new Straight(new Vec3(0, 0.5, 0), new Vec3(1, 0.5, 0),
                Provenance.of("a.dxf", "BARS", 134, "2B", "LINE"))), false, List.of());
        Piece barA = new Piece("BARS", List.of(new Straight(Vec3.ZERO, new Vec3(1, 0, 0),
                Provenance.of("a.dxf", "BARS", 120, "2A", "LINE"))), false, List.of());
        Piece ring = new Piece(Fixtures.SCRIPT_LAYER, List.of(CircularArc.of(new Vec3(0.5, 0.25, 0), 0.1, Vec3.X,
                Vec3.Y, 0, 2 * Math.PI, new Provenance("a.dxf", Fixtures.SCRIPT_LAYER, 150, "", "CIRCLE",
                        List.of("RING_BLOCK")))), true, List.of());
        // as in the engine, the result's ends are the piece's own end points (the arc's cos/sin rounding included)
        PieceResult r3 = fixture.pieces().get(2);
        PieceResult ringResult = new PieceResult(r3.id(), r3.layer(), r3.section(), r3.lengthM(), r3.massKg(),
                r3.centroidM(), r3.lengthInertiaM3(), r3.inertiaKgM2(), ring.segments().get(0).start(),
                ring.segments().get(0).end(), true, 1, r3.mark(), List.of(), r3.sources(), r3.errorBoundM());
        DrawingResult r = new DrawingResult(fixture.drawing(), fixture.entities(), fixture.layers(),
                List.of(fixture.pieces().get(0), fixture.pieces().get(1), ringResult), fixture.groups(),
                fixture.findings(), fixture.totals(), fixture.sections(), fixture.incompleteReasons());
        Piece stray = new Piece("OTHER", List.of(new Straight(Vec3.ZERO, Vec3.Y,
                Provenance.of("a.dxf", "OTHER", 9, "", "LINE"))), false, List.of());
        Map<Integer, List<Vec3>> shapes = PieceShapes.of(r, List.of(barB, ring, stray, barA));
        assertEquals(List.of(Vec3.ZERO, new Vec3(1, 0, 0)), shapes.get(1));
        assertEquals(List.of(new Vec3(0, 0.5, 0), new Vec3(1, 0.5, 0)), shapes.get(2));
        List<Vec3> circle = shapes.get(3);
        assertTrue(circle.size() > 16, "the ring is sampled, not drawn as a point");
        for (Vec3 p : circle) {
            assertEquals(0.1, p.distance(new Vec3(0.5, 0.25, 0)), ON_CURVE);
        }
        assertEquals(3, shapes.size(), "the stray piece matches no result");
        assertFalse(shapes.containsKey(4));
    }
}
