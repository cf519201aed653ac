package org.linemass.engine.pieces;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Random;
import java.util.Set;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import org.linemass.engine.piece.Piece;
import org.linemass.geometry.Segment;
import org.linemass.geometry.Straight;
import org.linemass.geometry.Vec3;

/**
 * Property: shuffling the segments, reversing any of them and splitting straights into collinear
 * parts that meet exactly changes neither the pieces, nor the groups, nor the findings (compared
 * through {@link CanonicalSummary}). The scene holds the mesh panel with its defects, a frame, a
 * rack of hooks and sharp L wires. Lines taking part in an overlap, a crossing or carrying a
 * T-junction in their interior are not split, because a split point there would change the
 * defect itself (a vertex where there was none).
 */
class OrderInvariancePropertyTest {

    private static final Set<String> KEEP_WHOLE = Set.of("36", "37", "38", "39", "3B", "3D", "3E");

    static List<Segment> scene() {
        List<Segment> all = new ArrayList<>(MeshPanelDefectsTest.panel());
        all.addAll(Shapes.moved(CleanLayoutAndBendTest.frame(), Shapes.place(0, 1.0, 0)));
        for (int k = 0; k < 4; k++) {
            List<Segment> h = Shapes.moved(Shapes.hook("RACK", 100 + k), Shapes.place(45 * k, 2.0 + 0.4 * k, 0));
            all.addAll(h);
        }
        all.addAll(Shapes.moved(Shapes.ell("RACK", 200, new Vec3(0.1, 0, 0)), Shapes.place(10, 0, 1.0)));
        all.addAll(Shapes.moved(Shapes.ell("RACK", 201, new Vec3(0.1, 0, 0)), Shapes.place(190, 0.5, 1.5)));
        // a gate bar and a cross wire stopping 2 mm short of its middle (a gap to a wire's middle),
        // the cross wire aimed at the point where the bar is split in two
        all.add(Fixtures.line("GATE", "300", 5000, 0, 5100, 0));
        all.add(Fixtures.line("GATE", "301", 5100, 0, 5200, 0));
        all.add(Fixtures.line("GATE", "302", 5100, 80, 5100, 2));
        // an oval ring drawn twice: the second copy starts elsewhere (a duplicate drawn differently)
        all.add(org.linemass.geometry.EllipticalArc.of(Fixtures.mm(5000, 500), Fixtures.mm(80, 0, 0),
                Fixtures.mm(0, 40, 0), 0, 2 * Math.PI, Fixtures.src("OVAL", "310")));
        all.add(org.linemass.geometry.EllipticalArc.of(Fixtures.mm(5000, 500), Fixtures.mm(80, 0, 0),
                Fixtures.mm(0, 40, 0), 2, 2 + 2 * Math.PI, Fixtures.src("OVAL", "311")));
        return all;
    }

    static List<Segment> scrambled(List<Segment> scene, long seed) {
        Random rnd = new Random(seed);
        List<Segment> out = new ArrayList<>();
        for (Segment s : scene) {
            if (s instanceof Straight st && !KEEP_WHOLE.contains(st.source().handle()) && rnd.nextInt(3) == 0
                    && st.length() > 0) {
                int parts = 2 + rnd.nextInt(3);
                Vec3 prev = st.a();
                for (int k = 1; k <= parts; k++) {
                    Vec3 next = k == parts ? st.b() : st.point((k - 0.1 + 0.2 * rnd.nextDouble()) / parts);
                    out.add(new Straight(prev, next, st.source()));
                    prev = next;
                }
            } else {
                out.add(s);
            }
        }
        for (int i = 0; i < out.size(); i++) {
            if (rnd.nextBoolean()) {
                out.set(i, out.get(i).reversed());
            }
        }
        Collections.shuffle(out, rnd);
        return out;
    }

    @org.junit.jupiter.api.Test
    void scene_holdsTheGapToAWiresMiddleAndTheOvalDrawnTwice() {
        PieceAnalysis r = PieceAnalyzer.analyze(scene(), Fixtures.tol(),
                Fixtures.sections("MESH_WIRE_D4", Fixtures.WIRE_D4), false);
        // closed forms of the drawn coordinates: 2 mm short of (5100, 0) mm
        assertEquals(1, r.findings().stream().filter(f -> f.kind().equals("gap") && f.layer().equals("GATE")
                && Math.abs(f.sizeM() - 0.002) < 1e-12 && f.atM().distance(Fixtures.mm(5100, 0)) < 1e-12).count(),
                r.findings().toString());
        // one whole oval removed: Ramanujan's second approximation of the perimeter for semi-axes
        // 80 and 40 mm is 0.3875379 m (relative error about 1e-10, so 1e-6 m is ample)
        assertEquals(1, r.findings().stream().filter(f -> f.kind().equals("duplicate") && f.layer().equals("OVAL")
                && Math.abs(f.sizeM() - 0.3875379) < 1e-6).count(), r.findings().toString());
    }

    @Property(tries = 150)
    void shuffleReverseAndSplit_changeNothing(@ForAll long seed) {
        PieceAnalysis reference = PieceAnalyzer.analyze(scene(), Fixtures.tol(),
                Fixtures.sections("MESH_WIRE_D4", Fixtures.WIRE_D4), false);
        PieceAnalysis other = PieceAnalyzer.analyze(scrambled(scene(), seed), Fixtures.tol(),
                Fixtures.sections("MESH_WIRE_D4", Fixtures.WIRE_D4), false);
        assertEquals(CanonicalSummary.of(reference), CanonicalSummary.of(other));
        assertWellFormed(other, Fixtures.tol().joinM());
    }

    /**
     * Piece contract (Piece javadoc): consecutive segments meet within the join tolerance, a closed
     * piece's last end meets its first start; PieceAnalysis contract: the groups partition the
     * pieces.
     */
    static void assertWellFormed(PieceAnalysis r, double joinM) {
        for (Piece p : r.pieces()) {
            List<Segment> s = p.segments();
            for (int i = 1; i < s.size(); i++) {
                org.junit.jupiter.api.Assertions.assertTrue(s.get(i - 1).end().distance(s.get(i).start()) <= joinM,
                        "segments of a piece meet: " + p);
            }
            if (p.closed()) {
                org.junit.jupiter.api.Assertions.assertTrue(
                        s.get(s.size() - 1).end().distance(s.get(0).start()) <= joinM, "loop closes: " + p);
            }
        }
        List<Integer> all = new ArrayList<>();
        r.groups().forEach(all::addAll);
        all.sort(null);
        List<Integer> expected = new ArrayList<>();
        for (int i = 0; i < r.pieces().size(); i++) {
            expected.add(i);
        }
        assertEquals(expected, all, "every piece in exactly one group");
    }
}
