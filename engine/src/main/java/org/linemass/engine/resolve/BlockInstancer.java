package org.linemass.engine.resolve;

import java.util.Arrays;
import java.util.HashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.OptionalDouble;
import java.util.Set;
import org.linemass.drawing.Block;
import org.linemass.drawing.Drawing;
import org.linemass.drawing.Insert;
import org.linemass.drawing.InsertWalk;
import org.linemass.engine.integrate.LinearDensity;
import org.linemass.engine.integrate.MomentIntegrator;
import org.linemass.engine.moments.Moments;
import org.linemass.geometry.Affine;
import org.linemass.geometry.Segment;
import org.linemass.geometry.Vec3;
import org.linemass.tolerance.Tolerances;

/**
 * Per-layer length moments of a whole drawing by instancing: each (block, inherited layer) pair is
 * integrated once in block coordinates and its moments are transformed by every rigid insert
 * ({@link Moments#transformedBySimilarity}, mirrors allowed); MINSERT arrays are summed in closed
 * form ({@link LayerTotals#arrayed}). A block bomb whose expansion has 10^12 segments therefore
 * costs the number of distinct blocks. Inserts whose map is not a similarity are integrated on the
 * transformed curves (arcs become elliptical arcs) once per distinct linear map (copies that differ by
 * a translation share the result, see {@link Key}), at most {@code directBudget} segment copies and
 * {@code directBudget} distinct maps in all; beyond that the remaining copies are left out and an
 * incompleteness reason is recorded.
 * Nesting is walked by {@link InsertWalk} (one entry per insert; a child's moments are added to its
 * parent when the walk leaves the child, or at once when they are memoised); an insert that would
 * place a block inside itself is skipped and recorded. Single use, not thread-safe.
 */
final class BlockInstancer {

    private final Drawing drawing;
    private final LayerRules rules;
    private final double relative;
    private final Map<String, Moments[]> segmentMoments = new HashMap<>();
    private final Map<Key, LayerTotals> memo = new HashMap<>();
    private final Set<String> reasons = new LinkedHashSet<>();
    private long directBudget;
    private final long maxFrames;
    private long frameBudget;

    /**
     * A memo entry: a block under an inherited layer, in its own frame ({@code linear} null) or under
     * a linear map that is not a similarity ({@code linear} its nine entries, row-major). Copies
     * whose placements differ only by a translation share one entry: the translation is applied to
     * the entry's moments (a rigid motion), so a nest of non-uniformly scaled blocks costs one
     * integration per distinct linear map instead of one per copy.
     */
    private record Key(String block, String inherited, List<Double> linear) {
        Key(String block, String inherited) {
            this(block, inherited, null);
        }
    }

    /**
     * One block being integrated: under {@code map} (null: its own frame), memoised under
     * {@code memoKey}; {@code insert} and {@code composite} say how its parent places the result
     * ({@code scale} the similarity scale, NaN for a linear map that is not one).
     */
    private static final class Frame {
        final Block block;
        final String inherited;
        final Affine map;
        final Key memoKey;
        final Frame parent;
        final Insert insert;
        final Affine composite;
        final double scale;
        final LayerTotals.Builder acc = new LayerTotals.Builder();

        Frame(Block block, String inherited, Affine map, Key memoKey, Frame parent, Insert insert, Affine composite,
                double scale) {
            this.block = block;
            this.inherited = inherited;
            this.map = map;
            this.memoKey = memoKey;
            this.parent = parent;
            this.insert = insert;
            this.composite = composite;
            this.scale = scale;
        }
    }

    BlockInstancer(Drawing drawing, LayerRules rules, double relative, long directBudget) {
        this.drawing = drawing;
        this.rules = rules;
        this.relative = relative;
        this.directBudget = directBudget;
        this.maxFrames = directBudget;
        this.frameBudget = directBudget;
    }

    /** Reasons why some content was left out (cycles, unknown blocks, budget), in the order found. */
    List<String> reasons() {
        return List.copyOf(reasons);
    }

    /**
     * False when block {@code block} placed with inherited layer {@code inherited} is known to hold
     * no counted segment anywhere below it (so expanding its copies one by one would only burn time:
     * an array of 10^10 copies of an empty block); true when it holds some or was never reached.
     * Call after {@link #modelSpace}.
     */
    boolean placesSegments(String block, String inherited) {
        LayerTotals t = memo.get(new Key(block, inherited));
        return t == null || t.totalSegments() > 0;
    }

    /** Moments of the model space content under {@code world}, a similarity of scale {@code scale}. */
    LayerTotals modelSpace(Affine world, double scale) {
        Block model = drawing.modelSpace();
        if (model == null) {
            return LayerTotals.EMPTY;
        }
        return inBlockFrame(model, null).transformed(world, scale, 0);
    }

    private LayerTotals inBlockFrame(Block block, String inherited) {
        Key key = new Key(block.name(), inherited);
        LayerTotals done = memo.get(key);
        if (done != null) {
            return done;
        }
        Frame root = new Frame(block, inherited, null, key, null, null, null, Double.NaN);
        addSegments(root);
        InsertWalk.walk(drawing.blocks()::get, root, new Walk());
        return memo.get(key);
    }

