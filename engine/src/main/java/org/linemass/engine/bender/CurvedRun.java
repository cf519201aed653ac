package org.linemass.engine.bender;

import java.util.ArrayList;
import java.util.List;
import org.linemass.engine.pieces.geom.Curves;
import org.linemass.geometry.CircularArc;
import org.linemass.geometry.Provenance;
import org.linemass.geometry.Vec3;
import org.linemass.tolerance.Tolerances;

/**
 * Measures one curved run (smoothly joined curved elements) as a bend, a coil or, when it hardly
 * turns, a straight feed. See {@link RunSplitter} for the rules; package-private.
 */
final class CurvedRun {

    /** Sine of the angle between two samples' tangents below which their binormal is noise. */
    private static final double INFLECTION_NOISE = Tolerances.BEND_INFLECTION_NOISE;

    private CurvedRun() {
    }

    /**
     * The curved run as one or more runs: a run of ellipses or splines whose turning changes direction
     * (an S-curve, a wave) is cut at each inflection, found between two samples, into one bend per lobe.
     */
    static List<FormRun> analyseAll(List<Element> group, List<Provenance> who, boolean ring, double angleRad,
            double joinM) {
        List<List<Element>> lobes = ring ? List.of(group) : lobes(group);
        List<FormRun> out = new ArrayList<>();
        for (List<Element> lobe : lobes) {
            double length = 0;
            for (Element e : lobe) {
                length += e.length();
            }
            out.add(analyse(lobe, length, lobes.size() == 1 ? who : sourcesOf(lobe), ring, angleRad, joinM));
        }
        return out;
    }

    private static List<Provenance> sourcesOf(List<Element> lobe) {
        List<Provenance> who = new ArrayList<>();
        org.linemass.geometry.Segment prev = null;
        for (Element e : lobe) {
            if (e.segment() != prev) {
                who.add(e.segment().source());
                prev = e.segment();
            }
        }
        return who;
    }

    /** The group cut at the samples where the binormal reverses (arcs of one circle never do). */
    private static List<List<Element>> lobes(List<Element> group) {
        List<List<Element>> out = new ArrayList<>();
        List<Element> cur = new ArrayList<>();
        Vec3 lastCross = null;
        Vec3 prevTan = null;
        for (Element e : group) {
            if (e.segment() instanceof CircularArc) {
                cur.add(e);
                prevTan = e.endTangent();
                continue;
            }
            int m = e.samples();
            double from = e.t0();
            for (int j = 0; j <= m; j++) {
                double t = e.t0() + (e.t1() - e.t0()) * j / m;
                Vec3 tan = j == 0 ? e.startTangent() : j == m ? e.endTangent() : e.tangent(t, 0);
                if (prevTan != null) {
                    Vec3 c = prevTan.cross(tan);
                    if (c.norm() > INFLECTION_NOISE) {
                        if (lastCross != null && c.dot(lastCross) < 0 && t > from) {
                            cur.add(new Element(e.segment(), from, t, false));
                            out.add(cur);
                            cur = new ArrayList<>();
                            from = t;
                        }
                        lastCross = c;
                    }
                }
                prevTan = tan;
            }
            if (e.t1() > from) {
                cur.add(new Element(e.segment(), from, e.t1(), false));
            }
        }
        if (!cur.isEmpty()) {
            out.add(cur);
        }
        return out;
    }

