package org.linemass.engine.resolve;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.linemass.drawing.Drawing;
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
import org.junit.jupiter.api.Test;

class ResolverTest {

    /** Instancing and expansion sum the same closed forms in different orders: rounding only. */
    private static final double REL = 1e-12;

    private static AnalysisSettings settings() {
        return AnalysisSettings.defaults(SectionTable.empty());
    }

    private static Map<String, Moments> direct(List<Segment> world) {
        Map<String, MomentsAccumulator> acc = new java.util.TreeMap<>();
        for (Segment s : world) {
            acc.computeIfAbsent(s.source().layer(), k -> new MomentsAccumulator())
                    .add(MomentIntegrator.lengthMoments(s, 1e-12));
        }
        Map<String, Moments> out = new java.util.TreeMap<>();
        acc.forEach((k, v) -> out.put(k, v.result()));
        return out;
    }

    private static void assertSame(Moments a, Moments b, double rel) {
        assertEquals(a.mass(), b.mass(), rel * a.mass());
        double size = Math.sqrt(a.covariance().trace() / a.mass()) + a.centroid().norm();
        assertTrue(a.centroid().closeTo(b.centroid(), rel * size), a.centroid() + " vs " + b.centroid());
        assertEquals(0, a.covariance().minus(b.covariance()).maxAbs(), rel * a.covariance().maxAbs() * 10);
    }

    /** A hook block (a bend and two legs) with some content on layer 0 and some on its own layer. */
    private static Drawings hookDrawing() {
        Drawings d = Drawings.create();
        d.block("HOOK").line("0", new Vec3(0, 0, 0), new Vec3(100, 0, 0))
                .arc("0", new Vec3(100, 20, 0), 20, -Math.PI / 2, Math.PI / 2)
                .line("TIES", new Vec3(100, 40, 0), new Vec3(60, 40, 5));
        d.block("PAIR").insert("HOOK", "0", Affine.IDENTITY)
                .insert("HOOK", "0", Affine.rotationZ(0.7).andThen(Affine.translation(new Vec3(0, 300, 0))));
        d.model().line("FRAME", new Vec3(0, 0, 0), new Vec3(2000, 0, 0))
                .insert("PAIR", "BARS", Affine.translation(new Vec3(10, 20, 30)))
                .insert("HOOK", "BARS", Affine.scale(-1, 1, 1).andThen(Affine.rotationZ(1.1)))
                .insert("HOOK", "LINKS", Affine.uniformScale(1.25).andThen(Affine.translation(new Vec3(5, 5, 5))))
                .array("HOOK", "LINKS", Affine.rotationZ(0.26), 3, 4, new Vec3(150, 0, 0), new Vec3(0, 80, 0))
                .insert("HOOK", "BARS", Affine.scale(1, 1.2, 0.8));
        return d;
    }

    @Test
    void instancing_equalsExplicitExpansion() {
        Drawing drawing = hookDrawing().build();
        ResolvedDrawing r = Resolver.resolve(drawing, settings());
        List<Segment> world = r.worldSegments().orElseThrow();
        Map<String, Moments> expected = direct(world);
        assertEquals(expected.keySet(), r.layers().moments().keySet());
        // the non-uniform insert has an elliptical arc: adaptive quadrature at 1e-10 on both sides
        expected.forEach((layer, m) -> assertSame(m, r.layers().moments().get(layer), 1e-9));
        // counts: 1 frame + 2*3 + 3 + 3 + 12*3 + 3 segments
        assertEquals(1 + 6 + 3 + 3 + 36 + 3, world.size());
        assertEquals(world.size(), r.expandedSegments());
    }

