package org.linemass.engine.analyzer;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;
import org.linemass.drawing.ImportNote;
import org.linemass.drawing.LengthUnit;
import org.linemass.drawing.UnitSource;
import org.linemass.engine.error.AnalysisException;
import org.linemass.engine.settings.AnalysisSettings;
import org.linemass.engine.Analyzer;
import org.linemass.engine.field.FieldIntegralResult;
import org.linemass.engine.result.DrawingResult;
import org.linemass.engine.result.Finding;
import org.linemass.engine.result.FindingKind;
import org.linemass.engine.result.LayerResult;
import org.linemass.engine.result.MarkResult;
import org.linemass.engine.section.AssignmentReader;
import org.linemass.engine.section.BuiltInSections;
import org.linemass.engine.testing.Drawings;
import org.linemass.engine.testing.SimpleStages;
import org.linemass.geometry.Affine;
import org.linemass.geometry.Vec3;
import org.junit.jupiter.api.Test;

class AnalyzerTest {

    /** Straights and arcs use closed forms: results agree with hand values to rounding. */
    private static final double EXACT = 1e-12;

    private static AnalysisSettings settings(String... assignments) {
        return AnalysisSettings.defaults(BuiltInSections.table()).withAssignments(
                java.util.Arrays.stream(assignments).map(AssignmentReader::parseArgument).toList());
    }

    private static AnalysisSettings withDensity(AnalysisSettings s, Map<String, String> density) {
        return new AnalysisSettings(s.joinM(), s.gapLimitM(), s.groupM(), s.integrationRelative(), s.mirrorGrouping(),
                s.includeLayers(), s.excludeLayers(), s.includeHiddenLayers(), s.sections(), s.assignments(), density,
                s.maxExpandedSegments());
    }

    private static LayerResult layer(DrawingResult r, String name) {
        return r.layers().stream().filter(l -> l.name().equals(name)).findFirst().orElseThrow();
    }

    @Test
    void enBar12_sixMetres_weighsTableMass() throws AnalysisException {
        // FACTS.md §1.1: 12 mm bar 0.888 kg/m, 6.000 m -> 5.328 kg; drawn in mm as two legs of 4 m and 2 m
        Drawings d = Drawings.create();
        d.model().line("BARS", Vec3.ZERO, new Vec3(4000, 0, 0)).line("BARS", new Vec3(4000, 0, 0),
                new Vec3(4000, 2000, 0));
        DrawingResult r = Analyzer.analyze(d.build(), settings("BARS=RB12"), SimpleStages.CHAIN);
        LayerResult bars = layer(r, "BARS");
        assertEquals(6.0, bars.lengthM(), EXACT);
        assertEquals(5.328, bars.massKg(), 5.328 * EXACT);
        assertEquals(5.328, r.totals().massKg(), 5.328 * EXACT);
        assertTrue(r.totals().massComplete());
        assertEquals(1, r.pieces().size());
        assertEquals("RB12", r.sections().get(0).section());
        // L-shape centroid, FACTS.md §5.2: legs a=4, b=2 -> (a^2/(2(a+b)), b^2/(2(a+b))) measured from the corner
        assertEquals(4 - 16.0 / 12, bars.centroidM().x(), EXACT);
        assertEquals(4.0 / 12, bars.centroidM().y(), EXACT);
    }

    @Test
    void astm4_sixMetres_weighsTableMass() throws AnalysisException {
        // FACTS.md §1.2: #4 0.668 lb/ft; a 6 m bar drawn in feet weighs 6/0.3048 x 0.668 x 0.45359237 kg
        Drawings d = Drawings.create().unit(LengthUnit.FOOT, UnitSource.HEADER);
        d.model().line("US", Vec3.ZERO, new Vec3(6 / 0.3048, 0, 0));
        DrawingResult r = Analyzer.analyze(d.build(), settings("US=A615-4"), SimpleStages.CHAIN);
        assertEquals(6 / 0.3048 * 0.668 * 0.45359237, layer(r, "US").massKg(), 1e-12);
    }

