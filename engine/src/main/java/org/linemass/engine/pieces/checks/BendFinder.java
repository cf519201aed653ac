package org.linemass.engine.pieces.checks;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.linemass.engine.pieces.geom.Curves;
import org.linemass.engine.result.Bend;
import org.linemass.engine.section.Section;
import org.linemass.geometry.CircularArc;
import org.linemass.geometry.Provenance;
import org.linemass.geometry.Segment;
import org.linemass.geometry.Vec3;
import org.linemass.tolerance.Tolerances;

/**
 * The bends of one oriented run of segments. A sharp corner is where the tangent turns by more
 * than the angle tolerance between consecutive segments (and between the last and the first of a
 * closed run): a bend with that angle and no radius. Every circular arc is a bend with its sweep
 * angle and centre-line radius; consecutive arcs on the same circle meeting tangentially are one
 * bend. The inside radius is the centre-line radius minus half the diameter for round sections,
 * and the centre-line radius when the section's diameter is unknown (no section or not round).
 * Elliptical arcs and splines are shaped curves, not bends.
 */
public final class BendFinder {

    private BendFinder() {
    }

    /** A bend and the entities that form it (the arc or arcs, or the two segments at a corner). */
    public record Located(Bend bend, List<Provenance> sources) {

        public Located {
            sources = List.copyOf(sources);
        }
    }

    /**
     * The bends with their entities, in order along the run; corners sharper than the angle tolerance
     * count, and arcs on one circle within the join tolerance are one bend.
     */
    public static List<Located> located(List<Segment> path, boolean closed, Optional<Section> section,
            Tolerances tol) {
        double angleRad = tol.angleRad();
        double joinM = tol.joinM();
        List<Segment> run = closed ? fromABreak(path, angleRad, joinM) : path;
        List<Located> out = new ArrayList<>();
        int n = run.size();
        Double halfDiameter = section.map(Section::diameterM).map(d -> d / 2).orElse(null);
        int i = 0;
        while (i < n) {
            Segment s = run.get(i);
            int last = i;
            if (s instanceof CircularArc arc) {
                double sweep = arc.sweep();
                while (last + 1 < n && run.get(last + 1) instanceof CircularArc next && sameCircle(arc, next, joinM)
                        && corner(run.get(last), next) <= angleRad) {
                    sweep += next.sweep();
                    last++;
                }
                Vec3 at = middle(run, i, last);
                double r = arc.radius();
                double inside = halfDiameter == null ? r : r - halfDiameter;
                List<Provenance> who = new ArrayList<>();
                for (int k = i; k <= last; k++) {
                    who.add(run.get(k).source());
                }
                out.add(new Located(new Bend(at, Math.toDegrees(sweep), inside, r), who));
            }
            boolean hasNext = last + 1 < n || (closed && n > 1);
            if (hasNext) {
                Segment next = run.get((last + 1) % n);
                double a = corner(run.get(last), next);
                if (a > angleRad) {
                    out.add(new Located(new Bend(run.get(last).end(), Math.toDegrees(a), null, null),
                            List.of(run.get(last).source(), next.source())));
                }
            }
            i = last + 1;
        }
        return out;
    }

    /**
     * A closed run rotated to start where one arc does not continue the previous one (a corner or
     * a change of circle or kind), so an arc drawn across the loop's start is one bend.
     */
    private static List<Segment> fromABreak(List<Segment> run, double angleRad, double joinM) {
        int n = run.size();
        for (int k = 0; k < n; k++) {
            Segment prev = run.get((k + n - 1) % n);
            Segment cur = run.get(k);
            boolean continues = prev instanceof CircularArc p && cur instanceof CircularArc c && sameCircle(p, c, joinM)
                    && corner(prev, cur) <= angleRad;
            if (!continues) {
                if (k == 0) {
                    return run;
                }
                List<Segment> out = new ArrayList<>(run.subList(k, n));
                out.addAll(run.subList(0, k));
                return out;
            }
        }
        return run;
    }

    /** Turning angle between the end tangent of {@code a} and the start tangent of {@code b}. */
    public static double corner(Segment a, Segment b) {
        return Curves.angleBetween(Curves.endTangent(a), Curves.startTangent(b));
    }

    private static boolean sameCircle(CircularArc a, CircularArc b, double tol) {
        return a.centre().distance(b.centre()) <= tol && Math.abs(a.radius() - b.radius()) <= tol;
    }

    private static Vec3 middle(List<Segment> run, int from, int to) {
        double total = 0;
        for (int k = from; k <= to; k++) {
            total += ((CircularArc) run.get(k)).length();
        }
        double half = total / 2;
        for (int k = from; k <= to; k++) {
            CircularArc a = (CircularArc) run.get(k);
            if (half <= a.length() || k == to) {
                double t = a.t0() + Math.min(1, half / a.length()) * a.sweep();
                return a.point(t);
            }
            half -= a.length();
        }
        return run.get(from).start();
    }
}
