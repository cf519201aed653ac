package org.linemass.engine.pieces.geom;

import java.util.function.IntConsumer;

/**
 * A spatial hash of points on a cubic grid, each point tagged with a group number (the layer) so
 * that only points of the same group are reported together. Built once in O(n) (open addressing
 * from cell key to a chain of points). The cells are twice the search radius, so the points
 * within the radius of a query point lie in the 2 x 2 x 2 cells nearest to it (per axis: its own
 * cell and the neighbour on the side of the cell half it lies in); {@link #near} visits every
 * point of the group in those cells, and the caller filters by distance.
 * Not thread-safe while building; immutable afterwards.
 */
public final class PointGrid {

    private final double cell;
    private final double[] xyz;
    private final int[] group;
    private final long[] keys;
    private final int[] heads;
    private final int[] next;
    private final int mask;

    /**
     * @param xyz coordinates, three per point
     * @param group group number per point
     * @param radius the largest search radius {@link #near} must honour, positive
     */
    public PointGrid(double[] xyz, int[] group, double radius) {
        if (!(radius > 0) || !Double.isFinite(radius)) {
            throw new IllegalArgumentException("grid search radius must be positive and finite, got " + radius);
        }
        if (xyz.length != 3 * group.length) {
            throw new IllegalArgumentException("need 3 coordinates per point: " + xyz.length + " for "
                    + group.length + " points");
        }
        this.cell = 2 * radius;
        this.xyz = xyz;
        this.group = group;
        int n = group.length;
        int cap = Integer.highestOneBit(Math.max(4, 2 * n)) << 1;
        this.mask = cap - 1;
        this.keys = new long[cap];
        this.heads = new int[cap];
        java.util.Arrays.fill(heads, -1);
        this.next = new int[n];
        for (int i = 0; i < n; i++) {
            long k = key(cellOf(xyz[3 * i]), cellOf(xyz[3 * i + 1]), cellOf(xyz[3 * i + 2]), group[i]);
            int slot = slot(k);
            if (heads[slot] < 0) {
                keys[slot] = k;
            }
            next[i] = heads[slot];
            heads[slot] = i;
        }
    }

    private long cellOf(double v) {
        return (long) Math.floor(v / cell);
    }

    private int slot(long k) {
        int h = (int) (k ^ (k >>> 32)) & mask;
        while (heads[h] >= 0 && keys[h] != k) {
            h = (h + 1) & mask;
        }
        return h;
    }

    private static long key(long ix, long iy, long iz, int g) {
        long h = ix * 0x9E3779B97F4A7C15L;
        h ^= iy * 0xC2B2AE3D27D4EB4FL;
        h ^= iz * 0x165667B19E3779F9L;
        h ^= g * 0x27D4EB2F165667C5L;
        h ^= h >>> 31;
        h *= 0xBF58476D1CE4E5B9L;
        h ^= h >>> 29;
        return h;
    }

    /** Visits (at least) every point of group {@code g} within the radius of (x, y, z). */
    public void near(double x, double y, double z, int g, IntConsumer visitor) {
        long cx = cellOf(x);
        long cy = cellOf(y);
        long cz = cellOf(z);
        long sx = side(x, cx);
        long sy = side(y, cy);
        long sz = side(z, cz);
        for (long dx = 0; dx <= 1; dx++) {
            for (long dy = 0; dy <= 1; dy++) {
                for (long dz = 0; dz <= 1; dz++) {
                    long k = key(cx + dx * sx, cy + dy * sy, cz + dz * sz, g);
                    int s = slot(k);
                    for (int i = heads[s]; i >= 0; i = next[i]) {
                        // a hash collision can chain another cell or group here: filter by group
                        if (group[i] == g) {
                            visitor.accept(i);
                        }
                    }
                }
            }
        }
    }

    /** +1 when v lies in the upper half of cell c, else -1: the neighbour that can hold near points. */
    private long side(double v, long c) {
        return v - c * cell >= 0.5 * cell ? 1 : -1;
    }

    /** Squared distance between point {@code i} and (x, y, z). */
    public double distanceSq(int i, double x, double y, double z) {
        double dx = xyz[3 * i] - x;
        double dy = xyz[3 * i + 1] - y;
        double dz = xyz[3 * i + 2] - z;
        return dx * dx + dy * dy + dz * dz;
    }
}