    @Test
    void rodInertia_isMassTimesLengthSquaredOver12() throws AnalysisException {
        // FACTS.md §5.2 (tiingu, astarmathsandphysics): thin rod about a perpendicular axis through its centre
        Drawings d = Drawings.create();
        d.model().line("ROD", new Vec3(0, 0, 0), new Vec3(0, 0, 1000));
        DrawingResult r = Analyzer.analyze(d.build(), settings("ROD=round:10:steel"), SimpleStages.CHAIN);
        LayerResult rod = layer(r, "ROD");
        double m = 7850 * Math.PI * 0.01 * 0.01 / 4;
        assertEquals(m, rod.massKg(), m * EXACT);
        assertEquals(m / 12, rod.inertiaKgM2().xx(), m * EXACT);
        assertEquals(m / 12, rod.inertiaKgM2().yy(), m * EXACT);
        assertEquals(0, rod.inertiaKgM2().zz(), m * EXACT);
        assertEquals(1.0 / 12, rod.lengthInertiaM3().xx(), EXACT);
    }

    @Test
    void layerWithoutSection_hasNullMassAndWarning() throws AnalysisException {
        Drawings d = Drawings.create();
        d.model().line("BARS", Vec3.ZERO, new Vec3(1000, 0, 0)).line("MYSTERY", Vec3.ZERO, new Vec3(0, 500, 0));
        DrawingResult r = Analyzer.analyze(d.build(), settings("BARS=RB10"), SimpleStages.CHAIN);
        LayerResult m = layer(r, "MYSTERY");
        assertEquals(0.5, m.lengthM(), EXACT);
        assertNull(m.massKg());
        assertNull(m.centroidM());
        assertNull(m.inertiaKgM2());
        assertFalse(r.totals().massComplete());
        // total mass covers the sectioned layer only: BS 4449 10 mm, 0.616 kg/m (FACTS.md §1.1)
        assertEquals(0.616, r.totals().massKg(), EXACT);
        List<Finding> warn = r.findings().stream().filter(f -> f.kind().equals(FindingKind.NO_SECTION)).toList();
        assertEquals(1, warn.size());
        assertEquals("MYSTERY", warn.get(0).layer());
        assertNull(r.pieces().stream().filter(p -> p.layer().equals("MYSTERY")).findFirst().orElseThrow().massKg());
    }

    @Test
    void duplicates_areRemovedFromLayerTotals() throws AnalysisException {
        Drawings d = Drawings.create();
        d.model().line("MESH", Vec3.ZERO, new Vec3(1000, 0, 0)).line("MESH", new Vec3(1000, 0, 0), Vec3.ZERO)
                .line("MESH", new Vec3(0, 300, 0), new Vec3(1000, 300, 0));
        DrawingResult r = Analyzer.analyze(d.build(), settings("MESH=SW4.0"), SimpleStages.CHAIN);
        LayerResult mesh = layer(r, "MESH");
        assertEquals(3.0, mesh.drawnLengthM(), EXACT);
        assertEquals(2.0, mesh.lengthM(), EXACT);
        // two parallel 1 m wires 0.3 m apart: centroid at y = 0.15, C_yy = 2 * 0.15^2 (parallel axis)
        assertEquals(0.15, mesh.lengthCentroidM().y(), EXACT);
        assertEquals(2 * 0.15 * 0.15 + 2.0 / 12, mesh.lengthInertiaM3().zz(), EXACT);
        assertEquals(2.0 * BuiltInSections.table().find("SW4.0").orElseThrow().kgPerM(), mesh.massKg(), EXACT);
        assertEquals(2.0, r.totals().lengthM(), EXACT);
        assertEquals(3.0, r.totals().drawnLengthM(), EXACT);
        assertTrue(r.findings().stream().anyMatch(f -> f.kind().equals(FindingKind.DUPLICATE)));
    }

    @Test
    void marks_groupIdenticalPiecesDeterministically() throws AnalysisException {
        Drawings d = Drawings.create();
        d.block("LINK").line("0", Vec3.ZERO, new Vec3(200, 0, 0)).line("0", new Vec3(200, 0, 0),
                new Vec3(200, 100, 0));
        d.model().array("LINK", "LINKS", Affine.IDENTITY, 4, 1, new Vec3(0, 500, 0), Vec3.ZERO)
                .line("LINKS", new Vec3(0, -1000, 0), new Vec3(900, -1000, 0));
        DrawingResult r = Analyzer.analyze(d.build(), settings("LINKS=RB8"), SimpleStages.CHAIN);
        assertEquals(5, r.pieces().size());
        assertEquals(2, r.groups().size());
        MarkResult first = r.groups().get(0);
        // longest first within a layer: the 0.9 m bar, then four 0.3 m links
        assertEquals("M01", first.mark());
        assertEquals(0.9, first.lengthEachM(), EXACT);
        MarkResult links = r.groups().get(1);
        assertEquals(4, links.quantity());
        assertEquals(1.2, links.lengthTotalM(), EXACT);
        // BS 4449 8 mm: 0.395 kg/m (FACTS.md §1.1)
        assertEquals(0.3 * 0.395, links.massEachKg(), EXACT);
        // pieces numbered by layer then centroid x, y, z: the four links (centroid x = 0.1333 m) come before
        // the bar (centroid x = 0.45 m), the links in order of y
        assertEquals(1, r.pieces().get(0).id());
        assertEquals("M02", r.pieces().get(0).mark());
        assertEquals("M01", r.pieces().get(4).mark());
        assertTrue(r.pieces().get(1).centroidM().y() < r.pieces().get(2).centroidM().y());
        // the result carries the stage's piece segments behind every id
        assertEquals(r.pieces().size(), r.pieceSegments().size());
        for (var p : r.pieces()) {
            var segs = r.pieceSegments(p.id());
            assertEquals(p.segments(), segs.size());
            assertEquals(p.startM(), segs.get(0).start());
            assertEquals(p.endM(), segs.get(segs.size() - 1).end());
        }
        assertEquals(List.of(1, 2, 3, 4), links.pieceIds());
    }

