package org.linemass.engine.shape;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.OptionalDouble;
import org.linemass.engine.bender.BenderProgram;
import org.linemass.engine.bender.BenderStep;
import org.linemass.tolerance.Tolerances;

/**
 * Classifies a piece's bender data into a {@link ShapeCode} from its geometry alone: the number of
 * bends, their angles (90 and 180 degrees within {@link #ANGLE_DEG}), the turning directions (a
 * rotation of 0 keeps the bending direction, 180 reverses it in the same plane; anything else is a
 * shape in three dimensions, 98), closure (a closed loop with no lap is 99) and coils (one coil and
 * nothing else is 77). The classification does not depend on the piece's position, orientation,
 * mirror image or the end it is read from, except that the dimensions are then listed from the other
 * end (A and C swap).
 *
 * <p>Dimensions: legs next to 90 and 180 degree bends are out-to-out, as the standard dimensions them:
 * a leg's straight plus, for each such bend at its ends, the inside radius plus the bar size (so an
 * L-bar's A is its centre-line corner-to-end length plus d/2); the width of a 180 degree bend is
 * 2(r + d). Legs next to other bends are given centre-line, corner point to corner point (the
 * standard's diagrams for those shapes were not checked here: treat them as approximate). R is the
 * inside radius where the shape has one. The formula length uses the standard radius r of Table 2 for
 * shapes 11, 21, 22, 23 and 31 and the drawn inside radius R for 12.
 *
 * <p>Flags: an inside radius below Table 2 (tolerance half a millimetre: the table is in whole
 * millimetres and rounds 87.5 down to 87 for 25 mm bars), and a formula length differing from the exact
 * centre-line length by more than {@link #ROUNDING_M} (the standard rounds cut lengths up to the next
 * 25 mm: from memory, BS 8666:2005; neither the team's reference sheet nor any page read lists the
 * clause: unverified).
 */
public final class ShapeClassifier {

    /** Drawn angles within this of 90 or 180 degrees count as those angles ({@link Tolerances#SHAPE_ANGLE_DEG}). */
    public static final double ANGLE_DEG = Tolerances.SHAPE_ANGLE_DEG;
    /** Rotations within this of 0 or 180 degrees keep the bends in one plane ({@link Tolerances#SHAPE_PLANE_DEG}). */
    private static final double PLANE_DEG = Tolerances.SHAPE_PLANE_DEG;
    /**
     * Formula and exact lengths further apart than this are noted, metres: the cut-length rounding of
     * BS 8666:2005 as remembered (25 mm). Unverified: not in the team's reference sheet.
     */
    public static final double ROUNDING_M = 0.025;
    /** Table 2 radii are whole millimetres ({@link Tolerances#RADIUS_TABLE_SLACK_M}). */
    private static final double TABLE_SLACK_M = Tolerances.RADIUS_TABLE_SLACK_M;

    private ShapeClassifier() {
    }

    /**
     * @param program the piece's bender data
     * @param closed whether the piece closes on itself
     * @param diameterM the bar size (metres), or null when the section is not round or unknown (the
     *        dimensions are then centre-line and there is no radius check)
     * @param exactLengthM the exact centre-line length (metres)
     */
    public static ShapeResult classify(BenderProgram program, boolean closed, Double diameterM, double exactLengthM) {
        return classify(program, closed, diameterM, exactLengthM, BendStandard.AUTO);
    }

