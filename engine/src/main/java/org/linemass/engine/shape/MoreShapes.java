package org.linemass.engine.shape;

import java.util.List;
import org.linemass.engine.bender.BenderStep;
import org.linemass.tolerance.Tolerances;

/**
 * The BS 8666 shapes of {@link ShapeCode} 22, 25, 33, 34, 36, 41, 44, 47, 51, 52 and 63, matched on a planar
 * open piece by its bend pattern: each bend's kind (90, 180, 135 degrees within
 * {@link ShapeClassifier#ANGLE_DEG}, or another angle) and whether it turns the same way as the bend
 * before it. A pattern read from either end matches; the dimensions are then taken from the end the
 * standard's drawing starts at (for the asymmetric shapes 34 and 36) or from the reading end.
 *
 * <p>Legs: a leg next to a 90, 180 (or, in shape 52, 135) degree bend is measured out-to-out, adding
 * the inside radius plus the bar size for that bend to its straight; next to a bend of another angle it
 * runs to the intersection of the centre-lines (adding the bend's tangent length, centre-line radius
 * times tan(angle/2)). The rise dimensions (C and D of 25, D of 34, E of 36) are the leg times the sine
 * of its bend angle. The formulas take r, the Table 2 radius (the drawn inside radius when the bar
 * size is not a Table 2 size).
 */
final class MoreShapes {

    private MoreShapes() {
    }

    /**
     * @param steps the bender steps (bends only, one plane, checked by the caller)
     * @param feed the straights, one more than the steps
     * @param inside the inside radius of each bend, metres
     * @param d the bar size, metres (0 when unknown)
     * @param r the radius the formulas use, metres
     * @return the result, or null when no pattern here matches
     */
    static ShapeResult match(List<BenderStep> steps, double[] feed, double[] inside, double d, double r,
            ShapeResultBuilder b) {
        int n = steps.size();
        StringBuilder kinds = new StringBuilder();
        StringBuilder turns = new StringBuilder();
        for (int i = 0; i < n; i++) {
            kinds.append(kind(steps.get(i)));
            if (i > 0) {
                turns.append(Math.abs(steps.get(i).rotationDeg()) < 90 ? 'S' : 'X');
            }
        }
        // a 135 degree bend is "another angle" except in shape 52
        String k52 = kinds.toString();
        String k = k52.replace('K', 'O');
        String t = turns.toString();
        View v;
        if ((v = View.of("OO", "S", k, t)) != null) {
            double a1 = v.angleRad(steps, 0);
            double a2 = v.angleRad(steps, 1);
            if (Math.abs(Math.toDegrees(a1 + a2) - 90) <= ShapeClassifier.ANGLE_DEG) {
                b.note("end legs at 90 degrees to one another: shape 24, not classified here");
                return null;
            }
            Legs l = new Legs(v, steps, feed, inside, d, false);
            double a = l.leg(0);
            double e = l.leg(1);
            double bb = l.leg(2);
            return b.dims(a, bb, a * Math.sin(a1), bb * Math.sin(a2), e, inside[0]).length(a + bb + e)
                    .done(ShapeCode.S25);
        }
        if ((v = View.of("RH", "S", k, t)) != null) {
            // C is the width of the semicircle, "not less than 2(r + d)" in the standard's notes as reproduced
            // on suppliers' pages; that the hook turns the same way as the right angle (its tail back over B)
            // is read from those pages' drawings, not from the printed standard: unverified
            Legs l = new Legs(v, steps, feed, inside, d, false);
            double a = l.leg(0);
            double bb = l.leg(1);
            double width = 2 * (inside[v.bend(1)] + d);
            double dd = l.leg(2);
            return b.dims(a, bb, width, dd, null, inside[0]).length(a + bb + width + dd - 1.5 * r - 3 * d)
                    .done(ShapeCode.S22);
        }
        if ((v = View.of("HHH", "SS", k, t)) != null) {
            Legs l = new Legs(v, steps, feed, inside, d, false);
            double a = l.leg(1);
            double width = 2 * (inside[v.bend(1)] + d);
            double c = l.leg(0);
            if (Math.abs(l.leg(3) - c) > Tolerances.SHAPE_LEG_MATCH_M || Math.abs(l.leg(2) - a) > Tolerances.SHAPE_LEG_MATCH_M) {
                b.note("legs not symmetric: the standard takes both A legs as A and both end legs as C");
            }
            return b.dims(a, width, c, null, null, inside[0]).length(2 * a + 1.7 * width + 2 * c - 4 * d)
                    .done(ShapeCode.S33);
        }
        if ((v = View.of("OOR", "XS", k, t)) != null
                && Math.abs(steps.get(v.bend(0)).angleDeg() - steps.get(v.bend(1)).angleDeg())
                        <= ShapeClassifier.ANGLE_DEG) {
            Legs l = new Legs(v, steps, feed, inside, d, false);
            double a = l.leg(0);
            double bb = l.leg(1);
            double c = l.leg(2);
            double e = l.leg(3);
            return b.dims(a, bb, c, bb * Math.sin(v.angleRad(steps, 0)), e, inside[0])
                    .length(a + bb + c + e - 0.5 * r - d).done(ShapeCode.S34);
        }
        if ((v = View.of("ORR", "SS", k, t)) != null) {
            Legs l = new Legs(v, steps, feed, inside, d, false);
            double a = l.leg(0);
            double bb = l.leg(1);
            double c = l.leg(2);
            double dd = l.leg(3);
            return b.dims(a, bb, c, dd, a * Math.sin(v.angleRad(steps, 0)), inside[0])
                    .length(a + bb + c + dd - r - 2 * d).done(ShapeCode.S36);
        }
        boolean fourSame = View.of("RRRR", "SSS", k, t) != null;
        if (fourSame || View.of("RRRR", "XSX", k, t) != null) {
            // both patterns read the same from either end: dimensions from the reading end
            Legs l = new Legs(new View(n, false), steps, feed, inside, d, false);
            double sum = l.leg(0) + l.leg(1) + l.leg(2) + l.leg(3) + l.leg(4);
            return b.dims(l.leg(0), l.leg(1), l.leg(2), l.leg(3), l.leg(4), inside[0]).length(sum - 2 * r - 4 * d)
                    .done(fourSame ? ShapeCode.S41 : ShapeCode.S44);
        }
        if ((v = View.of("HRRH", "SSS", k, t)) != null) {
            Legs l = new Legs(v, steps, feed, inside, d, false);
            double a = l.leg(1);
            double c = l.leg(0);
            return b.dims(a, l.leg(2), c, l.leg(4), null, inside[0])
                    .length(2 * a + l.leg(2) + 2 * c + 1.5 * r - 3 * d).done(ShapeCode.S47);
        }
        if ((v = View.of("RRRRR", "SSSS", k, t)) != null) {
            Legs l = new Legs(v, steps, feed, inside, d, false);
            double a = l.leg(2);
            double bb = l.leg(1);
            double c = l.leg(0);
            return b.dims(a, bb, c, l.leg(5), null, inside[0]).length(2 * (a + bb + c) - 2.5 * r - 5 * d)
                    .done(ShapeCode.S51);
        }
        if ((v = View.of("KRRRK", "SSSS", k52, t)) != null) {
            Legs l = new Legs(v, steps, feed, inside, d, true);
            double a = l.leg(2);
            double bb = l.leg(3);
            double c = l.leg(0);
            return b.dims(a, bb, c, l.leg(5), null, inside[0]).length(2 * (a + bb + c) - 1.5 * r - 3 * d)
                    .done(ShapeCode.S52);
        }
        if ((v = View.of("RRRRRR", "SSSSS", k, t)) != null) {
            Legs l = new Legs(v, steps, feed, inside, d, false);
            double a = l.leg(2);
            double bb = l.leg(1);
            double c = l.leg(6);
            return b.dims(a, bb, c, l.leg(0), null, inside[0]).length(2 * a + 3 * bb + 2 * c - 3 * r - 6 * d)
                    .done(ShapeCode.S63);
        }
        return null;
    }

