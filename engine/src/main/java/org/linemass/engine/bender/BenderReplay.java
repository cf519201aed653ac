package org.linemass.engine.bender;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.linemass.geometry.Vec3;
import org.linemass.tolerance.Tolerances;

/**
 * Rebuilds the centre-line a {@link BenderProgram} makes, in closed form: straight feeds, and bends
 * as circular arcs turning the direction of feed {@code T} about the plane normal {@code B}
 * (Rodrigues: {@code T cos a + (B x T) sin a}; the bend's centre lies at {@code R (B x T)}). Gives the
 * end point, end direction, total centre-line length and the corner points (where the straight lines
 * before and after each bend meet, {@code R tan(a/2)} ahead of the bend's start; the bend's middle for a
 * bend of 180 degrees or more). Empty for a program
 * with a coil step (a coil is not rebuilt from its turns, pitch and diameter alone).
 */
public final class BenderReplay {

    /** The rebuilt piece. */
    public record Rebuilt(Vec3 endM, Vec3 endDirection, double lengthM, List<Vec3> cornersM) {

        public Rebuilt {
            cornersM = List.copyOf(cornersM);
        }
    }

    private BenderReplay() {
    }

    public static Optional<Rebuilt> replay(BenderProgram program) {
        Vec3 p = program.startM();
        Vec3 t = program.startDirection();
        Vec3 b = program.firstPlaneNormal();
        double length = 0;
        List<Vec3> corners = new ArrayList<>();
        corners.add(p);
        for (BenderStep s : program.steps()) {
            if (s.kind() == BenderStep.Kind.COIL) {
                return Optional.empty();
            }
            p = p.plus(t.times(s.feedM()));
            length += s.feedM();
            b = rotate(b, t, Math.toRadians(s.rotationDeg()));
            double a = Math.toRadians(s.angleDeg());
            double r = s.radiusM();
            Vec3 n = b.cross(t);
            if (a < Math.PI - Tolerances.BEND_HALF_TURN_SLACK) {
                corners.add(p.plus(t.times(r * Math.tan(a / 2))));
            } else {
                // legs parallel or crossing behind: the middle of the bend, as BenderPrograms gives it
                corners.add(p.plus(t.times(r * Math.sin(a / 2))).plus(n.times(r * (1 - Math.cos(a / 2)))));
            }
            Vec3 next = p.plus(t.times(r * Math.sin(a))).plus(n.times(r * (1 - Math.cos(a))));
            t = t.times(Math.cos(a)).plus(n.times(Math.sin(a)));
            p = next;
            length += r * a;
        }
        p = p.plus(t.times(program.lastFeedM()));
        length += program.lastFeedM();
        corners.add(p);
        return Optional.of(new Rebuilt(p, t, length, corners));
    }

    /** {@code v} rotated by {@code angle} about the unit {@code axis} (Rodrigues' formula). */
    static Vec3 rotate(Vec3 v, Vec3 axis, double angle) {
        double c = Math.cos(angle);
        double s = Math.sin(angle);
        return v.times(c).plus(axis.cross(v).times(s)).plus(axis.times(axis.dot(v) * (1 - c)));
    }
}
