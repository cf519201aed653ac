package org.linemass.engine.pieces;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;
import org.linemass.engine.piece.Piece;
import org.linemass.engine.piece.SectionLookup;
import org.linemass.engine.pieces.checks.BendCheck;
import org.linemass.engine.pieces.checks.BendFinder;
import org.linemass.engine.pieces.checks.ContactCheck;
import org.linemass.engine.pieces.checks.Findings;
import org.linemass.engine.pieces.checks.GapCheck;
import org.linemass.engine.pieces.checks.RemoteCheck;
import org.linemass.engine.pieces.checks.SectionCache;
import org.linemass.engine.pieces.checks.SizeCheck;
import org.linemass.engine.pieces.checks.TeeGapCheck;
import org.linemass.engine.pieces.dedup.DedupResult;
import org.linemass.engine.pieces.dedup.Deduplicator;
import org.linemass.engine.pieces.index.CandidatePairs;
import org.linemass.engine.result.Severity;
import org.linemass.engine.result.FindingKind;
import org.linemass.engine.pieces.geom.Curves;
import org.linemass.engine.pieces.index.DerivedIndex;
import org.linemass.engine.pieces.index.SegmentIndex;
import org.linemass.engine.pieces.join.Chain;
import org.linemass.engine.pieces.join.AcrossLayers;
import org.linemass.engine.pieces.join.JoinClasses;
import org.linemass.engine.pieces.join.JoinResult;
import org.linemass.engine.pieces.join.Joiner;
import org.linemass.engine.pieces.marks.Grouper;
import org.linemass.engine.bender.FormRun;
import org.linemass.engine.bender.RunSplitter;
import org.linemass.engine.parallel.IndexedWork;
import org.linemass.engine.result.Bend;
import org.linemass.engine.result.Finding;
import org.linemass.engine.section.LayerJoin;
import org.linemass.engine.section.Section;
import org.linemass.geometry.Segment;
import org.linemass.tolerance.Tolerances;

/**
 * Joins world segments into pieces, checks the drawing and groups identical pieces. The stages,
 * in order: material drawn twice is removed ({@link Deduplicator}); zero-length segments are
 * reported and dropped, segments shorter than the join tolerance are reported and kept as pieces
 * of their own ({@link SizeCheck}); the rest are joined end to end on each layer
 * ({@link Joiner}); each piece gets its bends ({@link BendFinder}, {@link BendCheck}); free ends
 * are checked for gaps to other ends ({@link GapCheck}) and to the middle of other wires
 * ({@link TeeGapCheck}), and pieces for T-junctions and crossings
 * ({@link ContactCheck}); identical pieces are grouped ({@link Grouper}). Entities far from the rest
 * of the model are reported ({@link RemoteCheck}) and otherwise treated like the rest. Every stage uses a hash
 * grid or an STR-tree, so the whole costs O(n log n) for n segments.
 *
 * <p>Pieces are listed by layer, then start point, then end point (lexicographic), findings by
 * kind, layer and place, so the output does not depend on the order or direction of the input
 * segments. An empty input gives an empty analysis.
 */
public final class PieceAnalyzer {

    private PieceAnalyzer() {
    }

    /**
     * @param world segments in world coordinates and metres, layer in each provenance
     * @param tol the drawing's tolerances
     * @param sections the section of each layer
     * @param mirrorGrouping whether mirror images count as identical pieces
     */
    public static PieceAnalysis analyze(List<Segment> world, Tolerances tol, SectionLookup sections,
            boolean mirrorGrouping) {
        return analyze(world, tol, sections, mirrorGrouping, List.of());
    }

    /**
     * As {@link #analyze(List, Tolerances, SectionLookup, boolean)}, joining ends across the layers each
     * of {@code joins} puts together ({@link JoinClasses}); a piece spanning layers is reported on its
     * lead layer with a {@code joined_across_layers} finding (info) naming the layers it spans.
     */
    public static PieceAnalysis analyze(List<Segment> world, Tolerances tol, SectionLookup sections,
            boolean mirrorGrouping, List<LayerJoin> joins) {
        return analyze(world, tol, sections, mirrorGrouping, joins, ContactCheck.MAX_LISTED, 1);
    }

