package org.linemass.engine.pieces;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Random;
import java.util.Set;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
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
