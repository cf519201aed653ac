package org.linemass.engine;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.TreeMap;
import org.linemass.drawing.Drawing;
import org.linemass.engine.assemble.CoincidentFindings;
import org.linemass.engine.assemble.ImportFindings;
import org.linemass.engine.assemble.LayerAssembler;
import org.linemass.engine.assemble.MaterialPlan;
import org.linemass.engine.assemble.PieceAssembler;
import org.linemass.engine.assemble.RuleFindings;
import org.linemass.engine.error.AnalysisException;
import org.linemass.engine.field.FieldException;
import org.linemass.engine.field.FieldExpression;
import org.linemass.engine.field.FieldIntegralResult;
import org.linemass.engine.field.LayerValue;
import org.linemass.engine.field.LineIntegral;
import org.linemass.engine.field.PieceValue;
import org.linemass.engine.integrate.MomentIntegrator;
import org.linemass.engine.moments.Moments;
import org.linemass.engine.moments.MomentsAccumulator;
import org.linemass.engine.pieces.PieceAnalysis;
import org.linemass.engine.pieces.PieceAnalyzer;
import org.linemass.engine.piece.SectionLookup;
import org.linemass.engine.resolve.ResolvedDrawing;
import org.linemass.engine.resolve.Resolver;
import org.linemass.engine.result.DrawingInfo;
import org.linemass.engine.result.DrawingResult;
import org.linemass.engine.result.Finding;
import org.linemass.engine.result.FindingKind;
import org.linemass.engine.result.Severity;
import org.linemass.engine.section.Section;
import org.linemass.engine.settings.AnalysisSettings;
import org.linemass.geometry.Segment;
import org.linemass.tolerance.Tolerances;

/**
 * Runs the whole engine on one imported drawing: resolve to world metres (per-layer moments by
 * instancing, bounded expansion of world segments), the piece stage (joining, checks, grouping),
 * then assembly of layers (duplicates removed), pieces, marks, findings and totals. Deterministic
 * for a given drawing and settings. Stateless entry points; each call is independent.
 */
public final class Analyzer {

    /**
     * Told when the analysis moves from one stage to the next (a progress display); it may throw an
     * unchecked exception to stop the run there, which then leaves {@link #analyze} unchanged.
     */
    @FunctionalInterface
    public interface StageWatch {
        /** {@code stage} is a few words for a person ("joining and checking pieces"). */
        void entering(String stage);

        /** A watch that does nothing. */
        StageWatch NONE = stage -> { };
    }

    /** The piece stage: joining, checks and grouping of the expanded world segments (a test seam). */
    @FunctionalInterface
    public interface PieceStage {
        PieceAnalysis analyze(List<Segment> world, Tolerances tol, SectionLookup sections, boolean mirrorGrouping);
    }

    private Analyzer() {
    }

    /**
     * Analyses a drawing. The result carries each piece's exact segments by piece id
     * ({@link DrawingResult#pieceSegments}), so writers need nothing else from the engine.
     *
     * @throws AnalysisException for unknown sections, bad density expressions or tolerances, or a density
     *     that cannot be evaluated along a wire
     */
    public static DrawingResult analyze(Drawing drawing, AnalysisSettings settings) throws AnalysisException {
        return analyze(drawing, settings, StageWatch.NONE);
    }

    /**
     * As {@link #analyze(Drawing, AnalysisSettings)}, telling {@code watch} before the blocks are
     * expanded, before the piece stage and after it (the last two only when the drawing is small
     * enough for pieces, see {@link AnalysisSettings#maxExpandedSegments()}).
     */
    public static DrawingResult analyze(Drawing drawing, AnalysisSettings settings, StageWatch watch)
            throws AnalysisException {
        watch.entering("expanding blocks and adding up layers");
        return analyze(drawing, settings, (world, tol, lookup, mirror) -> {
            watch.entering("joining and checking pieces");
            PieceAnalysis pa = PieceAnalyzer.analyze(world, tol, lookup, mirror, settings.layerJoins(),
                    settings.listedNotes(), settings.threads());
            watch.entering("grouping marks and writing totals");
            return pa;
        });
    }

