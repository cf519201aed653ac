package org.linemass.engine.assemble;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.TreeMap;
import org.linemass.engine.error.AnalysisException;
import org.linemass.engine.parallel.IndexedWork;
import org.linemass.engine.field.FieldDensity;
import org.linemass.engine.integrate.LinearDensity;
import org.linemass.engine.integrate.MomentIntegrator;
import org.linemass.engine.moments.Moments;
import org.linemass.engine.moments.MomentsAccumulator;
import org.linemass.engine.piece.Piece;
import org.linemass.engine.pieces.PieceAnalysis;
import org.linemass.engine.result.MarkResult;
import org.linemass.engine.result.PieceForm;
import org.linemass.engine.result.PieceResult;
import org.linemass.engine.result.SourceRef;
import org.linemass.engine.section.Section;
import org.linemass.geometry.Segment;
import org.linemass.geometry.Vec3;
import org.linemass.tolerance.Tolerances;
import org.linemass.engine.shape.BendStandard;

/**
 * Turns the piece stage's output into piece results and marks. Per piece: length moments (every
 * segment integrated in world metres and combined with compensated summation), mass moments from
 * the layer's density field ({@code s} measured from the piece's start along its segments) or from
 * its section's constant kg/m, start, end, bends and sources. Pieces are numbered 1.. after sorting
 * by layer, then length centroid (x, y, z), then length. Marks: the stage's groups (pieces it left
 * out of every group become single marks), ordered by layer, then length each (longest first), then
 * lowest piece id, and named {@code M01}, {@code M02}, ... in that order. Single use.
 */
public final class PieceAssembler {

    /**
     * Everything assembled from the pieces.
     *
     * @param pieces piece results, numbered 1.. in output order
     * @param marks the marks in output order
     * @param piecesPerLayer number of pieces per layer
     * @param fieldMassPerLayer mass moments of the layers with a density field, summed over their pieces
     * @param idByStageIndex the piece id given to the stage's piece at each index
     */
    public record Output(List<PieceResult> pieces, List<MarkResult> marks, Map<String, Integer> piecesPerLayer,
            Map<String, Moments> fieldMassPerLayer, List<Integer> idByStageIndex) {

        /** Nothing: no pieces were formed. */
        public static final Output EMPTY = new Output(List.of(), List.of(), Map.of(), Map.of(), List.of());

        public Output {
            pieces = List.copyOf(pieces);
            marks = List.copyOf(marks);
            piecesPerLayer = Map.copyOf(piecesPerLayer);
            fieldMassPerLayer = Map.copyOf(fieldMassPerLayer);
            idByStageIndex = List.copyOf(idByStageIndex);
        }
    }

    private record Computed(int original, Piece piece, Moments length, Moments mass, Optional<Section> section) {
    }

    private PieceAssembler() {
    }

    public static Output assemble(PieceAnalysis analysis, MaterialPlan plan, Tolerances tol)
            throws AnalysisException {
        return assemble(analysis, plan, tol, BendStandard.AUTO);
    }

    /** As {@link #assemble(PieceAnalysis, MaterialPlan, Tolerances)}, schedule radii checked by {@code standard}. */
    public static Output assemble(PieceAnalysis analysis, MaterialPlan plan, Tolerances tol, BendStandard standard)
            throws AnalysisException {
        return assemble(analysis, plan, tol, standard, 1);
    }

