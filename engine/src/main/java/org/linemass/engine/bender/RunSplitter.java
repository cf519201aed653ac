package org.linemass.engine.bender;

import java.util.ArrayList;
import java.util.List;
import org.linemass.engine.pieces.geom.Curves;
import org.linemass.geometry.CircularArc;
import org.linemass.geometry.Provenance;
import org.linemass.geometry.Segment;
import org.linemass.geometry.Vec3;
import org.linemass.tolerance.Tolerances;

/**
 * Splits one oriented run of segments (a piece) into {@link FormRun}s. The segments become smooth
 * elements (whole segments, or the knot spans of a spline); where the tangent turns by more than the
 * angle tolerance between two elements there is a sharp corner. Consecutive straight elements make one
 * {@link FormRun.Feed}; consecutive curved elements (arcs, ellipses, splines) meeting smoothly make
 * one curved run, except that circular arcs on different circles are different bends. A curved run
 * that winds once or more about one axis, and a closed piece with no straight and no corner, is a
 * {@link FormRun.Wind}; a curved run turning by less than the angle tolerance is a feed; any other
 * curved run is a {@link FormRun.Turn} (one per lobe where an ellipse or spline run changes its
 * turning direction) whose angle is its total turning (exact, the sum of the sweeps,
 * for arcs on one circle; the sum of the angles between closely sampled tangents otherwise, which is
 * exact in a plane whatever the sampling because plane angles add). This holds under every affine
 * image of the drawing: a scaled corner arc is an elliptical arc turning through the same angle.
 *
 * <p>A closed piece is first rotated to start at the first element that does not smoothly continue
 * an arc of the same circle, so a bend drawn across the loop's start is one bend. An empty run gives
 * no runs.
 */
public final class RunSplitter {

    private RunSplitter() {
    }

    /**
     * @param path the segments in order, each end meeting the next start
     * @param closed whether the last end meets the first start
     * @param angleRad turning below this is straight on (radians)
     * @param joinM positional tolerance (metres): points this close to a plane are in it
     */
    public static List<FormRun> split(List<Segment> path, boolean closed, double angleRad, double joinM) {
        List<Element> els = new ArrayList<>();
        for (Segment s : path) {
            els.addAll(Element.of(s));
        }
        List<FormRun> out = new ArrayList<>();
        int n = els.size();
        if (n == 0) {
            return out;
        }
        boolean ring = false;
        if (closed) {
            int k = firstBreak(els, angleRad, joinM);
            if (k < 0) {
                ring = true;
            } else if (k > 0) {
                List<Element> rotated = new ArrayList<>(els.subList(k, n));
                rotated.addAll(els.subList(0, k));
                els = rotated;
            }
        }
        List<Element> group = new ArrayList<>();
        for (Element e : els) {
            if (!group.isEmpty()) {
                Element prev = group.get(group.size() - 1);
                double a = corner(prev, e);
                if (a > angleRad) {
                    flush(group, out, false, angleRad, joinM);
                    out.add(cornerTurn(prev, e, a));
                } else if (prev.straight() != e.straight() || !sameCircle(prev, e, joinM)) {
                    flush(group, out, false, angleRad, joinM);
                }
            }
            group.add(e);
        }
        flush(group, out, ring, angleRad, joinM);
        if (closed && !ring) {
            Element last = els.get(n - 1);
            Element first = els.get(0);
            double a = corner(last, first);
            if (a > angleRad) {
                out.add(cornerTurn(last, first, a));
            }
        }
        return out;
    }

    /** Index of the first element that does not smoothly continue the one before it (cyclically); -1 if none. */
    private static int firstBreak(List<Element> els, double angleRad, double joinM) {
        int n = els.size();
        for (int k = 0; k < n; k++) {
            Element prev = els.get((k + n - 1) % n);
            Element cur = els.get(k);
            boolean continues = !prev.straight() && !cur.straight() && sameCircle(prev, cur, joinM)
                    && corner(prev, cur) <= angleRad;
            if (!continues) {
                return k;
            }
        }
        return -1;
    }

    /** Turning angle between the end tangent of {@code a} and the start tangent of {@code b}. */
    static double corner(Element a, Element b) {
        return Curves.angleBetween(a.endTangent(), b.startTangent());
    }

    /** False only for two circular arcs that are not on one circle. */
    private static boolean sameCircle(Element a, Element b, double tol) {
        if (a.segment() instanceof CircularArc p && b.segment() instanceof CircularArc c) {
            return p.centre().distance(c.centre()) <= tol && Math.abs(p.radius() - c.radius()) <= tol;
        }
        return true;
    }

    private static FormRun.Turn cornerTurn(Element a, Element b, double angle) {
        Vec3 tin = a.endTangent();
        Vec3 tout = b.startTangent();
        Vec3 c = tin.cross(tout);
        Vec3 axis = c.norm() > Tolerances.BEND_AXIS_MIN ? c.unit() : null;
        Vec3 at = a.end();
        List<Provenance> who = a.segment().source().equals(b.segment().source()) && a.segment() == b.segment()
                ? List.of(a.segment().source()) : List.of(a.segment().source(), b.segment().source());
        return new FormRun.Turn(at, at, at, angle, axis, tin, tout, 0, null, null, true, who);
    }

    private static void flush(List<Element> group, List<FormRun> out, boolean ring, double angleRad, double joinM) {
        if (group.isEmpty()) {
            return;
        }
        List<Provenance> who = sources(group);
        Element first = group.get(0);
        Element last = group.get(group.size() - 1);
        double length = 0;
        for (Element e : group) {
            length += e.length();
        }
        if (first.straight()) {
            Vec3 a = first.start();
            Vec3 b = last.end();
            Vec3 d = b.minus(a);
            Vec3 dir = d.norm() > 0 ? d.unit() : first.startTangent();
            out.add(new FormRun.Feed(a, b, dir, length, who));
            group.clear();
            return;
        }
        out.addAll(CurvedRun.analyseAll(group, who, ring, angleRad, joinM));
        group.clear();
    }

    /** One entry per segment, in order (a spline's spans share one). */
    private static List<Provenance> sources(List<Element> group) {
        List<Provenance> who = new ArrayList<>();
        Segment prev = null;
        for (Element e : group) {
            if (e.segment() != prev) {
                who.add(e.segment().source());
                prev = e.segment();
            }
        }
        return who;
    }
}