    /** As {@link #analyze(Drawing, AnalysisSettings)} with the given piece stage (tests put stand-ins here). */
    public static DrawingResult analyze(Drawing drawing, AnalysisSettings settings, PieceStage stage)
            throws AnalysisException {
        MaterialPlan plan = MaterialPlan.of(settings);
        ResolvedDrawing resolved = Resolver.resolve(drawing, settings);
        Tolerances tol = tolerances(drawing, settings);
        List<Finding> findings = new ArrayList<>(ImportFindings.of(drawing));
        java.util.Set<String> wireLayers = resolved.layers().moments().keySet();
        RuleFindings.requireSomethingLeft(drawing, settings, wireLayers, wireLayers.isEmpty()
                ? !Resolver.resolve(drawing, settings.unfiltered()).layers().moments().isEmpty() : true);
        findings.addAll(RuleFindings.of(drawing, settings, wireLayers));
        List<String> reasons = new ArrayList<>();
        long skipped = drawing.notes().stream().filter(n -> n.skippedGeometry()).count();
        if (skipped > 0) {
            reasons.add(skipped + (skipped == 1 ? " entity was skipped because it was" : " entities were skipped because they were")
                    + " malformed (see the skipped_entity findings)");
        }
        reasons.addAll(resolved.incompleteReasons());
        Map<String, Moments> removed = Map.of();
        PieceAssembler.Output pieces = PieceAssembler.Output.EMPTY;
        List<Finding> stageFindings = List.of();
        Map<Integer, List<Segment>> byId = Map.of();
        try {
            Optional<List<Segment>> world = resolved.worldSegments();
            if (world.isPresent()) {
                SectionLookup lookup = sectionLookup(plan, resolved);
                CoincidentFindings.Output coincident = CoincidentFindings.of(resolved.coincident(), lookup,
                        tol.integrationRelative());
                PieceAnalysis pa = stage.analyze(world.get(), tol, lookup, settings.mirrorGrouping());
                removed = plus(removedMoments(pa.removed(), tol), coincident.removedByLayer());
                pieces = PieceAssembler.assemble(pa, plan, tol, settings.bendStandard(), settings.threads());
                stageFindings = new ArrayList<>(coincident.findings());
                stageFindings.addAll(pa.findings());
                Map<Integer, List<Segment>> ordered = new TreeMap<>();
                for (int i = 0; i < pa.pieces().size(); i++) {
                    ordered.put(pieces.idByStageIndex().get(i), pa.pieces().get(i).segments());
                }
                byId = ordered;
            } else {
                findings.add(new Finding(FindingKind.LIMIT_REACHED, Severity.WARNING, null, null, null, List.of(), null,
                        String.format(Locale.ROOT, "the drawing expands to more than %d segments; lengths and masses "
                                + "are complete but pieces, groups and drawing checks were skipped",
                                settings.maxExpandedSegments())));
            }
            LayerAssembler.Output layers = LayerAssembler.assemble(drawing, resolved.layers().moments(), removed,
                    pieces.piecesPerLayer(), pieces.fieldMassPerLayer(), world.isPresent(), plan);
            findings.addAll(layers.findings());
            findings.addAll(stageFindings);
            // a limit_reached note (info) only shortened a list whose entries are still counted; a
            // warning means a search stopped early and something may be missing
            if (stageFindings.stream().anyMatch(f -> FindingKind.LIMIT_REACHED.equals(f.kind())
                    && f.severity() != Severity.INFO)) {
                reasons.add("the drawing checks hit a resource limit (see the limit_reached findings); material"
                        + " drawn twice may be counted twice and welds may be missing from the counts");
            }
            // most serious first, so finding 1 is the one to fix first; the sort is stable, so the
            // order within a severity (import notes, layers, then the piece stage's order) stays
            findings.sort(java.util.Comparator.comparing(Finding::severity).reversed());
            reasons.addAll(layers.incompleteReasons());
            return new DrawingResult(new DrawingInfo(drawing.file(), drawing.dxfVersion(), drawing.binary(),
                    drawing.unit(), drawing.unitSource()), resolved.entities(), layers.layers(), pieces.pieces(),
                    pieces.marks(), findings, layers.totals(), layers.sections(), reasons, byId);
        } catch (FieldException e) {
            throw new AnalysisException(drawing.file() + ": " + e.getMessage());
        }
    }

    /**
     * The line integral of {@code expression} (in x, y, z, s; metres) over every piece and layer of the
     * counted layers, with error bounds, using the standard piece stage.
     */
    public static FieldIntegralResult integrateField(Drawing drawing, AnalysisSettings settings, String expression)
            throws AnalysisException {
        return integrateField(drawing, settings, expression, PieceAnalyzer::analyze);
    }

