package org.linemass.engine.pieces.join;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.Timeout;
import org.linemass.tolerance.Tolerances;
import org.linemass.engine.result.FindingKind;
import org.linemass.geometry.Provenance;
import org.linemass.geometry.Segment;
import org.linemass.geometry.Straight;
import org.linemass.geometry.Vec3;

/**
 * Pairing at branch points: the straightest pairs continue, but only when they turn by less than
 * 90 degrees (our own convention, stated in {@link EndPairing}); a star of invented spokes (a
 * wheel-shaped trellis) checks that the work stays bounded. Expected pairings follow from the
 * drawn directions (turning angle = 180 degrees minus the angle between the two spokes).
 */
class BranchPairingTest {

    /** Join 0.1 mm, gap 5 mm, noise 1e-12 m, group 0.1 mm, angle 0.01 degree (as the piece tests). */
    private static final Tolerances TOL = new Tolerances(1e-4, 5e-3, 1e-12, 1e-4, 1e-10, Math.toRadians(0.01));

    /** Spoke lengths are 0.1 m; sums of two spokes are exact to rounding, far below 1e-12 m. */
    private static final double LEN_TOL_M = 1e-12;

    /** A spoke of 100 mm leaving the origin at {@code deg} in the x-y plane. */
    private static Segment spoke(double deg, int line) {
        double a = Math.toRadians(deg);
        Provenance p = Provenance.of("t.dxf", "W", line, Integer.toHexString(line), "LINE");
        return new Straight(Vec3.ZERO, new Vec3(0.1 * Math.cos(a), 0.1 * Math.sin(a), 0), p);
    }

    private static JoinResult join(List<Segment> segs) {
        return Joiner.join(segs, new int[segs.size()], TOL);
    }

    private static double length(Chain c) {
        return c.segments().stream().mapToDouble(s -> ((Straight) s).length()).sum();
    }

    @Test
    void remainingPairTurningSharply_isNotJoined() {
        // east-west straight through; north (90) and 60 degrees left: they would turn by 150 degrees
        JoinResult r = join(List.of(spoke(0, 10), spoke(180, 11), spoke(90, 12), spoke(60, 13)));
        assertEquals(3, r.chains().size(), "one straight run and two separate spokes");
        long straight = r.chains().stream().filter(c -> c.segments().size() == 2).count();
        assertEquals(1, straight);
        assertEquals(1, r.findings().stream().filter(f -> f.kind().equals(FindingKind.BRANCH)).count(),
                "the branch is still reported");
        assertTrue(r.findings().get(0).message().contains("less than 90.0 deg"), "the message states the rule");
        assertEquals(4, r.findings().get(0).entities().size(), "every spoke at the node is named");
    }

    @Test
    void remainingPairCloseToStraight_isJoined() {
        // east-west straight through; north (90) and 250 degrees: turn 180 - 160 = 20 degrees
        JoinResult r = join(List.of(spoke(0, 10), spoke(180, 11), spoke(90, 12), spoke(250, 13)));
        assertEquals(2, r.chains().size());
        for (Chain c : r.chains()) {
            assertEquals(2, c.segments().size());
            assertEquals(0.2, length(c), LEN_TOL_M);
        }
    }

    @Test
    void threeEndsAllTurningSharply_stayThreePieces() {
        // a narrow fan at 0, 30 and 60 degrees: every pair would turn by 120 degrees or more
        JoinResult r = join(List.of(spoke(0, 10), spoke(30, 11), spoke(60, 12)));
        assertEquals(3, r.chains().size());
    }

    @Test
    void evenlySpacedYJunction_joinsOnePairTurningSixtyDegrees() {
        // 0, 120, 240 degrees: each pair turns by 60 degrees (< 90), so one pair continues
        JoinResult r = join(List.of(spoke(0, 10), spoke(120, 11), spoke(240, 12)));
        assertEquals(2, r.chains().size());
    }

    @Test
    @Timeout(value = 10, unit = TimeUnit.SECONDS)
    void thousandSpokesAtOnePoint_pairEveryOppositePair() {
        // 1,000 spokes every 0.36 degrees: spoke i and spoke i + 500 are exactly opposite (turn 0),
        // so 500 straight runs of 200 mm, each through the hub
        List<Segment> segs = new ArrayList<>();
        for (int i = 0; i < 1000; i++) {
            segs.add(spoke(0.36 * i, 10 + i));
        }
        java.util.Collections.shuffle(segs, new java.util.Random(7));
        JoinResult r = join(segs);
        assertEquals(500, r.chains().size());
        for (Chain c : r.chains()) {
            assertEquals(2, c.segments().size());
            assertEquals(0.2, length(c), LEN_TOL_M);
            Vec3 d0 = c.segments().get(0).end().minus(c.segments().get(0).start()).unit();
            Vec3 d1 = c.segments().get(1).end().minus(c.segments().get(1).start()).unit();
            // exactly opposite up to the rounding of 0.36 * i degrees (about 1e-14 rad): 1e-6 rad
            assertTrue(d0.dot(d1) > Math.cos(1e-6), "straight through");
        }
    }

    @Test
    @Timeout(value = 10, unit = TimeUnit.SECONDS)
    void thousandAndOneSpokes_pairNeighboursOfOpposites() {
        // 1,001 spokes: no exact opposites; each spoke's nearest opposite turns by 360/1001/2 degrees,
        // so at most 500 pairs, every one turning by less than 1 degree, and one spoke alone
        List<Segment> segs = new ArrayList<>();
        for (int i = 0; i < 1001; i++) {
            segs.add(spoke(360.0 * i / 1001, 10 + i));
        }
        JoinResult r = join(segs);
        long pairs = r.chains().stream().filter(c -> c.segments().size() == 2).count();
        long singles = r.chains().stream().filter(c -> c.segments().size() == 1).count();
        assertEquals(r.chains().size(), pairs + singles, "every chain is a pair or a single spoke");
        // exact greedy pairing would pair all but one spoke (any two spokes more than 90 degrees
        // apart may pair); the bounded pairing must do the same here
        assertEquals(500, pairs);
        long nearlyStraight = 0;
        for (Chain c : r.chains()) {
            if (c.segments().size() == 2) {
                Vec3 d0 = c.segments().get(0).end().minus(c.segments().get(0).start()).unit();
                Vec3 d1 = c.segments().get(1).end().minus(c.segments().get(1).start()).unit();
                assertTrue(d0.dot(d1) > 0, "turns by less than 90 degrees (the pairing rule)");
                nearlyStraight += d0.dot(d1) > Math.cos(Math.toRadians(1)) ? 1 : 0;
            }
        }
        // own bound, no source: the window of neighbours finds a near-opposite partner for nearly all
        assertTrue(nearlyStraight >= 450, "pairs within 1 degree of straight: " + nearlyStraight);
    }
}