    /** As {@link #classify(BenderProgram, boolean, Double, double)}, checking radii by {@code standard}. */
    public static ShapeResult classify(BenderProgram program, boolean closed, Double diameterM, double exactLengthM,
            BendStandard standard) {
        List<String> notes = new ArrayList<>();
        double d = diameterM == null ? 0 : diameterM;
        if (diameterM == null) {
            notes.add("bar size unknown: dimensions are centre-line, no radius check");
        }
        OptionalDouble table = diameterM == null || standard == BendStandard.ACI318 ? OptionalDouble.empty()
                : MinimumRadius.forDiameterM(d);
        Optional<AciRadius.Bar> us = diameterM != null && table.isEmpty() && standard != BendStandard.BS8666
                ? AciRadius.forDiameterM(d) : Optional.empty();
        if (us.isPresent()) {
            notes.add(usNote(us.get()));
        } else if (diameterM != null && table.isEmpty()) {
            notes.add(standard == BendStandard.ACI318 ? "not an ASTM A615 bar size: no ACI 318-19 minimum radius"
                    : "not a BS 8666 Table 2 bar size: no minimum radius");
        }
        // the piece's role (hook or stirrup) is not known: the smaller of the two ACI minimums is checked
        double usMin = us.map(u -> u.stirrupRadiusM() != null ? u.stirrupRadiusM() : u.hookRadiusM()).orElse(0.0);
        List<BenderStep> steps = program.steps();
        int n = steps.size();
        double[] feed = new double[n + 1];
        double[] inside = new double[n];
        boolean below = false;
        boolean belowUs = false;
        for (int i = 0; i < n; i++) {
            feed[i] = steps.get(i).feedM();
            inside[i] = Math.max(0, steps.get(i).radiusM() - d / 2);
            if (table.isPresent() && steps.get(i).kind() == BenderStep.Kind.BEND
                    && inside[i] < table.getAsDouble() - TABLE_SLACK_M) {
                below = true;
            }
            if (us.isPresent() && steps.get(i).kind() == BenderStep.Kind.BEND && inside[i] < usMin - TABLE_SLACK_M) {
                belowUs = true;
            }
        }
        feed[n] = program.lastFeedM();
        if (below) {
            notes.add(String.format(Locale.ROOT, "inside radius below the BS 8666 Table 2 minimum of %.0f mm",
                    table.getAsDouble() * 1000));
        }
        if (belowUs) {
            notes.add(String.format(Locale.ROOT, "inside radius below the ACI 318-19 minimum of %.1f mm for %s",
                    usMin * 1000, us.get().stirrupRadiusM() != null ? "stirrups and ties (Table 25.3.2)"
                            : "standard hooks (Table 25.3.1)"));
        }
        double r = table.isPresent() ? table.getAsDouble() : n > 0 ? inside[0] : 0;
        ShapeResultBuilder b = new ShapeResultBuilder(exactLengthM, below || belowUs, notes, ROUNDING_M);
        if (closed) {
            notes.add("closed loop with no lap or hooks: not a standard shape");
            return b.done(ShapeCode.OTHER);
        }
        if (steps.stream().anyMatch(s -> s.kind() == BenderStep.Kind.COIL)) {
            if (n == 1 && feed[0] < d + Tolerances.SHAPE_NO_STRAIGHT_M && feed[1] < d + Tolerances.SHAPE_NO_STRAIGHT_M) {
                BenderStep c = steps.get(0);
                double a = 2 * c.radiusM() + d;
                double len = c.turns() * Math.PI * (a - d);
                if (c.pitchM() > a / 5) {
                    // for a pitch over A/5 the helix length: from memory of the BS 8666:2005 shape 77 note; a
                    // public model of the 2020 edition applies the same rule; the printed note was not seen:
                    // unverified
                    len = c.turns() * Math.hypot(Math.PI * (a - d), c.pitchM());
                    notes.add("pitch over A/5: helix length C sqrt((pi(A - d))^2 + B^2) (from memory)");
                }
                return b.dims(a, c.pitchM(), c.turns(), null, null, null).length(len).done(ShapeCode.S77);
            }
            notes.add("a coil with straights or bends: not a standard shape");
            return b.done(ShapeCode.OTHER);
        }
        for (int i = 1; i < n; i++) {
            double rot = Math.abs(steps.get(i).rotationDeg());
            if (rot > PLANE_DEG && Math.abs(rot - 180) > PLANE_DEG) {
                notes.add("bends in more than one plane");
                return b.done(ShapeCode.ISOMETRIC);
            }
        }
        // out-to-out legs: straight plus (r + d) for each 90 or 180 degree bend at its ends
        double[] out = new double[n + 1];
        double[] centre = new double[n + 1];
        List<double[]> corners = new ArrayList<>();
        program.cornersM().forEach(p -> corners.add(p.toArray()));
        for (int i = 0; i <= n; i++) {
            out[i] = feed[i];
            if (i > 0 && square(steps.get(i - 1))) {
                out[i] += inside[i - 1] + d;
            }
            if (i < n && square(steps.get(i))) {
                out[i] += inside[i] + d;
            }
            centre[i] = distance(corners.get(i), corners.get(i + 1));
        }
        if (n == 0) {
            return b.dims(exactLengthM, null, null, null, null, null).length(exactLengthM).done(ShapeCode.S00);
        }
        if (n == 1) {
            BenderStep s = steps.get(0);
            if (feed[0] <= Tolerances.SHAPE_NO_STRAIGHT_M && feed[1] <= Tolerances.SHAPE_NO_STRAIGHT_M) {
                return b.dims(exactLengthM, null, null, null, null, inside[0]).length(exactLengthM)
                        .done(ShapeCode.S67);
            }
            if (is(s, 90)) {
                if (table.isEmpty() || Math.abs(inside[0] - r) <= TABLE_SLACK_M || inside[0] < r) {
                    return b.dims(out[0], out[1], null, null, null, inside[0])
                            .length(out[0] + out[1] - 0.5 * r - d).done(ShapeCode.S11);
                }
                double big = inside[0];
                return b.dims(out[0], out[1], null, null, null, big).length(out[0] + out[1] - 0.43 * big - 1.2 * d)
                        .done(ShapeCode.S12);
            }
            if (is(s, 180)) {
                double width = 2 * (inside[0] + d);
                return b.dims(out[0], width, out[1], null, null, inside[0])
                        .length(out[0] + 0.57 * width + out[1] - 1.6 * d).done(ShapeCode.S13);
            }
            return b.dims(centre[0], null, centre[1], null, null, inside[0]).length(centre[0] + centre[1])
                    .done(ShapeCode.S15);
        }
        boolean allSame = true;
        for (int i = 1; i < n; i++) {
            allSame &= Math.abs(steps.get(i).rotationDeg()) <= PLANE_DEG;
        }
        if (n == 2) {
            boolean opposite = Math.abs(Math.abs(steps.get(1).rotationDeg()) - 180) <= PLANE_DEG;
            if (is(steps.get(0), 90) && is(steps.get(1), 90)) {
                return b.dims(out[0], out[1], out[2], null, null, inside[0])
                        .length(out[0] + out[1] + out[2] - r - 2 * d).done(opposite ? ShapeCode.S23 : ShapeCode.S21);
            }
            if (opposite && !is(steps.get(0), 90) && !is(steps.get(1), 90) && !is(steps.get(0), 180)
                    && !is(steps.get(1), 180)) {
                return b.dims(centre[0], centre[1], centre[2], null, null, inside[0])
                        .length(centre[0] + centre[1] + centre[2]).done(ShapeCode.S26);
            }
        }
        if (n == 3 && allSame && is(steps.get(0), 90) && is(steps.get(1), 90)) {
            if (is(steps.get(2), 90)) {
                return b.dims(out[0], out[1], out[2], out[3], null, inside[0])
                        .length(out[0] + out[1] + out[2] + out[3] - 1.5 * r - 3 * d).done(ShapeCode.S31);
            }
        }
        ShapeResult more = MoreShapes.match(steps, feed, inside, d, r, b);
        if (more != null) {
            return more;
        }
        notes.add(n + " bends in a pattern not classified here");
        return b.done(ShapeCode.OTHER);
    }

