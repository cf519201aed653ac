package org.linemass.engine.pieces.index;

import java.util.function.IntConsumer;

/**
 * A spatial hash of points on a cubic grid, each point tagged with a group number (the layer) so
 * that only points of the same group are reported together. Built once in O(n) (open addressing
 * from cell key to a chain of points). Cells are {@link #CELL_FACTOR} times the search radius and
 * the grid is shifted by half a cell (so a drawing lying in the plane z = 0 sits mid-cell); per
 * axis {@link #near} looks into the neighbouring cell only when the query point is within the
 * radius of that side, so a typical query reads one or two cells. It visits every point of the
 * group within the radius (and some farther ones the caller filters by distance).
 * Not thread-safe while building; immutable afterwards.
 */
public final class PointGrid {

    /** Cell edge in search radii: larger cells mean fewer neighbour lookups, more points per cell. */
    public static final double CELL_FACTOR = 8;

    private final double cell;
    private final double radius;
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
        this.cell = CELL_FACTOR * radius;
        this.radius = radius;
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
        return (long) Math.floor(v / cell + 0.5);
    }

    /** Distance from v to the lower face of its cell. */
    private double below(double v, long c) {
        return v - (c - 0.5) * cell;
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
        double bx = below(x, cx);
        double by = below(y, cy);
        double bz = below(z, cz);
        for (long dx = bx <= radius ? -1 : 0; dx <= (cell - bx <= radius ? 1 : 0); dx++) {
            for (long dy = by <= radius ? -1 : 0; dy <= (cell - by <= radius ? 1 : 0); dy++) {
                for (long dz = bz <= radius ? -1 : 0; dz <= (cell - bz <= radius ? 1 : 0); dz++) {
                    long k = key(cx + dx, cy + dy, cz + dz, g);
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

    /** Squared distance between point {@code i} and (x, y, z). */
    public double distanceSq(int i, double x, double y, double z) {
        double dx = xyz[3 * i] - x;
        double dy = xyz[3 * i + 1] - y;
        double dz = xyz[3 * i + 2] - z;
        return dx * dx + dy * dy + dz * dz;
    }
}