    @Test
    void layerZero_inheritsInsertLayerRecursively() {
        ResolvedDrawing r = Resolver.resolve(hookDrawing().build(), settings());
        // PAIR placed on BARS: its HOOKs are inserted on layer 0, so their layer-0 content lands on BARS
        assertFalse(r.layers().moments().containsKey("0"));
        // BARS: PAIR (2 hooks) + mirrored hook + non-uniform hook = 4 hooks x 2 layer-0 segments
        assertEquals(8L, r.layers().segments().get("BARS"));
        // LINKS: the scaled hook plus the 3 x 4 array = 13 hooks x 2 layer-0 segments
        assertEquals(26L, r.layers().segments().get("LINKS"));
        // TIES keeps its own layer in every copy: 2 + 1 + 1 + 12 + 1 = 17
        assertEquals(17L, r.layers().segments().get("TIES"));
        List<Segment> world = r.worldSegments().orElseThrow();
        Segment inPair = world.stream().filter(s -> s.source().blockPath().size() == 2).findFirst().orElseThrow();
        assertEquals(List.of("PAIR", "HOOK"), inPair.source().blockPath());
    }

    @Test
    void units_convertToMetres() {
        // 2000 drawing units of FRAME: 2 m in mm, 50.8 m in inches (FACTS.md §0.1: inch = 25.4 mm exactly)
        Drawings d = Drawings.create();
        d.model().line("FRAME", Vec3.ZERO, new Vec3(2000, 0, 0));
        assertEquals(2.0, Resolver.resolve(d.build(), settings()).layers().moments().get("FRAME").mass(), 1e-15);
        d.unit(LengthUnit.INCH, UnitSource.HEADER);
        assertEquals(50.8, Resolver.resolve(d.build(), settings()).layers().moments().get("FRAME").mass(), 1e-13);
    }

    @Test
    void nonUniformInsert_turnsCircleIntoEllipse() {
        // a unit circle inserted with scale (2, 1, 1) is the ellipse a = 2, b = 1: perimeter 9.68844822055
        // (FACTS.md §5.3, complete elliptic integral); drawn in metres, the adaptive rule gives 1e-10 relative
        Drawings d = Drawings.create().unit(LengthUnit.METRE, UnitSource.HEADER);
        d.block("RING").arc("0", Vec3.ZERO, 1, 0, 2 * Math.PI);
        d.model().insert("RING", "OVAL", Affine.scale(2, 1, 1)).insert("RING", "ROUND", Affine.uniformScale(2));
        ResolvedDrawing r = Resolver.resolve(d.build(), settings());
        assertEquals(9.6884482205476761984, r.layers().moments().get("OVAL").mass(), 1e-10 * 9.69);
        assertEquals(4 * Math.PI, r.layers().moments().get("ROUND").mass(), 1e-14 * 4 * Math.PI);
        assertTrue(r.worldSegments().orElseThrow().stream().anyMatch(s -> s.kind().equals("ellipse_arc")));
    }

    @Test
    void blockBomb_costsDistinctBlocks() {
        // 12 levels of 10 copies each: 10^12 copies of one line, never expanded
        Drawings d = Drawings.create();
        d.block("B0").line("0", Vec3.ZERO, new Vec3(1, 0, 0));
        for (int level = 1; level <= 12; level++) {
            Drawings.BlockBuilder b = d.block("B" + level);
            for (int k = 0; k < 10; k++) {
                b.insert("B" + (level - 1), "0", Affine.translation(new Vec3(0, k * Math.pow(10, level), 0)));
            }
        }
        d.model().insert("B12", "WIRE", Affine.IDENTITY);
        long start = System.nanoTime();
        ResolvedDrawing r = Resolver.resolve(d.build(), settings());
        long ms = (System.nanoTime() - start) / 1_000_000;
        assertTrue(ms < 5_000, "took " + ms + " ms");
        assertEquals(1_000_000_000_000L, r.expandedSegments());
        assertTrue(r.limitReached());
        // 10^12 lines of 1 mm: 10^9 m
        assertEquals(1e9, r.layers().moments().get("WIRE").mass(), 1e9 * REL);
        assertEquals(1_000_000_000_000L, r.entities().curves().get("LINE"));
        assertTrue(r.incompleteReasons().get(0).contains("limit"));
    }

