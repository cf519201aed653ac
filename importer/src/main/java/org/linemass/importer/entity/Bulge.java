package org.linemass.importer.entity;

import java.util.List;
import org.linemass.geometry.Affine;
import org.linemass.geometry.BulgeArc;
import org.linemass.geometry.PackedSegments;
import org.linemass.geometry.Provenance;
import org.linemass.geometry.Segment;
import org.linemass.geometry.Vec3;
import org.linemass.tolerance.Tolerances;

/**
 * One polyline piece from OCS vertex (x1, y1) to (x2, y2) at elevation z with bulge b =
 * tan(theta / 4) (FACTS.md §7.5): b = 0 (or below {@link Tolerances#STRAIGHT_BULGE}) is straight, otherwise
 * the arc {@link BulgeArc} defines, in the frame {@code ocs}, whose axis objects all arcs of the
 * frame share. The packing builder gets the vertices and bulge rather than the arc.
 */
final class Bulge {

    private Bulge() {
    }

    /** Appends the piece to {@code out}. */
    static void append(double x1, double y1, double x2, double y2, double z, double b, Ocs.Frame ocs,
            Provenance p, List<Segment> out) {
        if (Math.abs(b) < Tolerances.STRAIGHT_BULGE) {
            straight(x1, y1, x2, y2, z, ocs, p, out);
            return;
        }
        if (x1 == x2 && y1 == y2) {
            // no chord, no arc (for finite values the same test as a zero chord length)
            straight(x1, y1, x2, y2, z, ocs, p, out);
            return;
        }
        if (out instanceof PackedSegments.Builder packed) {
            packed.addBulgeArc(x1, y1, x2, y2, z, b, ocs.map(), ocs.x(), ocs.y(), ocs.minusY(), p);
        } else {
            out.add(BulgeArc.of(x1, y1, x2, y2, z, b, ocs.map(), ocs.x(), ocs.y(), ocs.minusY(), p));
        }
    }

    /**
     * The straight between two OCS points. For the identity frame the world coordinates are the
     * OCS ones plus 0.0, exactly what applying the identity map gives (it turns -0.0 into +0.0),
     * without the intermediate vectors.
     */
    private static void straight(double x1, double y1, double x2, double y2, double z, Ocs.Frame ocs,
            Provenance p, List<Segment> out) {
        Affine m = ocs.map();
        if (m == Affine.IDENTITY) {
            Straights.add(out, x1 + 0.0, y1 + 0.0, z + 0.0, x2 + 0.0, y2 + 0.0, z + 0.0, p);
            return;
        }
        Vec3 a = m.apply(new Vec3(x1, y1, z));
        Vec3 b = m.apply(new Vec3(x2, y2, z));
        Straights.add(out, a.x(), a.y(), a.z(), b.x(), b.y(), b.z(), p);
    }
}