    static FormRun analyse(List<Element> group, double length, List<Provenance> who, boolean ring, double angleRad,
            double joinM) {
        List<Vec3> pts = new ArrayList<>();
        List<Vec3> tans = new ArrayList<>();
        double minRadius = Double.POSITIVE_INFINITY;
        boolean allArcs = true;
        double sweep = 0;
        boolean arcsOnly = group.stream().allMatch(e -> e.segment() instanceof CircularArc);
        double arcSweep = group.stream().mapToDouble(e -> e.t1() - e.t0()).sum();
        if (arcsOnly && !ring && arcSweep <= Math.PI) {
            // arcs of one circle turning less than half a turn: exact, no samples needed
            return arcBend(group, length, who, arcSweep);
        }
        for (Element e : group) {
            int m = e.samples();
            if (e.segment() instanceof CircularArc arc) {
                sweep += e.t1() - e.t0();
                minRadius = Math.min(minRadius, arc.radius());
            } else {
                allArcs = false;
            }
            for (int j = 0; j <= m; j++) {
                double t = e.t0() + (e.t1() - e.t0()) * j / m;
                pts.add(e.segment().point(t));
                tans.add(j == 0 ? e.startTangent() : j == m ? e.endTangent() : e.tangent(t, 0));
                if (!allArcs) {
                    minRadius = Math.min(minRadius, e.radiusOfCurvature(t));
                }
            }
        }
        double turning = 0;
        Vec3 axisSum = Vec3.ZERO;
        for (int j = 0; j + 1 < tans.size(); j++) {
            turning += Curves.angleBetween(tans.get(j), tans.get(j + 1));
            axisSum = axisSum.plus(tans.get(j).cross(tans.get(j + 1)));
        }
        Element first = group.get(0);
        Element last = group.get(group.size() - 1);
        Vec3 start = first.start();
        Vec3 end = last.end();
        Vec3 tin = first.startTangent();
        Vec3 tout = last.endTangent();
        Vec3 axis;
        if (allArcs) {
            axis = ((CircularArc) first.segment()).normal().unit();
        } else {
            axis = axisSum.norm() > Tolerances.BEND_AXIS_MIN ? axisSum.unit() : null;
        }
        boolean planar = axis != null;
        if (planar) {
            for (Vec3 p : pts) {
                if (Math.abs(p.minus(start).dot(axis)) > joinM) {
                    planar = false;
                    break;
                }
            }
        }
        if (ring || turning > Math.PI) {
            CoilFit.Fit fit = CoilFit.fit(pts, tans, planar ? axis : null);
            if (fit != null && (ring || fit.turns() >= 1 - Tolerances.COIL_TURN_SLACK)) {
                double turns = ring ? 1 : fit.turns();
                double pitch = ring ? 0 : fit.pitchM();
                return new FormRun.Wind(start, end, tin, tout, turns, pitch, fit.meanDiameterM(), fit.axis(), length,
                        ring, who);
            }
        }
        if (turning <= angleRad) {
            Vec3 d = end.minus(start);
            return new FormRun.Feed(start, end, d.norm() > 0 ? d.unit() : tin, length, who);
        }
        double angle;
        if (allArcs) {
            angle = sweep;
        } else if (planar) {
            angle = 0;
            for (int j = 0; j + 1 < tans.size(); j++) {
                Vec3 a = tans.get(j);
                Vec3 b = tans.get(j + 1);
                angle += Math.atan2(a.cross(b).dot(axis), a.dot(b));
            }
        } else {
            angle = turning;
        }
        Double circle = allArcs ? ((CircularArc) first.segment()).radius() : null;
        Vec3 middle = allArcs ? arcMiddle(group) : sampledMiddle(pts);
        return new FormRun.Turn(start, end, middle, angle, axis, tin, tout, length, circle, minRadius, planar, who);
    }

    private static FormRun.Turn arcBend(List<Element> group, double length, List<Provenance> who, double sweep) {
        Element first = group.get(0);
        Element last = group.get(group.size() - 1);
        CircularArc arc = (CircularArc) first.segment();
        return new FormRun.Turn(first.start(), last.end(), arcMiddle(group), sweep, arc.normal().unit(),
                first.startTangent(), last.endTangent(), length, arc.radius(), arc.radius(), true, who);
    }

    /** The point half way along arcs of one circle (exact). */
    private static Vec3 arcMiddle(List<Element> group) {
        double total = 0;
        for (Element e : group) {
            total += e.length();
        }
        double half = total / 2;
        for (int k = 0; k < group.size(); k++) {
            Element e = group.get(k);
            double len = e.length();
            if (half <= len || k == group.size() - 1) {
                return e.segment().point(e.t0() + Math.min(1, half / len) * (e.t1() - e.t0()));
            }
            half -= len;
        }
        return group.get(0).start();
    }

    /** The sample half way along the sampled polyline, interpolated on its chord. */
    private static Vec3 sampledMiddle(List<Vec3> pts) {
        double total = 0;
        for (int j = 0; j + 1 < pts.size(); j++) {
            total += pts.get(j).distance(pts.get(j + 1));
        }
        double half = total / 2;
        for (int j = 0; j + 1 < pts.size(); j++) {
            double c = pts.get(j).distance(pts.get(j + 1));
            if (half <= c && c > 0) {
                return pts.get(j).plus(pts.get(j + 1).minus(pts.get(j)).times(half / c));
            }
            half -= c;
        }
        return pts.get(pts.size() - 1);
    }
}
