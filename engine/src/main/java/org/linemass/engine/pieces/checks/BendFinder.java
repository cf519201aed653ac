package org.linemass.engine.pieces.checks;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.linemass.engine.bender.FormRun;
import org.linemass.engine.bender.RunSplitter;
import org.linemass.engine.pieces.geom.Curves;
import org.linemass.engine.result.Bend;
import org.linemass.engine.section.Section;
import org.linemass.geometry.Provenance;
import org.linemass.geometry.Segment;
import org.linemass.tolerance.Tolerances;

/**
 * The bends of one oriented run of segments: the {@link FormRun.Turn}s of {@link RunSplitter}. A
 * sharp corner is a bend with its angle and no radius. A curved run (circular arcs on one circle, or
 * elliptical arcs and splines meeting smoothly) is a bend with its total turning angle; its radius is
 * the circle's centre-line radius, or for ellipses and splines the smallest centre-line radius of
 * curvature along it. Coils and rings are not bends. The inside radius is the centre-line radius
 * minus half the diameter for round sections, and the centre-line radius when the section's diameter
 * is unknown (no section or not round).
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
     * The bends with their entities, in order along the run (coils and rings are not bends); corners
     * sharper than the angle tolerance count, and arcs on one circle within the join tolerance are one
     * bend.
     */
    public static List<Located> located(List<Segment> path, boolean closed, Optional<Section> section,
            Tolerances tol) {
        return located(RunSplitter.split(path, closed, tol.angleRad(), tol.joinM()), section);
    }

    /** As {@link #located(List, boolean, Optional, Tolerances)} from the path's runs, already split. */
    public static List<Located> located(List<FormRun> runs, Optional<Section> section) {
        Double halfDiameter = section.map(Section::diameterM).map(d -> d / 2).orElse(null);
        List<Located> out = new ArrayList<>();
        for (FormRun run : runs) {
            if (run instanceof FormRun.Turn t) {
                Double r = t.circleRadiusM() != null ? t.circleRadiusM() : t.minRadiusM();
                Double inside = r == null || halfDiameter == null ? r : Double.valueOf(r - halfDiameter);
                out.add(new Located(new Bend(t.middle(), Math.toDegrees(t.angleRad()), inside, r), t.sources()));
            }
        }
        return out;
    }

    /** Turning angle between the end tangent of {@code a} and the start tangent of {@code b}. */
    public static double corner(Segment a, Segment b) {
        return Curves.angleBetween(Curves.endTangent(a), Curves.startTangent(b));
    }
}