    /** The instancing walk: a child frame for each placement whose moments are not memoised yet. */
    private final class Walk implements InsertWalk.Visitor<Frame> {

        @Override
        public Block block(Frame f) {
            return f.block;
        }

        @Override
        public String inherited(Frame f) {
            return f.inherited;
        }

        @Override
        public long entries(Frame parent, Insert ins, Block child, String inherited) {
            return rules.insertShown(inherited) ? 1 : 0;
        }

        @Override
        public void undefined(Frame parent, Insert ins) {
            reasons.add("insert of undefined block " + ins.blockName() + " (" + ins.source().describe() + ") left out");
        }

        @Override
        public void cycle(Frame parent, Insert ins, Block child) {
            reasons.add("block " + child.name() + " inserts itself (" + ins.source().describe()
                    + "); that insert was left out");
        }

        @Override
        public Frame enter(Frame f, Insert ins, Block child, String inherited, long entry) {
            Affine composite = f.map == null ? ins.placement() : ins.placement().andThen(f.map);
            OptionalDouble s = composite.similarityScale(Tolerances.SIMILARITY_RELATIVE);
            Key key;
            Affine linear = null;
            if (s.isPresent()) {
                key = new Key(child.name(), inherited);
            } else {
                linear = Affine.of(composite.linearRowMajor(), Vec3.ZERO);
                key = new Key(child.name(), inherited, Arrays.stream(composite.linearRowMajor()).boxed().toList());
            }
            double scale = s.isPresent() ? s.getAsDouble() : Double.NaN;
            LayerTotals cached = memo.get(key);
            if (cached != null) {
                place(f, ins, composite, scale, cached);
                return null;
            }
            if (linear != null) {
                if (frameBudget <= 0) {
                    reasons.add("too many distinct non-uniformly scaled placements (more than " + maxFrames
                            + "); some copies of block " + child.name() + " were left out");
                    return null;
                }
                frameBudget--;
            }
            Frame c = new Frame(child, inherited, linear, key, f, ins, composite, scale);
            addSegments(c);
            return c;
        }

        @Override
        public void leave(Frame f) {
            LayerTotals result = f.acc.build();
            memo.put(f.memoKey, result);
            if (f.parent != null) {
                place(f.parent, f.insert, f.composite, f.scale, result);
            }
        }
    }

    /**
     * Adds the moments {@code sub} of a child (in its block frame, or under its linear map when
     * {@code scale} is NaN) to frame {@code f} as insert {@code ins} places them, arrays included.
     */
    private static void place(Frame f, Insert ins, Affine composite, double scale, LayerTotals sub) {
        Vec3 cs = f.map == null ? ins.columnStep() : f.map.applyLinear(ins.columnStep());
        Vec3 rs = f.map == null ? ins.rowStep() : f.map.applyLinear(ins.rowStep());
        LayerTotals placed = Double.isNaN(scale)
                ? sub.transformed(Affine.translation(composite.translationPart()), 1, 0)
                : sub.transformed(composite, scale, Tolerances.SIMILARITY_SLACK);
        f.acc.addAll(placed.arrayed(ins.columns(), ins.rows(), cs, rs));
    }

    private void addSegments(Frame f) {
        List<Segment> segs = f.block.segments();
        Moments[] cached = f.map == null ? segmentMoments(f.block) : null;
        for (int i = 0; i < segs.size(); i++) {
            Segment seg = segs.get(i);
            String layer = LayerRules.effective(seg.source().layer(), f.inherited);
            if (!rules.counts(layer)) {
                continue;
            }
            if (cached != null) {
                f.acc.add(layer, cached[i], 1);
            } else if (directBudget > 0) {
                directBudget--;
                f.acc.add(layer, integrate(seg.transformed(f.map)), 1);
            } else {
                reasons.add("too many segments under non-uniformly scaled inserts; some copies of block "
                        + f.block.name() + " were left out");
            }
        }
    }

    private Moments[] segmentMoments(Block block) {
        return segmentMoments.computeIfAbsent(block.name(), k -> {
            List<Segment> segs = block.segments();
            Moments[] m = new Moments[segs.size()];
            for (int i = 0; i < m.length; i++) {
                m[i] = integrate(segs.get(i));
            }
            return m;
        });
    }

    /** Moments of one segment; a segment whose integrals are not finite is left out and recorded. */
    private Moments integrate(Segment seg) {
        Moments m = MomentIntegrator.integrate(seg, LinearDensity.UNIT, 0, relative,
                MomentIntegrator.DEFAULT_MAX_EVALUATIONS).moments();
        if (!Double.isFinite(m.mass()) || !m.centroid().isFinite() || !m.covariance().isFinite()
                || !Double.isFinite(m.errorBound())) {
            reasons.add(seg.source().describe() + " could not be integrated (its geometry gives non-finite values) "
                    + "and was left out of the totals");
            return new Moments(0, Vec3.ZERO, org.linemass.engine.moments.Sym3.ZERO, 0);
        }
        return m;
    }
}