    /** R 90, H 180, K 135, O any other angle. */
    private static char kind(BenderStep s) {
        double a = s.angleDeg();
        if (Math.abs(a - 90) <= ShapeClassifier.ANGLE_DEG) {
            return 'R';
        }
        if (Math.abs(a - 180) <= ShapeClassifier.ANGLE_DEG) {
            return 'H';
        }
        if (Math.abs(a - 135) <= ShapeClassifier.ANGLE_DEG) {
            return 'K';
        }
        return 'O';
    }

    /** A pattern matched forwards or backwards: maps the pattern's bend and leg numbers to the piece's. */
    private record View(int bends, boolean reversed) {

        static View of(String kinds, String turns, String k, String t) {
            if (k.equals(kinds) && t.equals(turns)) {
                return new View(k.length(), false);
            }
            String rk = new StringBuilder(kinds).reverse().toString();
            String rt = new StringBuilder(turns).reverse().toString();
            if (k.equals(rk) && t.equals(rt)) {
                return new View(k.length(), true);
            }
            return null;
        }

        int bend(int i) {
            return reversed ? bends - 1 - i : i;
        }

        int leg(int i) {
            return reversed ? bends - i : i;
        }

        double angleRad(List<BenderStep> steps, int i) {
            return Math.toRadians(steps.get(bend(i)).angleDeg());
        }
    }

    /** Leg lengths in the pattern's numbering (see the class comment). */
    private static final class Legs {
        private final View view;
        private final List<BenderStep> steps;
        private final double[] feed;
        private final double[] inside;
        private final double d;
        private final boolean hook135;

        Legs(View view, List<BenderStep> steps, double[] feed, double[] inside, double d, boolean hook135) {
            this.view = view;
            this.steps = steps;
            this.feed = feed;
            this.inside = inside;
            this.d = d;
            this.hook135 = hook135;
        }

        double leg(int i) {
            int j = view.leg(i);
            double len = feed[j];
            if (j > 0) {
                len += end(j - 1);
            }
            if (j < steps.size()) {
                len += end(j);
            }
            return len;
        }

        private double end(int bend) {
            BenderStep s = steps.get(bend);
            char k = kind(s);
            if (k == 'R' || k == 'H' || k == 'K' && hook135) {
                return inside[bend] + d;
            }
            return s.radiusM() * Math.tan(Math.toRadians(s.angleDeg()) / 2);
        }
    }
}
