package org.linemass.engine.analyzer;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;
import org.linemass.drawing.Drawing;
import org.linemass.engine.error.AnalysisException;
import org.linemass.engine.settings.AnalysisSettings;
import org.linemass.engine.Analyzer;
import org.linemass.engine.moments.Sym3;
import org.linemass.engine.result.DrawingResult;
import org.linemass.engine.result.LayerResult;
import org.linemass.engine.section.AssignmentReader;
import org.linemass.engine.section.BuiltInSections;
import org.linemass.engine.testing.Drawings;
import org.linemass.engine.testing.SimpleStages;
import org.linemass.geometry.Affine;
import org.linemass.geometry.EllipticalArc;
import org.linemass.geometry.Nurbs;
import org.linemass.geometry.Provenance;
import org.linemass.geometry.Segment;
import org.linemass.geometry.Vec3;

/**
 * Moving, rotating or mirroring a whole drawing changes length and mass by less than 1e-9 relative
 * and moves centroid and inertia with it: {@code g' = Q g + t}, {@code I' = Q I Q^T}.
 */
class RigidMotionPropertyTest {

    private static final double REL = 1e-9;

    private static List<Segment> garden(Drawings d) {
        Provenance p = d.src("WIRE", "SPLINE");
        Nurbs n = Nurbs.of(3, new double[] {0, 0, 0, 0, 1, 2, 2, 2, 2}, new Vec3[] {new Vec3(0, 0, 0),
            new Vec3(300, 500, 0), new Vec3(900, -200, 100), new Vec3(1200, 400, 300), new Vec3(1500, 0, 0)}, null, p);
        EllipticalArc e = EllipticalArc.of(new Vec3(500, 500, 50), new Vec3(400, 0, 0), new Vec3(0, 150, 60), 0, 4,
                d.src("RIM", "ELLIPSE"));
        return List.of(n, e);
    }

    private static Drawing build(Affine map) {
        Drawings d = Drawings.create();
        List<Segment> curves = garden(d);
        Drawings.BlockBuilder m = d.model();
        m.line("FRAME", map.apply(new Vec3(0, 0, 0)), map.apply(new Vec3(2000, 0, 0)));
        m.line("FRAME", map.apply(new Vec3(2000, 0, 0)), map.apply(new Vec3(2000, 1000, 0)));
        m.segment(org.linemass.geometry.CircularArc.of(new Vec3(1000, 1000, 0), 250, Vec3.X, Vec3.Y, 0.5, 3.5,
                d.src("RIM", "ARC")).transformed(map));
        for (Segment s : curves) {
            m.segment(s.transformed(map));
        }
        return d.build();
    }

    @Property(tries = 25)
    void movingTheDrawing_movesResults(@ForAll @DoubleRange(min = -3.2, max = 3.2) double angle,
            @ForAll @DoubleRange(min = -1e5, max = 1e5) double tx, @ForAll @DoubleRange(min = -1e5, max = 1e5) double ty,
            @ForAll boolean mirror) throws AnalysisException {
        Affine q = Affine.rotationZ(angle).andThen(mirror ? Affine.scale(1, -1, 1) : Affine.IDENTITY)
                .andThen(Affine.rotationZ(0.3 * angle));
        Affine map = q.andThen(Affine.translation(new Vec3(tx, ty, 0.5 * tx)));
        AnalysisSettings s = AnalysisSettings.defaults(BuiltInSections.table()).withAssignments(List.of(
                AssignmentReader.parseArgument("*=RB10")));
        DrawingResult a = Analyzer.analyze(build(Affine.IDENTITY), s, SimpleStages.EACH_SEGMENT);
        DrawingResult b = Analyzer.analyze(build(map), s, SimpleStages.EACH_SEGMENT);
        double[] qm = q.linearRowMajor();
        for (int i = 0; i < a.layers().size(); i++) {
            LayerResult la = a.layers().get(i);
            LayerResult lb = b.layers().get(i);
            assertEquals(la.lengthM(), lb.lengthM(), REL * la.lengthM());
            assertEquals(la.massKg(), lb.massKg(), REL * la.massKg());
            // translations of 1e5 mm = 100 m: centroid rounding ~1e-14 relative of 100 m
            Vec3 moved = map.apply(la.centroidM().times(1000)).times(0.001);
            assertTrue(moved.closeTo(lb.centroidM(), 1e-9 * (1 + moved.norm())), moved + " vs " + lb.centroidM());
            Sym3 rotated = la.inertiaKgM2().rotated(qm);
            assertEquals(0, rotated.minus(lb.inertiaKgM2()).maxAbs(), REL * la.inertiaKgM2().maxAbs() * 10);
        }
    }
}
