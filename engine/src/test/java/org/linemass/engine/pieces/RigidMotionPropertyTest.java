package org.linemass.engine.pieces;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;
import org.linemass.engine.piece.Piece;
import org.linemass.engine.pieces.geom.Curves;
import org.linemass.engine.result.Finding;
import org.linemass.geometry.Affine;
import org.linemass.geometry.Segment;
import org.linemass.geometry.Vec3;

/**
 * Property: moving the whole drawing rigidly (turn about z, tilt about x, shift) moves every
 * finding with it and changes no count, size, piece length or grouping. The scene is the one of
 * {@link OrderInvariancePropertyTest}.
 */
class RigidMotionPropertyTest {

    /** Sizes and lengths are sums of a few closed forms of values up to ~3 m: 1e-11 m is ample. */
    private static final double LEN_TOL_M = 1e-11;

    @Property(tries = 60)
    void rigidMotion_movesFindingsAndKeepsEverythingElse(@ForAll @DoubleRange(min = 0, max = 6.28) double turn,
            @ForAll @DoubleRange(min = -1.5, max = 1.5) double tilt,
            @ForAll @DoubleRange(min = -100, max = 100) double shift) {
        double c = Math.cos(tilt);
        double s = Math.sin(tilt);
        Affine move = Affine.rotationZ(turn).andThen(Affine.of(new double[] {1, 0, 0, 0, c, -s, 0, s, c}, Vec3.ZERO))
                .andThen(Affine.translation(new Vec3(shift, -0.5 * shift, 0.25 * shift)));
        List<Segment> scene = OrderInvariancePropertyTest.scene();
        List<Segment> moved = new ArrayList<>();
        for (Segment seg : scene) {
            moved.add(seg.transformed(move));
        }
        PieceAnalysis a = PieceAnalyzer.analyze(scene, Fixtures.tol(), Fixtures.sections("MESH_WIRE_D4",
                Fixtures.WIRE_D4), false);
        PieceAnalysis b = PieceAnalyzer.analyze(moved, Fixtures.tol(), Fixtures.sections("MESH_WIRE_D4",
                Fixtures.WIRE_D4), false);
        assertEquals(kinds(a), kinds(b));
        for (Finding f : a.findings()) {
            Vec3 where = f.atM() == null ? null : move.apply(f.atM());
            boolean found = b.findings().stream().anyMatch(g -> g.kind().equals(f.kind())
                    && (where == null ? g.atM() == null : g.atM() != null && g.atM().distance(where) < LEN_TOL_M)
                    && (f.sizeM() == null ? g.sizeM() == null : Math.abs(g.sizeM() - f.sizeM()) < LEN_TOL_M));
            assertEquals(true, found, "moved finding " + f);
        }
        assertEquals(lengths(a), lengths(b));
        assertEquals(groupSizes(a), groupSizes(b));
    }

    private static Map<String, Integer> kinds(PieceAnalysis r) {
        Map<String, Integer> m = new TreeMap<>();
        r.findings().forEach(f -> m.merge(f.kind(), 1, Integer::sum));
        return m;
    }

    /** Piece lengths in micrometres, sorted (rounding far coarser than the motion's noise). */
    private static List<Long> lengths(PieceAnalysis r) {
        List<Long> out = new ArrayList<>();
        for (Piece p : r.pieces()) {
            out.add(Math.round(p.segments().stream().mapToDouble(Curves::length).sum() * 1e6));
        }
        out.sort(null);
        return out;
    }

    private static List<Integer> groupSizes(PieceAnalysis r) {
        List<Integer> out = new ArrayList<>();
        r.groups().forEach(g -> out.add(g.size()));
        out.sort(null);
        return out;
    }
}