    @Test
    void densityField_taperAlongPiece() throws AnalysisException {
        // lambda = 1 + s kg/m along a 2 m wire: mass = 2 + 2 = 4 kg, centroid at s = (2 + 8/3)/4 = 7/6 m
        // (closed form of the integrals of 1 + s and s (1 + s) over [0, 2])
        Drawings d = Drawings.create();
        d.model().line("TAPER", new Vec3(1000, 0, 0), new Vec3(2000, 0, 0)).line("TAPER", new Vec3(2000, 0, 0),
                new Vec3(3000, 0, 0));
        DrawingResult r = Analyzer.analyze(d.build(), withDensity(settings(), Map.of("TAP*", "1 + s")),
                SimpleStages.CHAIN);
        LayerResult t = layer(r, "TAPER");
        assertEquals(4.0, t.massKg(), 1e-10 * 4);
        assertEquals(1 + 7.0 / 6, t.centroidM().x(), 1e-10);
        assertTrue(r.findings().stream().noneMatch(f -> f.kind().equals(FindingKind.NO_SECTION)));
    }

    @Test
    void densityField_badValuesNameLayerAndPoint() {
        Drawings d = Drawings.create();
        d.model().line("COAT", Vec3.ZERO, new Vec3(2000, 0, 0));
        AnalysisException neg = assertThrows(AnalysisException.class, () -> Analyzer.analyze(d.build(),
                withDensity(settings(), Map.of("COAT", "1 - x")), SimpleStages.CHAIN));
        assertTrue(neg.getMessage().contains("layer COAT") && neg.getMessage().contains("negative")
                && neg.getMessage().contains("x="), neg.getMessage());
        AnalysisException div = assertThrows(AnalysisException.class, () -> Analyzer.analyze(d.build(),
                withDensity(settings(), Map.of("COAT", "1 / (x - x)")), SimpleStages.CHAIN));
        assertTrue(div.getMessage().contains("layer COAT"), div.getMessage());
        AnalysisException parse = assertThrows(AnalysisException.class, () -> Analyzer.analyze(d.build(),
                withDensity(settings(), Map.of("COAT", "2 * q")), SimpleStages.CHAIN));
        assertTrue(parse.getMessage().contains("COAT"), parse.getMessage());
    }

    @Test
    void integrateField_heightTimesLength() throws AnalysisException {
        // closed form: integral of z ds along a vertical 3 m wire from z = 0 is 3^2/2 = 4.5
        Drawings d = Drawings.create();
        d.model().line("CABLE", Vec3.ZERO, new Vec3(0, 0, 3000)).line("DUCT", Vec3.ZERO, new Vec3(1000, 0, 0));
        FieldIntegralResult r = Analyzer.integrateField(d.build(), settings(), "z", SimpleStages.CHAIN);
        assertEquals(2, r.layers().size());
        assertEquals(4.5, r.layers().get(0).value(), 4.5 * 1e-12);
        assertEquals(0, r.layers().get(1).value(), 1e-15);
        assertEquals(4.5, r.total(), 1e-12);
        assertTrue(r.totalErrorBound() < 1e-9);
        FieldIntegralResult s = Analyzer.integrateField(d.build(), settings(), "s^2", SimpleStages.CHAIN);
        // integral of s^2 over [0, 3] is 9 and over [0, 1] is 1/3
        assertEquals(9 + 1.0 / 3, s.total(), 1e-10);
        assertEquals(List.of(1, 2), s.pieces().stream().map(p -> p.pieceId()).sorted().toList());
        AnalysisException e = assertThrows(AnalysisException.class,
                () -> Analyzer.integrateField(d.build(), settings(), "1 / (z - 1.5)", SimpleStages.CHAIN));
        assertTrue(e.getMessage().contains("layer CABLE") && e.getMessage().contains("z=1.5"), e.getMessage());
    }