    /**
     * As {@link #assemble(PieceAnalysis, MaterialPlan, Tolerances, BendStandard)}, measuring pieces and
     * working out their forms on up to {@code threads} threads; the output is the same for any number.
     */
    public static Output assemble(PieceAnalysis analysis, MaterialPlan plan, Tolerances tol, BendStandard standard,
            int threads) throws AnalysisException {
        double relative = tol.integrationRelative();
        List<Piece> pieces = analysis.pieces();
        // every layer's material looked up first, in piece order (the plan fills a cache; a bad
        // expression is reported for the first piece that needs it), so the jobs below only read it
        for (Piece p : pieces) {
            plan.forLayer(p.layer());
        }
        List<Computed> computed = new ArrayList<>(IndexedWork.map(threads, pieces.size(), i -> {
            Piece p = pieces.get(i);
            LayerMaterial mat = plan.forLayer(p.layer());
            Moments lm = lengthMoments(p.segments(), relative);
            Moments mass = null;
            if (mat.field().isPresent()) {
                // an expression keeps its variables while it is evaluated: one copy per job
                mass = fieldMass(p.segments(), new FieldDensity(mat.field().get().copy()), relative);
            } else if (mat.section().isPresent()) {
                mass = lm.scaledDensity(mat.section().get().kgPerM());
            }
            if (mass != null && !Overflow.finite(mass)) {
                // beyond the range of numbers: the layer's overflow finding says so; no mass for the piece
                mass = null;
            }
            return new Computed(i, p, lm, mass, mat.section());
        }));
        computed.sort(Comparator.comparing((Computed c) -> c.piece().layer())
                .thenComparingDouble(c -> c.length().centroid().x())
                .thenComparingDouble(c -> c.length().centroid().y())
                .thenComparingDouble(c -> c.length().centroid().z())
                .thenComparingDouble(c -> c.length().mass()));
        int[] idOf = new int[computed.size()];
        for (int k = 0; k < computed.size(); k++) {
            idOf[computed.get(k).original()] = k + 1;
        }
        List<List<Integer>> groups = groupsById(analysis, idOf, computed.size());
        groups.sort(Comparator.comparing((List<Integer> g) -> computed.get(g.get(0) - 1).piece().layer())
                .thenComparingDouble(g -> -computed.get(g.get(0) - 1).length().mass())
                .thenComparingInt(g -> g.get(0)));
        String[] markOf = new String[computed.size() + 1];
        List<MarkResult> marks = new ArrayList<>();
        // zero-padded to the number of marks (at least two digits), so M007 sorts before M100
        String markFormat = "M%0" + Math.max(2, String.valueOf(groups.size()).length()) + "d";
        for (int gi = 0; gi < groups.size(); gi++) {
            String mark = String.format(java.util.Locale.ROOT, markFormat, gi + 1);
            List<Integer> ids = groups.get(gi);
            Computed first = computed.get(ids.get(0) - 1);
            double lengthTotal = 0;
            double massTotal = 0;
            boolean massKnown = first.mass() != null;
            for (int id : ids) {
                markOf[id] = mark;
                Computed c = computed.get(id - 1);
                lengthTotal += c.length().mass();
                massKnown &= c.mass() != null;
                massTotal += c.mass() == null ? 0 : c.mass().mass();
            }
            marks.add(new MarkResult(mark, ids.size(), first.piece().layer(),
                    first.section().map(Section::id).orElse(null),
                    first.section().map(Section::material).orElse(""), first.length().mass(),
                    massKnown ? first.mass().mass() : null, lengthTotal, massKnown ? massTotal : null,
                    first.piece().bends().size(), ids));
        }
        // the forms (bends, runs, shape) of each piece, side by side; the rest in piece order
        List<PieceForm> forms = IndexedWork.map(threads, computed.size(), k -> {
            Computed c = computed.get(k);
            if (!analysis.runs().isEmpty()) {
                return PieceForms.ofSection(c.piece().segments(), c.piece().closed(), analysis.runs().get(c.original()),
                        c.section().orElse(null), c.length().mass(), tol.angleRad(), tol.joinM(), standard);
            }
            return PieceForms.ofSection(c.piece().segments(), c.piece().closed(), c.section().orElse(null),
                    c.length().mass(), tol.angleRad(), tol.joinM(), standard);
        });
        List<PieceResult> results = new ArrayList<>();
        Map<String, Integer> perLayer = new TreeMap<>();
        Map<String, MomentsAccumulator> fieldMass = new TreeMap<>();
        for (int k = 0; k < computed.size(); k++) {
            Computed c = computed.get(k);
            Piece p = c.piece();
            perLayer.merge(p.layer(), 1, Integer::sum);
            if (c.mass() != null && plan.forLayer(p.layer()).field().isPresent()) {
                fieldMass.computeIfAbsent(p.layer(), x -> new MomentsAccumulator()).add(c.mass());
            }
            List<SourceRef> sources = p.segments().stream().map(s -> SourceRef.of(s.source())).toList();
            Vec3 start = p.segments().isEmpty() ? c.length().centroid() : p.segments().get(0).start();
            Vec3 end = p.segments().isEmpty() ? c.length().centroid() : p.segments().get(p.segments().size() - 1).end();
            results.add(new PieceResult(k + 1, p.layer(), c.section().map(Section::id).orElse(null),
                    c.length().mass(), c.mass() == null ? null : c.mass().mass(),
                    c.mass() == null ? c.length().centroid() : c.mass().centroid(), c.length().inertia(),
                    c.mass() == null ? null : c.mass().inertia(), start, end, p.closed(), p.segments().size(),
                    markOf[k + 1], p.bends(), sources, c.length().errorBound(), forms.get(k)));
        }
        Map<String, Moments> fm = new TreeMap<>();
        fieldMass.forEach((l, a) -> fm.put(l, a.result()));
        List<Integer> ids = new ArrayList<>(idOf.length);
        for (int id : idOf) {
            ids.add(id);
        }
        return new Output(results, marks, perLayer, fm, ids);
    }

    /**
     * Length moments of a piece: short pieces by the parallel-axis rule directly (a handful of
     * roundings), longer ones with compensated summation.
     */
    static Moments lengthMoments(List<Segment> segments, double relative) {
        if (segments.size() <= SHORT_PIECE) {
            Moments m = Moments.ZERO;
            for (Segment s : segments) {
                m = m.plus(MomentIntegrator.lengthMoments(s, relative));
            }
            return m;
        }
        MomentsAccumulator acc = new MomentsAccumulator();
        for (Segment s : segments) {
            acc.add(MomentIntegrator.lengthMoments(s, relative));
        }
        return acc.result();
    }

    /** Pieces with at most this many segments are summed without compensation. */
    static final int SHORT_PIECE = 8;

    /** Mass moments of a piece under a density field, s running from the piece's start. */
    static Moments fieldMass(List<Segment> segments, LinearDensity density, double relative) {
        MomentsAccumulator acc = new MomentsAccumulator();
        double s0 = 0;
        for (Segment s : segments) {
            acc.add(MomentIntegrator.integrate(s, density, s0, relative, MomentIntegrator.DEFAULT_MAX_EVALUATIONS)
                    .moments());
            if (density.usesArcLength()) {
                s0 += MomentIntegrator.lengthMoments(s, relative).mass();
            }
        }
        return acc.result();
    }

    private static List<List<Integer>> groupsById(PieceAnalysis analysis, int[] idOf, int n) {
        List<List<Integer>> out = new ArrayList<>();
        boolean[] seen = new boolean[n + 1];
        for (List<Integer> g : analysis.groups()) {
            List<Integer> ids = new ArrayList<>();
            for (int original : g) {
                int id = original >= 0 && original < idOf.length ? idOf[original] : 0;
                if (id > 0 && !seen[id]) {
                    seen[id] = true;
                    ids.add(id);
                }
            }
            if (!ids.isEmpty()) {
                ids.sort(null);
                out.add(ids);
            }
        }
        for (int id = 1; id <= n; id++) {
            if (!seen[id]) {
                out.add(new ArrayList<>(List.of(id)));
            }
        }
        return out;
    }
}