    /**
     * As {@link #analyze(List, Tolerances, SectionLookup, boolean, List)}, listing at most
     * {@code listedNotes} T-junction and crossing notes one by one (the rest counted in the totals and
     * one {@code limit_reached} note), on up to {@code threads} threads: the analysis is the same for
     * any number of threads.
     */
    public static PieceAnalysis analyze(List<Segment> world, Tolerances tol, SectionLookup sections,
            boolean mirrorGrouping, List<LayerJoin> joins, int listedNotes, int threads) {
        Objects.requireNonNull(world, "world segments");
        Objects.requireNonNull(tol, "tolerances");
        Objects.requireNonNull(sections, "section lookup");
        SectionCache cache = new SectionCache(sections);
        JoinClasses classes = new JoinClasses(joins);
        List<Finding> remote = RemoteCheck.check(world);
        SegmentIndex index = new SegmentIndex(world, tol.joinM());
        // every layer: welds between layers (cross wires on a frame layer) count as contacts
        CandidatePairs pairs = CandidatePairs.onThreads(index, world.size(), (i, j) -> true, threads);
        List<Double> worldLength = IndexedWork.map(threads, world.size(), i -> Curves.length(world.get(i)));
        double[] lengthOf = new double[world.size()];
        for (int i = 0; i < lengthOf.length; i++) {
            lengthOf[i] = worldLength.get(i);
        }
        DedupResult dedup = Deduplicator.run(world, lengthOf, pairs, tol, cache);
        List<Finding> findings = new ArrayList<>(dedup.findings());
        findings.addAll(remote);
        if (pairs.truncated()) {
            findings.add(new Finding(FindingKind.LIMIT_REACHED, Severity.WARNING, null, null, null, List.of(), null,
                    "more than " + CandidatePairs.MAX_PAIRS + " pairs of segments lie on or against each other (many"
                            + " copies drawn in one place?): duplicates, overlaps, T-junctions and crossings were"
                            + " looked for among the first ones only, so material drawn twice may be counted twice"));
        }

        List<Segment> joinable = new ArrayList<>(dedup.kept().size());
        int[] origin = new int[dedup.kept().size()];
        // each kept segment measured once; pieces, gaps and grouping read these
        double[] joinableLength = new double[dedup.kept().size()];
        List<Double> pieceLength = new ArrayList<>();
        List<List<FormRun>> pieceRuns = new ArrayList<>();
        int[] keptOrigin = dedup.origin();
        List<Piece> pieces = new ArrayList<>();
        for (int k = 0; k < dedup.kept().size(); k++) {
            Segment s = dedup.kept().get(k);
            // a segment kept whole was measured above; a trimmed or split one is measured here
            double len = s == world.get(keptOrigin[k]) ? lengthOf[keptOrigin[k]] : Curves.length(s);
            Finding f = SizeCheck.check(s, len, tol);
            if (f != null) {
                findings.add(f);
                if (!SizeCheck.isNoise(s, len, tol)) {
                    Built b = piece(List.of(s), false, cache, tol, findings, classes);
                    pieces.add(b.piece());
                    pieceRuns.add(b.runs());
                    pieceLength.add(len);
                }
            } else {
                joinableLength[joinable.size()] = len;
                origin[joinable.size()] = keptOrigin[k];
                joinable.add(s);
            }
        }
        // join classes: each layer its own unless a layer join puts several together
        int[] layerOf = classes.classes(joinable);
        JoinResult joined = Joiner.join(joinable, layerOf, tol);
        findings.addAll(joined.findings());
        double[] chainLength = new double[joined.chains().size()];
        for (int c = 0; c < chainLength.length; c++) {
            for (int i : joined.chains().get(c).indices()) {
                chainLength[c] += joinableLength[i];
            }
        }
        // the caches are filled here, in order, so the jobs below only read them
        for (Segment s : joinable) {
            cache.forLayer(s.source().layer());
            classes.ruleOf(s.source().layer());
        }
        List<Built> built = IndexedWork.map(threads, chainLength.length, c -> {
            Chain chain = joined.chains().get(c);
            return piece(chain.segments(), chain.closed(), cache, tol, new ArrayList<>(0), classes);
        });
        for (int c = 0; c < chainLength.length; c++) {
            findings.addAll(built.get(c).findings());
            pieces.add(built.get(c).piece());
            pieceRuns.add(built.get(c).runs());
            pieceLength.add(chainLength[c]);
        }
        boolean[] gapEnds = new boolean[joined.freeEnd().length];
        findings.addAll(GapCheck.check(joinable, layerOf, joined.freeEnd(), joined.endPoint(),
                joined.chainOfSegment(), chainLength, tol, gapEnds));
        DerivedIndex joinIndex = new DerivedIndex(index, world.size(), joinable,
                java.util.Arrays.copyOf(origin, joinable.size()), tol.joinM());
        findings.addAll(TeeGapCheck.check(joinable, joinIndex, joined.freeEnd(), joined.endPoint(), gapEnds, tol,
                threads));
        findings.addAll(ContactCheck.check(joinable, joinIndex, pairs, layerOf, joined.freeEnd(), joined.chainOfSegment(),
                tol, listedNotes, threads));

        Integer[] order = new Integer[pieces.size()];
        for (int i = 0; i < order.length; i++) {
            order[i] = i;
        }
        List<Piece> unsorted = pieces;
        java.util.Arrays.sort(order, (a, b) -> PIECE_ORDER.compare(unsorted.get(a), unsorted.get(b)));
        List<Piece> sorted = new ArrayList<>(pieces.size());
        double[] sortedLength = new double[pieces.size()];
        List<List<FormRun>> sortedRuns = new ArrayList<>(pieces.size());
        for (int i = 0; i < order.length; i++) {
            sorted.add(pieces.get(order[i]));
            sortedRuns.add(pieceRuns.get(order[i]));
            sortedLength[i] = pieceLength.get(order[i]);
        }
        pieces = sorted;
        List<String> keys = new ArrayList<>(pieces.size());
        for (Piece p : pieces) {
            keys.add(cache.forLayer(p.layer()).map(s -> "section:" + s.id()).orElse("layer:" + p.layer()));
        }
        List<List<Integer>> groups = Grouper.group(pieces, keys, tol, mirrorGrouping, sortedLength, threads);
        findings.sort(Findings.ORDER);
        return new PieceAnalysis(pieces, findings, dedup.removed(), groups, sortedRuns);
    }

