package org.linemass.engine.pieces;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;

import java.util.List;
import java.util.Optional;
import org.junit.jupiter.api.Test;
import org.linemass.engine.piece.Piece;
import org.linemass.tolerance.Tolerances;
import org.linemass.engine.result.Bend;
import org.linemass.engine.result.Finding;
import org.linemass.engine.result.FindingKind;
import org.linemass.engine.section.Section;
import org.linemass.geometry.Segment;

/**
 * Each tolerance acts where the Tolerances contract says: join tolerance, gap limit, noise,
 * angle; and the inside radius uses the diameter only for round sections.
 */
class LimitsTest {

    private static final String W = "WIRE";

    private static List<Finding> of(PieceAnalysis r, String kind) {
        return r.findings().stream().filter(f -> f.kind().equals(kind)).toList();
    }

    private static PieceAnalysis twoWiresApart(double gapMm, Tolerances tol) {
        List<Segment> segs = List.of(Fixtures.line(W, "10", 0, 0, 100, 0), Fixtures.line(W, "11", 100 + gapMm, 0, 200, 0));
        return PieceAnalyzer.analyze(segs, tol, Fixtures.none(), false);
    }

    @Test
    void gapJustInsideTheLimit_isReported_andJustOutsideIsNot() {
        // gap limit 5 mm (Fixtures.tol)
        assertEquals(1, of(twoWiresApart(4.9, Fixtures.tol()), FindingKind.GAP).size());
        assertEquals(0, of(twoWiresApart(5.1, Fixtures.tol()), FindingKind.GAP).size());
    }

    @Test
    void gapJustInsideTheJoinTolerance_joins_andJustOutsideIsAGap() {
        // join tolerance 0.1 mm (Fixtures.tol)
        PieceAnalysis in = twoWiresApart(0.09, Fixtures.tol());
        assertEquals(1, in.pieces().size());
        assertEquals(1, of(in, FindingKind.JOINED_ACROSS_GAP).size());
        PieceAnalysis out = twoWiresApart(0.11, Fixtures.tol());
        assertEquals(2, out.pieces().size());
        assertEquals(1, of(out, FindingKind.GAP).size());
    }

    @Test
    void endsApartByLessThanNoise_joinSilently() {
        // noise 1e-12 m; 1e-13 m apart: joined without a notice
        Tolerances tol = new Tolerances(1e-4, 5e-3, 1e-12, 1e-4, 1e-10, Math.toRadians(0.01));
        PieceAnalysis r = twoWiresApart(1e-10, tol);
        assertEquals(1, r.pieces().size());
        assertEquals(List.of(), r.findings());
    }

    @Test
    void kinkBelowTheAngleTolerance_isNoBend_andAboveItIs() {
        // angle tolerance 0.01 degree: a kink of 0.005 degree is straight on, 0.02 degree is a corner
        for (double kinkDeg : new double[] {0.005, 0.02}) {
            double t = Math.tan(Math.toRadians(kinkDeg));
            List<Segment> segs = List.of(Fixtures.line(W, "10", 0, 0, 100, 0), Fixtures.line(W, "11", 100, 0, 200, 100 * t));
            Piece p = PieceAnalyzer.analyze(segs, Fixtures.tol(), Fixtures.none(), false).pieces().get(0);
            assertEquals(kinkDeg > 0.01 ? 1 : 0, p.bends().size(), "kink " + kinkDeg);
        }
    }

    @Test
    void insideRadius_usesHalfTheDiameterOnlyForRoundSections() {
        // flat bar 20 x 5 mm, no diameter: inside radius reported as the centre-line radius (Bend contract)
        Section flat = new Section("FL20x5", "flat bar", "steel", 0.785, null, 0.010, "closed form: 0.02*0.005*7850");
        PieceAnalysis r = PieceAnalyzer.analyze(Shapes.hook(W, 10), Fixtures.tol(),
                l -> Optional.of(flat), false);
        Bend b = r.pieces().get(0).bends().get(0);
        assertEquals(0.015, b.insideRadiusM(), 1e-15);
        assertEquals(List.of(), r.findings(), "15 mm is above the 10 mm minimum");
        // no section: centre-line radius too, and no bend findings at all
        PieceAnalysis none = PieceAnalyzer.analyze(Shapes.hook(W, 10), Fixtures.tol(), Fixtures.none(), false);
        assertEquals(0.015, none.pieces().get(0).bends().get(0).insideRadiusM(), 1e-15);
        assertNull(none.findings().stream().findFirst().orElse(null));
    }
}