    @Test
    void importNotesAndAssumedUnits_becomeFindings() throws AnalysisException {
        Drawings d = Drawings.create().unit(LengthUnit.MILLIMETRE, UnitSource.ASSUMED)
                .note(new ImportNote("error", "bad_spline", "test.dxf", 321, "SPLINE", "2F", "W", "knots decrease"))
                .note(new ImportNote("info", "ignored_entity", "test.dxf", 400, "TEXT", "30", "W", "text has no wire"))
                .note(new ImportNote("warning", "knots_assumed", "test.dxf", 500, "SPLINE", "31", "W",
                        "no knots; clamped uniform knots assumed"));
        d.model().line("W", Vec3.ZERO, new Vec3(10, 0, 0));
        DrawingResult r = Analyzer.analyze(d.build(), settings(), SimpleStages.CHAIN);
        List<String> kinds = r.findings().stream().map(Finding::kind).toList();
        assertTrue(kinds.contains(FindingKind.SKIPPED_ENTITY));
        assertTrue(kinds.contains(FindingKind.IGNORED_ENTITY));
        assertTrue(kinds.contains(FindingKind.UNITS_ASSUMED));
        Finding knots = r.findings().stream().filter(f -> f.kind().equals(FindingKind.KNOTS_ASSUMED)).findFirst()
                .orElseThrow();
        assertEquals(500, knots.entities().get(0).line());
        assertEquals("31", knots.entities().get(0).handle());
        assertFalse(r.complete());
        assertTrue(r.incompleteReasons().get(0).contains("1 entity was skipped"));
        Finding skipped = r.findings().stream().filter(f -> f.kind().equals(FindingKind.SKIPPED_ENTITY)).findFirst()
                .orElseThrow();
        assertEquals(321, skipped.entities().get(0).line());
    }

    @Test
    void limitReached_keepsLengthsButSkipsPieces() throws AnalysisException {
        Drawings d = Drawings.create();
        d.block("STICK").line("0", Vec3.ZERO, new Vec3(100, 0, 0));
        d.model().array("STICK", "GRID", Affine.IDENTITY, 1000, 1000, new Vec3(0, 10, 0), new Vec3(0, 0, 10));
        AnalysisSettings s = settings("GRID=SW1.0");
        AnalysisSettings small = new AnalysisSettings(s.joinM(), s.gapLimitM(), s.groupM(), s.integrationRelative(),
                false, List.of(), List.of(), false, s.sections(), s.assignments(), Map.of(), 1000);
        DrawingResult r = Analyzer.analyze(d.build(), small, SimpleStages.CHAIN);
        // 10^6 sticks of 0.1 m
        assertEquals(100_000.0, layer(r, "GRID").lengthM(), 100_000 * EXACT);
        assertTrue(r.pieces().isEmpty());
        assertTrue(r.findings().stream().anyMatch(f -> f.kind().equals(FindingKind.LIMIT_REACHED)));
        assertFalse(r.complete());
        assertEquals(1_000_000L, r.entities().curves().get("LINE"));
        // 1 mm steel wire: 7850 pi 0.001^2 / 4 kg/m (FACTS.md §3.2: 6.165 g/m)
        assertEquals(100_000 * 0.006165, layer(r, "GRID").massKg(), 100_000 * 0.0000005);
    }

    @Test
    void emptyAndDegenerateDrawings_giveEmptyTotals() throws AnalysisException {
        DrawingResult empty = Analyzer.analyze(Drawings.create().build(), settings(), SimpleStages.CHAIN);
        assertTrue(empty.layers().isEmpty());
        assertEquals(0, empty.totals().lengthM(), 0);
        assertNull(empty.totals().massKg());
        assertTrue(empty.totals().massComplete());
        assertTrue(empty.complete());
        // a zero-length line: the layer is listed with length 0, and a layer with no length needs no section
        Drawings d = Drawings.create();
        d.model().line("DOT", new Vec3(5, 5, 5), new Vec3(5, 5, 5));
        DrawingResult dot = Analyzer.analyze(d.build(), settings(), SimpleStages.EACH_SEGMENT);
        assertEquals(0, layer(dot, "DOT").lengthM(), 0);
        assertTrue(dot.findings().stream().noneMatch(f -> f.kind().equals(FindingKind.NO_SECTION)));
        assertTrue(dot.totals().massComplete());
    }