    @Test
    void deepNesting_noStackOverflow() {
        int depth = 20_000;
        Drawings d = Drawings.create();
        d.block("N0").line("0", Vec3.ZERO, new Vec3(1, 0, 0));
        for (int i = 1; i <= depth; i++) {
            d.block("N" + i).insert("N" + (i - 1), "0", Affine.translation(new Vec3(0, 0, 1)));
        }
        d.model().insert("N" + depth, "DEEP", Affine.IDENTITY);
        ResolvedDrawing r = Resolver.resolve(d.build(), settings());
        Moments m = r.layers().moments().get("DEEP");
        assertEquals(0.001, m.mass(), 1e-18);
        // each level lifts by 1 mm: z = depth mm
        assertEquals(depth * 0.001, m.centroid().z(), 1e-9);
        Segment s = r.worldSegments().orElseThrow().get(0);
        assertEquals(depth + 1, s.source().blockPath().size());
    }

    @Test
    void cycle_isSkippedAndReported() {
        Drawings d = Drawings.create();
        d.block("A").line("0", Vec3.ZERO, new Vec3(1, 0, 0)).insert("B", "0", Affine.IDENTITY);
        d.block("B").insert("A", "0", Affine.translation(new Vec3(5, 0, 0)));
        d.model().insert("A", "W", Affine.IDENTITY);
        ResolvedDrawing r = Resolver.resolve(d.build(), settings());
        assertEquals(1L, r.layers().segments().get("W"));
        assertTrue(r.incompleteReasons().stream().anyMatch(s -> s.contains("inserts itself")));
    }

    @Test
    void undefinedBlock_isLeftOutAndReported() {
        Drawings d = Drawings.create();
        d.model().line("W", Vec3.ZERO, new Vec3(1000, 0, 0)).insert("GHOST", "W", Affine.IDENTITY);
        ResolvedDrawing r = Resolver.resolve(d.build(), settings());
        assertEquals(1.0, r.layers().moments().get("W").mass(), 1e-15);
        assertTrue(r.incompleteReasons().stream().anyMatch(s -> s.contains("undefined block GHOST")));
        assertEquals(1, r.worldSegments().orElseThrow().size());
    }

    @Test
    void filters_includeExcludeHidden() {
        Drawings d = Drawings.create().layer("OFF", false, false).layer("FROZEN", true, true);
        d.block("K").line("0", Vec3.ZERO, new Vec3(10, 0, 0)).line("KEEP", Vec3.ZERO, new Vec3(0, 10, 0));
        d.model().line("A1", Vec3.ZERO, new Vec3(1, 0, 0)).line("A2", Vec3.ZERO, new Vec3(1, 0, 0))
                .line("B1", Vec3.ZERO, new Vec3(1, 0, 0)).line("OFF", Vec3.ZERO, new Vec3(1, 0, 0))
                .insert("K", "FROZEN", Affine.IDENTITY).insert("K", "OFF", Affine.IDENTITY);
        Drawing drawing = d.build();
        ResolvedDrawing all = Resolver.resolve(drawing, settings());
        // OFF hidden; insert on FROZEN hides everything in it; insert on OFF hides only its layer-0 content
        assertEquals(List.of("A1", "A2", "B1", "KEEP"), List.copyOf(all.layers().moments().keySet()));
        AnalysisSettings s = settings();
        AnalysisSettings filtered = new AnalysisSettings(s.joinM(), s.gapLimitM(), s.groupM(),
                s.integrationRelative(), false, List.of("a*", "OFF", "frozen"), List.of("A2"), true,
                s.sections(), List.of(), Map.of(), s.maxExpandedSegments());
        ResolvedDrawing r = Resolver.resolve(drawing, filtered);
        assertEquals(List.of("A1", "FROZEN", "OFF"), List.copyOf(r.layers().moments().keySet()));
    }