    /** The schedule note of a US bar: the two ACI 318-19 minimum inside radii, with their tables. */
    private static String usNote(AciRadius.Bar u) {
        String hooks = String.format(Locale.ROOT, "%.1f mm for standard hooks (Table 25.3.1)", u.hookRadiusM() * 1000);
        String stirrups = u.stirrupRadiusM() == null ? "" : String.format(Locale.ROOT,
                ", %.1f mm for stirrups and ties (Table 25.3.2%s)", u.stirrupRadiusM() * 1000,
                u.stirrupFromMemory() ? ", from memory" : "");
        return "US bar " + u.number() + ": ACI 318-19 minimum inside radius " + hooks
                + stirrups + "; shape codes are still BS 8666's (ACI 315 bar types not covered)";
    }

    private static boolean square(BenderStep s) {
        return s.kind() == BenderStep.Kind.BEND && (is(s, 90) || is(s, 180));
    }

    private static boolean is(BenderStep s, double deg) {
        return Math.abs(s.angleDeg() - deg) <= ANGLE_DEG;
    }

    private static double distance(double[] a, double[] b) {
        return Math.sqrt((a[0] - b[0]) * (a[0] - b[0]) + (a[1] - b[1]) * (a[1] - b[1]) + (a[2] - b[2]) * (a[2] - b[2]));
    }
}
