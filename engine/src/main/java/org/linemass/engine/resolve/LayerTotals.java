package org.linemass.engine.resolve;

import java.util.Collections;
import java.util.Map;
import java.util.TreeMap;
import org.linemass.engine.moments.Moments;
import org.linemass.engine.moments.MomentsAccumulator;
import org.linemass.engine.moments.Sym3;
import org.linemass.geometry.Affine;
import org.linemass.geometry.Vec3;
import org.linemass.tolerance.Tolerances;

/**
 * Length moments and segment counts per layer of some content (a block, or the whole drawing),
 * in the frame of that content. Immutable; layers sorted by name.
 *
 * @param moments length moments per layer (unit density)
 * @param segments number of segments per layer (saturating at {@link Long#MAX_VALUE})
 */
public record LayerTotals(Map<String, Moments> moments, Map<String, Long> segments) {

    public static final LayerTotals EMPTY = new LayerTotals(Map.of(), Map.of());

    public LayerTotals {
        moments = Collections.unmodifiableMap(new TreeMap<>(moments));
        segments = Collections.unmodifiableMap(new TreeMap<>(segments));
    }

    /**
     * The same content placed by a similarity of scale {@code s}, recognised to within
     * {@code relativeSlack} (the error bounds grow by that much of the new mass, because a map that is
     * a similarity only to within the slack scales lengths by {@code s} only to within it).
     */
    LayerTotals transformed(Affine map, double s, double relativeSlack) {
        Map<String, Moments> m = new TreeMap<>();
        moments.forEach((k, v) -> {
            Moments t = v.transformedBySimilarity(map, s);
            m.put(k, new Moments(t.mass(), t.centroid(), t.covariance(),
                    t.errorBound() + relativeSlack * Math.abs(t.mass())));
        });
        return new LayerTotals(m, segments);
    }

    /**
     * {@code columns x rows} copies of this content, copy (i, j) shifted by
     * {@code i columnStep + j rowStep}. Closed form: mass N m, centroid g + mean offset, covariance
     * {@code N C + m [rows Sc cs cs^T + columns Sr rs rs^T]} with {@code Sc = columns (columns^2 - 1) / 12}
     * (the cross terms vanish because offsets are centred); cost independent of N.
     */
    LayerTotals arrayed(int columns, int rows, Vec3 columnStep, Vec3 rowStep) {
        if (columns == 1 && rows == 1) {
            return this;
        }
        double nc = columns;
        double nr = rows;
        double n = nc * nr;
        Vec3 mean = columnStep.times((nc - 1) / 2).plus(rowStep.times((nr - 1) / 2));
        double sc = nc * (nc * nc - 1) / 12;
        double sr = nr * (nr * nr - 1) / 12;
        Map<String, Moments> m = new TreeMap<>();
        moments.forEach((k, v) -> {
            Sym3 spread = Sym3.outer(columnStep).times(nr * sc).plus(Sym3.outer(rowStep).times(nc * sr));
            m.put(k, new Moments(n * v.mass(), v.centroid().plus(mean),
                    v.covariance().times(n).plus(spread.times(v.mass())),
                    n * v.errorBound() + Tolerances.TRANSFORM_ROUNDING * n * v.mass()));
        });
        Map<String, Long> c = new TreeMap<>();
        long copies = (long) columns * rows;
        segments.forEach((k, v) -> c.put(k, Saturating.multiply(v, copies)));
        return new LayerTotals(m, c);
    }

    /** Total segment count over all layers (saturating). */
    public long totalSegments() {
        long t = 0;
        for (long v : segments.values()) {
            t = Saturating.add(t, v);
        }
        return t;
    }

    /** Accumulates per-layer totals with compensated summation. Not thread-safe. */
    static final class Builder {
        private final Map<String, MomentsAccumulator> acc = new TreeMap<>();
        private final Map<String, Long> counts = new TreeMap<>();

        void add(String layer, Moments m, long segmentCount) {
            acc.computeIfAbsent(layer, k -> new MomentsAccumulator()).add(m);
            counts.merge(layer, segmentCount, Saturating::add);
        }

        void addAll(LayerTotals t) {
            t.moments.forEach((k, v) -> add(k, v, t.segments.getOrDefault(k, 0L)));
        }

        LayerTotals build() {
            Map<String, Moments> m = new TreeMap<>();
            acc.forEach((k, v) -> m.put(k, v.result()));
            return new LayerTotals(m, counts);
        }
    }
}