    @Test
    void nonUniformNest_oneIntegrationPerDistinctMap() {
        // six levels each inserting the next 100 times with scale (1.5, 0.8): 10^12 copies of a 10 mm line
        // along x, each stretched by 1.5^6 (closed form 10 mm x 1.5^6 x 10^12 = 1.1390625e11 m)
        Drawings d = Drawings.create();
        d.block("N6").line("0", Vec3.ZERO, new Vec3(10, 0, 0));
        for (int level = 5; level >= 0; level--) {
            Drawings.BlockBuilder b = level == 0 ? d.model() : d.block("N" + level);
            for (int k = 0; k < 100; k++) {
                b.insert("N" + (level + 1), level == 0 ? "WIRE" : "0",
                        Affine.scale(1.5, 0.8, 1).andThen(Affine.translation(new Vec3(20 * k, 7 * k, 0))));
            }
        }
        long start = System.nanoTime();
        ResolvedDrawing r = Resolver.resolve(d.build(), settings());
        long ms = (System.nanoTime() - start) / 1_000_000;
        // the memo makes this 6 x 100 steps; walking every copy took over 120 s. 5 s covers a loaded machine.
        assertTrue(ms < 5_000, "took " + ms + " ms");
        Moments m = r.layers().moments().get("WIRE");
        assertEquals(1.1390625e11, m.mass(), 1.1390625e11 * REL);
        assertEquals(1_000_000_000_000L, r.expandedSegments());
        assertTrue(r.incompleteReasons().stream().noneMatch(s -> s.contains("left out")), r.incompleteReasons()
                .toString());
    }

    @Test
    void nonUniformNest_sameAsExplicitExpansion() {
        // small enough to expand: 3 levels of 4 rotated, non-uniformly scaled copies of a line and an arc
        Drawings d = Drawings.create();
        d.block("L3").line("0", Vec3.ZERO, new Vec3(10, 0, 0)).arc("0", new Vec3(5, 5, 0), 3, 0, 2);
        for (int level = 2; level >= 0; level--) {
            Drawings.BlockBuilder b = level == 0 ? d.model() : d.block("L" + level);
            for (int k = 0; k < 4; k++) {
                b.insert("L" + (level + 1), level == 0 ? "WIRE" : "0", Affine.rotationZ(0.3 * (k % 2))
                        .andThen(Affine.scale(1.5, 0.8, 1)).andThen(Affine.translation(new Vec3(30 * k, 11 * k, 0))));
            }
        }
        ResolvedDrawing r = Resolver.resolve(d.build(), settings());
        // the expansion integrates every world segment on its own: the instanced totals must agree
        assertSame(direct(r.worldSegments().orElseThrow()).get("WIRE"), r.layers().moments().get("WIRE"), 1e-9);
    }

    @Test
    void nonUniformNest_distinctMapsBeyondBudget_leftOutAndSaid() {
        // every copy rotated differently: 30^3 distinct maps, more than a budget of 1000
        Drawings d = Drawings.create();
        d.block("R3").line("0", Vec3.ZERO, new Vec3(10, 0, 0));
        for (int level = 2; level >= 0; level--) {
            Drawings.BlockBuilder b = level == 0 ? d.model() : d.block("R" + level);
            for (int k = 0; k < 30; k++) {
                b.insert("R" + (level + 1), level == 0 ? "WIRE" : "0",
                        Affine.rotationZ(0.01 * k).andThen(Affine.scale(1.5, 0.8, 1)));
            }
        }
        AnalysisSettings small = new AnalysisSettings(Optional.empty(), Optional.empty(), Optional.empty(),
                1e-10, false, List.of(), List.of(), false, SectionTable.empty(), List.of(), Map.of(), 1000);
        long start = System.nanoTime();
        ResolvedDrawing r = Resolver.resolve(d.build(), small);
        long ms = (System.nanoTime() - start) / 1_000_000;
        assertTrue(ms < 5_000, "took " + ms + " ms");
        assertTrue(r.incompleteReasons().stream().anyMatch(s -> s.contains("too many distinct non-uniformly scaled"
                + " placements (more than 1000)")), r.incompleteReasons().toString());
    }
}