    @Test
    void badTolerances_areRefusedWhenTheSettingsAreBuilt() {
        AnalysisSettings s = settings();
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> new AnalysisSettings(java.util.Optional.of(0.01), java.util.Optional.of(0.001),
                        s.groupM(), s.integrationRelative(), false, List.of(), List.of(), false, s.sections(),
                        List.of(), Map.of(), s.maxExpandedSegments()));
        // in millimetres, the unit these tolerances are typed in, not "0.001 m" or "1.0E-3 m"
        assertTrue(e.getMessage().contains("gap limit 1 mm is below the join tolerance 10 mm"), e.getMessage());
        assertThrows(IllegalArgumentException.class, () -> new AnalysisSettings(s.joinM(), s.gapLimitM(),
                s.groupM(), -1, false, List.of(), List.of(), false, s.sections(), List.of(), Map.of(),
                s.maxExpandedSegments()));
    }

    @Test
    void gapLimitBelowTheDefaultJoin_isAnAnalysisException_whateverTheExtent() throws AnalysisException {
        // a drawing 1e5 km across: tolerances no longer grow with the extent, so the user's 1 mm gap
        // limit stands beside the default 0.01 mm join tolerance (Tolerances.defaults)
        Drawings d = Drawings.create();
        d.model().line("W", Vec3.ZERO, new Vec3(1e11, 0, 0));
        AnalysisSettings s = settings();
        AnalysisSettings oneMm = new AnalysisSettings(s.joinM(), java.util.Optional.of(0.001), s.groupM(),
                s.integrationRelative(), false, List.of(), List.of(), false, s.sections(), List.of(), Map.of(),
                s.maxExpandedSegments());
        assertEquals(1, Analyzer.analyze(d.build(), oneMm, SimpleStages.CHAIN).pieces().size());
        // a gap limit of 0.001 mm is below the default join tolerance of 0.01 mm: bad input naming the file
        AnalysisSettings tiny = new AnalysisSettings(s.joinM(), java.util.Optional.of(1e-6), s.groupM(),
                s.integrationRelative(), false, List.of(), List.of(), false, s.sections(), List.of(), Map.of(),
                s.maxExpandedSegments());
        AnalysisException e = assertThrows(AnalysisException.class,
                () -> Analyzer.analyze(d.build(), tiny, SimpleStages.CHAIN));
        assertTrue(e.getMessage().contains(": bad tolerance: gap limit 0.001 mm is below the join tolerance 0.01 mm"),
                e.getMessage());
        assertTrue(e.getMessage().startsWith(d.build().file() + ": "), "names the file: " + e.getMessage());
    }

    @Test
    void hiddenLayers_countOnlyWhenAsked() throws AnalysisException {
        Drawings d = Drawings.create().layer("SPARE", false, false);
        d.model().line("SPARE", Vec3.ZERO, new Vec3(1000, 0, 0)).line("MAIN", Vec3.ZERO, new Vec3(0, 1000, 0));
        DrawingResult normal = Analyzer.analyze(d.build(), settings(), SimpleStages.CHAIN);
        assertEquals(List.of("MAIN"), normal.layers().stream().map(LayerResult::name).toList());
        AnalysisSettings s = settings();
        AnalysisSettings all = new AnalysisSettings(s.joinM(), s.gapLimitM(), s.groupM(), s.integrationRelative(),
                false, List.of(), List.of(), true, s.sections(), List.of(), Map.of(), s.maxExpandedSegments());
        DrawingResult withHidden = Analyzer.analyze(d.build(), all, SimpleStages.CHAIN);
        assertEquals(2, withHidden.layers().size());
        assertFalse(layer(withHidden, "SPARE").visible());
        assertTrue(layer(withHidden, "MAIN").visible());
        assertEquals(2.0, withHidden.totals().lengthM(), EXACT);
    }

    @Test
    void unknownSection_isAnAnalysisException() {
        Drawings d = Drawings.create();
        d.model().line("W", Vec3.ZERO, new Vec3(10, 0, 0));
        AnalysisException e = assertThrows(AnalysisException.class,
                () -> Analyzer.analyze(d.build(), settings("W=NO-SUCH"), SimpleStages.CHAIN));
        assertTrue(e.getMessage().contains("NO-SUCH"));
    }
}
