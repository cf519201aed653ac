package org.linemass.engine.pieces;

import java.util.Optional;
import org.linemass.engine.piece.SectionLookup;
import org.linemass.tolerance.Tolerances;
import org.linemass.engine.section.Section;
import org.linemass.geometry.CircularArc;
import org.linemass.geometry.Provenance;
import org.linemass.geometry.Straight;
import org.linemass.geometry.Vec3;

/** Hand-built segments for the piece tests; coordinates in millimetres, segments in metres. */
final class Fixtures {

    static final double MM = 1e-3;

    /**
     * Steel wire of 4 mm: kg/m = pi d^2 / 4 * 7850 kg/m^3 (density: FACTS.md section 2, EN 1993-1-1
     * design value) = 0.098646 kg/m; no minimum bend radius.
     */
    static final Section WIRE_D4 = new Section("W4", "steel wire 4 mm", "steel", Math.PI * 0.004 * 0.004 / 4 * 7850,
            0.004, null, "closed form");

    /**
     * Reinforcing bar 12 mm: 0.888 kg/m (FACTS.md 1.1, BS 4449 table), minimum mandrel diameter
     * 4 phi for phi <= 16 mm (FACTS.md 6.1, EN 1992-1-1 Table 8.1N), i.e. inside radius 2 phi = 24 mm.
     */
    static final Section BAR_B12 = new Section("B12", "rebar 12 mm", "steel", 0.888, 0.012, 0.024, "FACTS.md");

    private Fixtures() {
    }

    static Provenance src(String layer, String handle) {
        return Provenance.of("test.dxf", layer, Integer.parseInt(handle, 16), handle, "LINE");
    }

    static Vec3 mm(double x, double y) {
        return new Vec3(x * MM, y * MM, 0);
    }

    static Vec3 mm(double x, double y, double z) {
        return new Vec3(x * MM, y * MM, z * MM);
    }

    static Straight line(String layer, String handle, double x1, double y1, double x2, double y2) {
        return new Straight(mm(x1, y1), mm(x2, y2), src(layer, handle));
    }

    /** Counter-clockwise arc in the x-y plane, angles in degrees. */
    static CircularArc arc(String layer, String handle, double cx, double cy, double r, double fromDeg,
            double toDeg) {
        return CircularArc.of(mm(cx, cy), r * MM, Vec3.X, Vec3.Y, Math.toRadians(fromDeg), Math.toRadians(toDeg),
                Provenance.of("test.dxf", layer, Integer.parseInt(handle, 16), handle, "ARC"));
    }

    /** Join 0.1 mm, gap limit 5 mm, noise 1e-12 m, group 0.1 mm, angle 0.01 degree. */
    static Tolerances tol() {
        return new Tolerances(1e-4, 5e-3, 1e-12, 1e-4, 1e-10, Math.toRadians(0.01));
    }

    static SectionLookup sections(String layer, Section s) {
        return l -> l.equals(layer) ? Optional.of(s) : Optional.empty();
    }

    static SectionLookup none() {
        return l -> Optional.empty();
    }
}