    /** A piece and the findings made while building it. */
    private record Built(Piece piece, List<Finding> findings, List<FormRun> runs) {
    }

    private static Built piece(List<Segment> segments, boolean closed, SectionCache cache, Tolerances tol,
            List<Finding> findings, JoinClasses classes) {
        List<String> spanned = JoinClasses.layers(segments);
        String layer = spanned.size() == 1 ? spanned.get(0) : classes.leadLayer(segments, Curves::length);
        if (spanned.size() > 1) {
            findings.add(AcrossLayers.finding(segments, spanned, layer, classes.ruleOf(segments.get(0).source()
                    .layer())));
        }
        Optional<Section> section = cache.forLayer(layer);
        List<FormRun> runs = RunSplitter.split(segments, closed, tol.angleRad(), tol.joinM());
        List<BendFinder.Located> located = BendFinder.located(runs, section);
        if (!located.isEmpty() && section.isPresent()) {
            findings.addAll(BendCheck.check(layer, located, section.get()));
        }
        List<Bend> bends = new ArrayList<>(located.size());
        for (BendFinder.Located b : located) {
            bends.add(b.bend());
        }
        return new Built(new Piece(layer, segments, closed, bends), findings, runs);
    }

    /** Layer, then start point, then end point, then segment count. */
    static final Comparator<Piece> PIECE_ORDER = Comparator.comparing(Piece::layer)
            .thenComparing(p -> p.segments().get(0).start(), Curves::compare)
            .thenComparing(p -> p.segments().get(p.segments().size() - 1).end(), Curves::compare)
            .thenComparing(p -> !p.closed())
            .thenComparingInt(p -> p.segments().size());
}
