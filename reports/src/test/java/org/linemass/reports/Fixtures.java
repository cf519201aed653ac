package org.linemass.reports;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.linemass.drawing.LengthUnit;
import org.linemass.drawing.UnitSource;
import org.linemass.engine.moments.Moments;
import org.linemass.engine.moments.Sym3;
import org.linemass.engine.result.DrawingInfo;
import org.linemass.engine.result.DrawingResult;
import org.linemass.engine.result.EntityCounts;
import org.linemass.engine.result.Finding;
import org.linemass.engine.result.FindingKind;
import org.linemass.engine.result.LayerResult;
import org.linemass.engine.result.MarkResult;
import org.linemass.engine.result.PieceResult;
import org.linemass.engine.result.SectionUse;
import org.linemass.engine.result.Severity;
import org.linemass.engine.result.SourceRef;
import org.linemass.engine.result.Totals;
import org.linemass.geometry.Vec3;

/**
 * Hand-built drawing results for writer tests. Values are closed forms: a straight rod of length
 * L along unit u has centroid at its middle and covariance (L^3/12) u u^T; a circle of radius r
 * has length 2 pi r and covariance (L r^2 / 2) in its plane (textbook line integrals, FACTS.md
 * section 5). The 10 mm bar weighs 0.617 kg/m (FACTS.md section 1.1, BS 4449 / EN 10080).
 */
public final class Fixtures {

    /** FACTS.md section 1.1: nominal mass of a 10 mm bar, kg/m. */
    public static final double B10_KG_PER_M = 0.617;
    /** A layer name that would run as script if not escaped. */
    public static final String SCRIPT_LAYER = "<script>alert(1)</script>";
    /** A mark that a spreadsheet would run as a formula if not guarded. */
    public static final String FORMULA_MARK = "=HYPERLINK(\"http://x.invalid\",\"y\")";

    private Fixtures() {
    }

    /** Moments of the straight rod from a to b, unit density. */
    public static Moments rod(Vec3 a, Vec3 b) {
        Vec3 d = b.minus(a);
        double l = d.norm();
        return new Moments(l, a.plus(b).times(0.5), Sym3.outer(d).times(l / 12.0), 0);
    }

    /** Moments of a horizontal circle of radius r about centre c, unit density. */
    public static Moments ring(Vec3 c, double r) {
        double l = 2 * Math.PI * r;
        return new Moments(l, c, new Sym3(l * r * r / 2, 0, 0, l * r * r / 2, 0, 0), 0);
    }

    /**
     * Two identical 1 m bars (mark A, section B10, layer BARS) at y = 0 and y = 0.5 m, plus a
     * ring of radius 0.1 m at z = {@code ringZ} on a layer named like a script tag with no
     * section; a gap, a duplicate and an info finding; optionally incomplete.
     */
    public static DrawingResult frame(String file, double ringZ, boolean incomplete) {
        Vec3 a0 = Vec3.ZERO;
        Vec3 a1 = new Vec3(1, 0, 0);
        Vec3 b0 = new Vec3(0, 0.5, 0);
        Vec3 b1 = new Vec3(1, 0.5, 0);
        Moments barA = rod(a0, a1);
        Moments barB = rod(b0, b1);
        Moments bars = barA.plus(barB);
        Vec3 ringC = new Vec3(0.5, 0.25, ringZ);
        Moments ring = ring(ringC, 0.1);
        Moments all = bars.plus(ring);
        Moments barsMass = bars.scaledDensity(B10_KG_PER_M);
        SourceRef la = new SourceRef(120, "2A", "LINE", List.of());
        SourceRef lb = new SourceRef(134, "2B", "LINE", List.of());
        SourceRef rc = new SourceRef(150, "", "CIRCLE", List.of("RING_BLOCK"));
        List<PieceResult> pieces = List.of(
                new PieceResult(1, "BARS", "B10", 1.0, B10_KG_PER_M, barA.centroid(), barA.inertia(),
                        barA.scaledDensity(B10_KG_PER_M).inertia(), a0, a1, false, 1, "A", List.of(), List.of(la), 1e-15),
                new PieceResult(2, "BARS", "B10", 1.0, B10_KG_PER_M, barB.centroid(), barB.inertia(),
                        barB.scaledDensity(B10_KG_PER_M).inertia(), b0, b1, false, 1, "A", List.of(), List.of(lb), 1e-15),
                new PieceResult(3, SCRIPT_LAYER, null, ring.mass(), null, ringC, ring.inertia(), null,
                        new Vec3(0.6, 0.25, ringZ), new Vec3(0.6, 0.25, ringZ), true, 1, FORMULA_MARK, List.of(),
                        List.of(rc), 1e-12));
        List<MarkResult> groups = List.of(
                new MarkResult("A", 2, "BARS", "B10", "steel", 1.0, B10_KG_PER_M, 2.0, 2 * B10_KG_PER_M, 0, List.of(1, 2)),
                new MarkResult(FORMULA_MARK, 1, SCRIPT_LAYER, null, null, ring.mass(), null, ring.mass(), null, 0,
                        List.of(3)));
        List<Finding> findings = List.of(
                new Finding(FindingKind.GAP, Severity.ERROR, new Vec3(1.0005, 0, 0), 0.001, "BARS", List.of(la),
                        null, "ends 1 mm apart on layer BARS were not joined"),
                new Finding(FindingKind.DUPLICATE, Severity.WARNING, new Vec3(0.5, 0.5, 0), 1.0, "BARS",
                        List.of(lb, la), B10_KG_PER_M, "line drawn twice, counted once"),
                new Finding(FindingKind.UNITS_ASSUMED, Severity.INFO, null, null, null, List.of(),
                        null, "-1+1 message starting with a minus"));
        List<LayerResult> layers = List.of(
                new LayerResult("BARS", 2.0, 3.0, bars.centroid(), bars.inertia(), "B10", barsMass.mass(),
                        barsMass.centroid(), barsMass.inertia(), 2, 2e-15, true),
                new LayerResult(SCRIPT_LAYER, ring.mass(), ring.mass(), ringC, ring.inertia(), null, null, null,
                        null, 1, 1e-12, true));
        Totals totals = new Totals(all.mass(), all.mass() + 1.0, all.centroid(), all.inertia(), barsMass.mass(),
                barsMass.centroid(), barsMass.inertia(), false, 1e-12);
        List<String> reasons = new ArrayList<>();
        if (incomplete) {
            reasons.add("SPLINE at line 400 skipped: knots decrease");
        }
        return new DrawingResult(new DrawingInfo(file, "AC1015", false, LengthUnit.MILLIMETRE, UnitSource.HEADER),
                new EntityCounts(Map.of("LINE", 3L, "CIRCLE", 1L), Map.of("TEXT", 2L), 4),
                layers, pieces, groups, findings, totals,
                List.of(new SectionUse("B10", "10 mm reinforcing bar", "steel", B10_KG_PER_M, 0.010,
                        "BS 4449 nominal mass <table 1>")), reasons);
    }

    /** {@link #frame} as a 2D drawing (ring at z = 0), complete. */
    public static DrawingResult flatFrame(String file) {
        return frame(file, 0, false);
    }
}
