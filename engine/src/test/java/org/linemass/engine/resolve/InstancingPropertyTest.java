package org.linemass.engine.resolve;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;


import java.util.Map;
import java.util.TreeMap;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.IntRange;
import org.linemass.drawing.LengthUnit;
import org.linemass.drawing.UnitSource;
import org.linemass.engine.settings.AnalysisSettings;
import org.linemass.engine.integrate.MomentIntegrator;
import org.linemass.engine.moments.Moments;
import org.linemass.engine.moments.MomentsAccumulator;
import org.linemass.engine.section.SectionTable;
import org.linemass.engine.testing.Drawings;
import org.linemass.geometry.Affine;
import org.linemass.geometry.Segment;
import org.linemass.geometry.Vec3;

/**
 * Instancing (block moments integrated once, transformed per insert, arrays in closed form) equals
 * integrating the explicitly expanded world segments, for random nests of blocks placed by random
 * rotations, mirrors, uniform and non-uniform scales and arrays.
 */
class InstancingPropertyTest {

    /** Both sides are sums of the same integrals at 1e-10 relative, combined in different orders. */
    private static final double REL = 1e-9;

    @Property(tries = 30)
    void instancing_equalsExpansion(@ForAll @IntRange(min = 0, max = 1_000_000) int seed) {
        java.util.Random rnd = new java.util.Random(seed);
        Drawings d = Drawings.create().unit(LengthUnit.INCH, UnitSource.HEADER);
        int blocks = 1 + rnd.nextInt(4);
        for (int b = 0; b < blocks; b++) {
            Drawings.BlockBuilder bb = d.block("B" + b);
            bb.line(rnd.nextBoolean() ? "0" : "OWN", new Vec3(rnd.nextDouble(), 0, 0), new Vec3(2, rnd.nextDouble(), 1));
            bb.arc(rnd.nextBoolean() ? "0" : "ARCS", new Vec3(0, 1, 0), 0.5 + rnd.nextDouble(), 0.1, 0.1 + 5 * rnd.nextDouble());
            // inserts only of lower-numbered blocks: no cycles
            for (int k = 0; k < b && k < 2; k++) {
                bb.array("B" + rnd.nextInt(b), rnd.nextBoolean() ? "0" : "INNER", randomMap(rnd), 1 + rnd.nextInt(3),
                        1 + rnd.nextInt(2), new Vec3(3, 0, 0), new Vec3(0, 4, 1));
            }
        }
        d.model().insert("B" + (blocks - 1), "TOP", randomMap(rnd)).insert("B0", "SIDE", randomMap(rnd));
        ResolvedDrawing r = Resolver.resolve(d.build(), AnalysisSettings.defaults(SectionTable.empty()));
        Map<String, MomentsAccumulator> acc = new TreeMap<>();
        for (Segment s : r.worldSegments().orElseThrow()) {
            acc.computeIfAbsent(s.source().layer(), k -> new MomentsAccumulator())
                    .add(MomentIntegrator.lengthMoments(s, 1e-10));
        }
        // exact coincident copies are expanded once and counted: weigh them as often as they are placed
        for (ResolvedDrawing.Coincident c : r.coincident()) {
            acc.get(c.kept().source().layer())
                    .add(MomentIntegrator.lengthMoments(c.kept(), 1e-10).scaledDensity(c.copies() - 1));
        }
        assertEquals(acc.keySet(), r.layers().moments().keySet());
        for (Map.Entry<String, MomentsAccumulator> e : acc.entrySet()) {
            Moments want = e.getValue().result();
            Moments got = r.layers().moments().get(e.getKey());
            assertEquals(want.mass(), got.mass(), REL * want.mass(), e.getKey());
            double size = Math.sqrt(want.covariance().trace() / want.mass());
            assertTrue(want.centroid().closeTo(got.centroid(), REL * (size + want.centroid().norm())), e.getKey());
            assertEquals(0, want.covariance().minus(got.covariance()).maxAbs(),
                    REL * 10 * want.mass() * (size * size + want.centroid().normSq()), e.getKey());
        }
    }

    private static Affine randomMap(java.util.Random rnd) {
        Affine m = Affine.rotationZ(rnd.nextDouble() * 6.3);
        switch (rnd.nextInt(4)) {
            case 0 -> m = m.andThen(Affine.uniformScale(0.2 + 3 * rnd.nextDouble()));
            case 1 -> m = m.andThen(Affine.scale(-1, 1, 1));
            case 2 -> m = m.andThen(Affine.scale(0.5 + rnd.nextDouble(), 0.5 + rnd.nextDouble(), 1));
            default -> {
                // rigid: rotation only
            }
        }
        return m.andThen(Affine.translation(new Vec3(10 * rnd.nextDouble(), -5 * rnd.nextDouble(), rnd.nextDouble())));
    }

}