    /** As {@link #integrateField(Drawing, AnalysisSettings, String)} with the given piece stage. */
    public static FieldIntegralResult integrateField(Drawing drawing, AnalysisSettings settings, String expression,
            PieceStage stage) throws AnalysisException {
        FieldExpression f = FieldExpression.parse(expression, "", false);
        // the pieces are needed for their ids and order only: leave density expressions out, so that one
        // that fails somewhere cannot stop an unrelated integral
        MaterialPlan plan = MaterialPlan.of(new AnalysisSettings(settings.joinM(), settings.gapLimitM(),
                settings.groupM(), settings.integrationRelative(), settings.mirrorGrouping(), settings.includeLayers(),
                settings.excludeLayers(), settings.includeHiddenLayers(), settings.sections(), settings.assignments(),
                Map.of(), settings.maxExpandedSegments()));
        ResolvedDrawing resolved = Resolver.resolve(drawing, settings);
        List<String> reasons = new ArrayList<>(resolved.incompleteReasons());
        if (resolved.worldSegments().isEmpty()) {
            return new FieldIntegralResult(drawing.file(), expression, List.of(), List.of(), 0, 0, reasons);
        }
        Tolerances tol = tolerances(drawing, settings);
        PieceAnalysis pa = stage.analyze(resolved.worldSegments().get(), tol, sectionLookup(plan, resolved),
                settings.mirrorGrouping());
        PieceAssembler.Output assembled;
        try {
            assembled = PieceAssembler.assemble(pa, plan, tol);
        } catch (FieldException e) {
            throw new AnalysisException(drawing.file() + ": " + e.getMessage());
        }
        List<PieceValue> values = new ArrayList<>();
        Map<String, double[]> perLayer = new TreeMap<>();
        try {
            for (int i = 0; i < pa.pieces().size(); i++) {
                var piece = pa.pieces().get(i);
                LineIntegral.Value v;
                try {
                    v = LineIntegral.along(piece.segments(), f, tol.integrationRelative());
                } catch (FieldException e) {
                    throw new FieldException("layer " + piece.layer() + ": " + e.getMessage());
                }
                int id = assembled.idByStageIndex().get(i);
                values.add(new PieceValue(id, piece.layer(), v.lengthM(), v.value(), v.errorBound()));
                double[] acc = perLayer.computeIfAbsent(piece.layer(), k -> new double[4]);
                acc[0] += 1;
                acc[1] += v.lengthM();
                acc[2] += v.value();
                acc[3] += v.errorBound();
            }
        } catch (FieldException e) {
            throw new AnalysisException(drawing.file() + ": " + e.getMessage());
        }
        values.sort((a, b) -> Integer.compare(a.pieceId(), b.pieceId()));
        List<LayerValue> layers = new ArrayList<>();
        double total = 0;
        double error = 0;
        for (Map.Entry<String, double[]> e : perLayer.entrySet()) {
            double[] a = e.getValue();
            layers.add(new LayerValue(e.getKey(), (int) a[0], a[1], a[2], a[3]));
            total += a[2];
            error += a[3];
        }
        return new FieldIntegralResult(drawing.file(), expression, values, layers, total, error, reasons);
    }

    /**
     * The analysis's one tolerance object ({@link AnalysisSettings#tolerances}); a user's tolerance that
     * conflicts with a default is bad input.
     */
    private static Tolerances tolerances(Drawing drawing, AnalysisSettings settings) throws AnalysisException {
        try {
            return settings.tolerances();
        } catch (IllegalArgumentException e) {
            // the conflict comes from the settings, not from one line of the drawing: name the file
            throw new AnalysisException(drawing.file() + ": bad tolerance: " + e.getMessage());
        }
    }

    private static SectionLookup sectionLookup(MaterialPlan plan, ResolvedDrawing resolved) throws AnalysisException {
        Map<String, Optional<Section>> byLayer = new HashMap<>();
        for (String layer : resolved.layers().moments().keySet()) {
            byLayer.put(layer, plan.forLayer(layer).section());
        }
        return layer -> byLayer.getOrDefault(layer, Optional.empty());
    }

    /** Per-layer sums of two maps of removed moments. */
    private static Map<String, Moments> plus(Map<String, Moments> a, Map<String, Moments> b) {
        if (b.isEmpty()) {
            return a;
        }
        Map<String, Moments> out = new TreeMap<>(a);
        b.forEach((k, v) -> out.merge(k, v, (x, y) -> new MomentsAccumulator().add(x).add(y).result()));
        return out;
    }

    private static Map<String, Moments> removedMoments(List<Segment> removed, Tolerances tol) {
        Map<String, MomentsAccumulator> acc = new TreeMap<>();
        for (Segment s : removed) {
            acc.computeIfAbsent(s.source().layer(), k -> new MomentsAccumulator())
                    .add(MomentIntegrator.lengthMoments(s, tol.integrationRelative()));
        }
        Map<String, Moments> out = new TreeMap<>();
        acc.forEach((k, v) -> out.put(k, v.result()));
        return out;
    }
}
