package org.linemass.engine.bender;

import java.util.ArrayList;
import java.util.List;
import org.linemass.geometry.Vec3;
import org.linemass.tolerance.Tolerances;

/**
 * Builds the {@link BenderProgram} of a piece from its {@link FormRun}s. Feeds add up until the next
 * bend or coil. A bend's plane normal is its axis (for a sharp 180 degree reversal, the previous
 * plane); the rotation before a bend is the signed angle, about the direction of feed, from the
 * previous plane normal to this one. The radius of a circular bend is its circle's; of an elliptical or
 * spline bend, arc length over angle. Corner points: the closest approach of the straight lines
 * before and after each bend (their intersection when the bend is planar), or the bend's middle for a
 * reversal of 180 degrees or more, whose lines do not meet ahead of the bar.
 */
public final class BenderPrograms {

    private BenderPrograms() {
    }

    public static BenderProgram of(List<FormRun> runs) {
        if (runs.isEmpty()) {
            return BenderProgram.NONE;
        }
        Vec3 start = startOf(runs.get(0));
        Vec3 dir = startTangent(runs.get(0));
        List<BenderStep> steps = new ArrayList<>();
        List<Vec3> corners = new ArrayList<>();
        corners.add(start);
        double feed = 0;
        Vec3 first = null;
        Vec3 prev = null;
        Vec3 end = start;
        for (FormRun run : runs) {
            if (run instanceof FormRun.Feed f) {
                feed += f.lengthM();
                end = f.end();
            } else if (run instanceof FormRun.Turn t && !t.sharp() && t.circleRadiusM() == null
                    && !Double.isFinite(t.lengthM() / t.angleRad())) {
                // a curved run that turns by nothing (or by too little to give a radius: a spline whose
                // weights crowd its parameter into one end) is fed straight, not bent
                feed += t.lengthM();
                end = t.end();
            } else if (run instanceof FormRun.Turn t) {
                Vec3 axis = t.axis() != null ? t.axis() : prev != null ? prev : CoilFit.anyPerpendicular(t.tangentIn());
                double rotation = prev == null ? 0 : signedAngleDeg(prev, axis, t.tangentIn());
                double radius = t.sharp() ? 0 : t.circleRadiusM() != null ? t.circleRadiusM()
                        : t.lengthM() / t.angleRad();
                boolean exact = t.sharp() ? t.axis() != null || prev != null : t.circleRadiusM() != null;
                steps.add(new BenderStep(BenderStep.Kind.BEND, feed, rotation, Math.toDegrees(t.angleRad()), radius,
                        t.lengthM(), 0, 0, exact && t.planar()));
                corners.add(corner(t));
                feed = 0;
                if (first == null) {
                    first = axis;
                }
                prev = axis;
                end = t.end();
            } else if (run instanceof FormRun.Wind w) {
                double rotation = prev == null ? 0 : signedAngleDeg(prev, w.axis(), w.tangentIn());
                steps.add(new BenderStep(BenderStep.Kind.COIL, feed, rotation, Math.toDegrees(2 * Math.PI * w.turns()),
                        w.meanDiameterM() / 2, w.lengthM(), w.turns(), w.pitchM(), false));
                feed = 0;
                if (first == null) {
                    first = w.axis();
                }
                prev = w.axis();
                end = w.end();
            }
        }
        corners.add(end);
        if (first == null) {
            first = CoilFit.anyPerpendicular(dir);
        }
        return new BenderProgram(start, dir, first, steps, feed, corners);
    }

    /** Signed angle in degrees from {@code a} to {@code b} about the unit {@code about}. */
    static double signedAngleDeg(Vec3 a, Vec3 b, Vec3 about) {
        double deg = Math.toDegrees(Math.atan2(a.cross(b).dot(about), a.dot(b)));
        // a half turn is +180, never -180, so the output does not depend on rounding
        return deg <= -180 + Tolerances.BEND_HALF_TURN_SLACK ? 180 : deg;
    }

    private static Vec3 corner(FormRun.Turn t) {
        if (t.sharp()) {
            return t.start();
        }
        if (Math.PI - t.angleRad() <= Tolerances.BEND_HALF_TURN_SLACK || t.angleRad() > Math.PI) {
            return t.middle();
        }
        // closest points of the lines start + s tin and end + u tout
        Vec3 w = t.start().minus(t.end());
        double b = t.tangentIn().dot(t.tangentOut());
        double d = t.tangentIn().dot(w);
        double e = t.tangentOut().dot(w);
        double den = 1 - b * b;
        if (den <= 0) {
            return t.middle();
        }
        double s = (b * e - d) / den;
        double u = (e - b * d) / den;
        Vec3 p = t.start().plus(t.tangentIn().times(s));
        Vec3 q = t.end().plus(t.tangentOut().times(u));
        return p.plus(q).times(0.5);
    }

    private static Vec3 startOf(FormRun r) {
        if (r instanceof FormRun.Feed f) {
            return f.start();
        }
        if (r instanceof FormRun.Turn t) {
            return t.start();
        }
        return ((FormRun.Wind) r).start();
    }

    private static Vec3 startTangent(FormRun r) {
        if (r instanceof FormRun.Feed f) {
            return f.direction();
        }
        if (r instanceof FormRun.Turn t) {
            return t.tangentIn();
        }
        return ((FormRun.Wind) r).tangentIn();
    }
}
