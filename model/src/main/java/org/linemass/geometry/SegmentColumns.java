package org.linemass.geometry;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * The storage behind {@link PackedSegments}: segments as records of doubles in chunked columns, a
 * 32-bit descriptor per segment (record kind and where its values start) and provenance rows per
 * entity, so a large drawing is held in about half the bytes of its text.
 *
 * <p>Record kinds, chosen per segment when it is appended:
 * <ul>
 *   <li>straight: a and b, six values; or four (ax, ay, bx, by) when both z are +0.0, as in plan
 *       drawings;</li>
 *   <li>straight that starts where the previous straight record ended, bit for bit, as the pieces
 *       of a polyline and lines drawn end to end do: only b, three values (two when the chain is
 *       in z = +0.0);</li>
 *   <li>circular arc: centre, radius, t0, t1 and the index of its (u, v) pair in a table of the
 *       distinct pairs, seven values (six when the centre's z is +0.0);</li>
 *   <li>arc of a plan polyline piece (world frame, elevation +0.0): its vertices and bulge, five
 *       values, or three (bulge and end vertex) when it starts where the previous record ended;
 *       rebuilt with {@link BulgeArc}, which is deterministic;</li>
 *   <li>any other segment (elliptical arc, spline) is kept as the object itself.</li>
 * </ul>
 * Every value is stored as given and every segment is rebuilt from exactly those values, so
 * {@link #segment} returns a segment equal to the one appended. Consecutive segments with equal
 * provenance share one provenance row; the segment-to-row map is a bit per segment (set where a
 * new row starts) with a running count per 64 segments.
 *
 * <p>Not thread-safe while appending; a {@link #trimmed()} copy is never changed and may be read
 * from any thread.
 */
final class SegmentColumns {

    private static final int STRAIGHT = 0;
    private static final int STRAIGHT_Z0 = 1;
    private static final int FOLLOW = 2;
    private static final int FOLLOW_Z0 = 3;
    private static final int ARC = 4;
    private static final int ARC_Z0 = 5;
    private static final int OBJECT = 6;
    private static final int BULGE_Z0 = 7;
    private static final int BULGE_FOLLOW_Z0 = 8;
    /** Kind bits of a descriptor; with {@link DoubleChunks#OFFSET_BITS} they fill 31 bits. */
    private static final int KIND_BITS = 4;
    private static final int KIND_MASK = (1 << KIND_BITS) - 1;

    /** Largest object index a descriptor holds (value offsets are limited by {@link DoubleChunks}). */
    private static final int MAX_PAYLOAD = Integer.MAX_VALUE >>> KIND_BITS;
    /** At most this many distinct (u, v) pairs are tabled; arcs in further planes are kept as objects. */
    private static final int MAX_AXES = 1 << 16;
    private static final long POSITIVE_ZERO = 0L;
    /** The axes of the world XY frame that plan polylines' arcs use (see {@link BulgeArc}). */
    private static final Vec3 MINUS_Y = new Vec3(0, -1, 0);
    private static final int RECENT = 4;

    private record Axes(Vec3 u, Vec3 v) {
    }

    private final IntChunks descriptors;
    private final DoubleChunks values;
    private final List<Segment> objects;
    private final List<Axes> axes;
    private final Map<Axes, Integer> axesIndex;
    /** Bit i set when segment i starts a new provenance row. */
    private long[] rowStarts;
    /** Number of rows started before each 64-segment word. */
    private int[] rowsBefore;
    private final ProvenanceColumns rows;
    /** Kind of the last record written to {@link #values}, or -1: tells whether the next may follow it. */
    private int lastValueKind = -1;
    private Provenance lastSource;
    /**
     * The axis objects of recent arcs and their table indexes, by identity: the arcs of one frame
     * share their axis objects, and a polyline's arcs alternate between two pairs.
     */
    private final Vec3[] recentU = new Vec3[RECENT];
    private final Vec3[] recentV = new Vec3[RECENT];
    private final int[] recentIndex = new int[RECENT];
    private int recentNext;

    SegmentColumns() {
        this(new IntChunks(), new DoubleChunks(), new ArrayList<>(), new ArrayList<>(), new HashMap<>(), new long[1],
                new int[1], new ProvenanceColumns());
    }

    private SegmentColumns(IntChunks descriptors, DoubleChunks values, List<Segment> objects, List<Axes> axes,
            Map<Axes, Integer> axesIndex, long[] rowStarts, int[] rowsBefore, ProvenanceColumns rows) {
        this.descriptors = descriptors;
        this.values = values;
        this.objects = objects;
        this.axes = axes;
        this.axesIndex = axesIndex;
        this.rowStarts = rowStarts;
        this.rowsBefore = rowsBefore;
        this.rows = rows;
    }

    /** An array length after growing one of {@code length} by half, within the largest array Java allows. */
    private static int grownLength(int length) {
        if (length >= Integer.MAX_VALUE - 8) {
            throw new IllegalStateException("more than " + length + " entries in one packed column");
        }
        return (int) Math.min(Math.max(16L, length + (long) (length >> 1)), Integer.MAX_VALUE - 8);
    }

    int size() {
        return descriptors.size();
    }

    void add(Segment s) {
        source(s.source());
        int d = s instanceof Straight line
                ? straight(line.ax(), line.ay(), line.az(), line.bx(), line.by(), line.bz())
                : s instanceof CircularArc arc ? arc(arc) : -1;
        descriptors.add(d >= 0 ? d : object(s));
    }

    /** Adds the straight from a to b, as {@link #add} would add that {@link Straight}, without building it. */
    void addStraight(double ax, double ay, double az, double bx, double by, double bz, Provenance p) {
        source(p);
        int d = straight(ax, ay, az, bx, by, bz);
        descriptors.add(d >= 0 ? d : object(new Straight(ax, ay, az, bx, by, bz, p)));
    }

    /** Adds the arc {@link BulgeArc#of} gives, as {@link #add} would add it. */
    void addBulgeArc(double x1, double y1, double x2, double y2, double z, double b, Affine map, Vec3 x, Vec3 y,
            Vec3 minusY, Provenance p) {
        // built once here so a bad arc fails now, in the converter that can skip its entity
        CircularArc arc = BulgeArc.of(x1, y1, x2, y2, z, b, map, x, y, minusY, p);
        source(p);
        int d = -1;
        if (map == Affine.IDENTITY && bits(z) == POSITIVE_ZERO && x.equals(Vec3.X) && y.equals(Vec3.Y)
                && minusY.equals(MINUS_Y)) {
            d = bulge(x1, y1, b, x2, y2);
        }
        if (d < 0) {
            d = arc(arc);
        }
        descriptors.add(d >= 0 ? d : object(arc));
    }

    /** The descriptor of a plan bulge arc's record, or -1 when no more values can be addressed. */
    private int bulge(double x1, double y1, double b, double x2, double y2) {
        DoubleChunks v = values;
        int n = v.end();
        if (endsFlat(lastValueKind) && v.fitsHere(3) && bits(v.get(n - 2)) == bits(x1)
                && bits(v.get(n - 1)) == bits(y1)) {
            return write(BULGE_FOLLOW_Z0, b, x2, y2, 0, 0, 0, 3);
        }
        return write(BULGE_Z0, x1, y1, b, x2, y2, 0, 5);
    }

    /** True for records that end with a plan point (x, y) at z = +0.0 as their last two values. */
    private static boolean endsFlat(int kind) {
        return kind == STRAIGHT_Z0 || kind == FOLLOW_Z0 || kind == BULGE_Z0 || kind == BULGE_FOLLOW_Z0;
    }

    /** Records the provenance of the segment about to be added: a new row unless it equals the last. */
    private void source(Provenance p) {
        int size = size();
        int word = size >>> 6;
        if (word == rowStarts.length) {
            int n = grownLength(rowStarts.length);
            rowStarts = Arrays.copyOf(rowStarts, n);
            rowsBefore = Arrays.copyOf(rowsBefore, n);
        }
        if ((size & 63) == 0) {
            rowsBefore[word] = rows.size();
        }
        if (size == 0 || p != lastSource && !p.equals(lastSource)) {
            rowStarts[word] |= 1L << (size & 63);
            rows.add(p);
        }
        lastSource = p;
    }

    /** The descriptor of a straight's record, or -1 when no more values can be addressed. */
    private int straight(double ax, double ay, double az, double bx, double by, double bz) {
        boolean flat = bits(az) == POSITIVE_ZERO && bits(bz) == POSITIVE_ZERO;
        DoubleChunks v = values;
        int n = v.end();
        if (flat && endsFlat(lastValueKind) && v.fitsHere(2)
                && bits(v.get(n - 2)) == bits(ax) && bits(v.get(n - 1)) == bits(ay)) {
            return write(FOLLOW_Z0, bx, by, 0, 0, 0, 0, 2);
        }
        if ((lastValueKind == STRAIGHT || lastValueKind == FOLLOW) && v.fitsHere(3) && bits(v.get(n - 3)) == bits(ax)
                && bits(v.get(n - 2)) == bits(ay) && bits(v.get(n - 1)) == bits(az)) {
            return write(FOLLOW, bx, by, bz, 0, 0, 0, 3);
        }
        if (flat) {
            return write(STRAIGHT_Z0, ax, ay, bx, by, 0, 0, 4);
        }
        return write(STRAIGHT, ax, ay, az, bx, by, bz, 6);
    }

    /** Writes the first {@code n} of six values as a record of {@code kind}: its descriptor, or -1. */
    private int write(int kind, double v0, double v1, double v2, double v3, double v4, double v5, int n) {
        int at = values.reserve(n);
        if (at < 0) {
            return -1;
        }
        double[] c = values.chunk(at);
        int k = DoubleChunks.position(at);
        c[k] = v0;
        c[k + 1] = v1;
        if (n > 2) {
            c[k + 2] = v2;
        }
        if (n > 3) {
            c[k + 3] = v3;
        }
        if (n > 4) {
            c[k + 4] = v4;
        }
        if (n > 5) {
            c[k + 5] = v5;
        }
        lastValueKind = kind;
        return at << KIND_BITS | kind;
    }

    /** The descriptor of an arc's record, or -1 when no more values or axis pairs can be addressed. */
    private int arc(CircularArc arc) {
        int k = axesIndex(arc.u(), arc.v());
        if (k < 0) {
            return -1;
        }
        boolean flat = bits(arc.cz()) == POSITIVE_ZERO;
        int kind = flat ? ARC_Z0 : ARC;
        int at = values.reserve(flat ? 6 : 7);
        if (at < 0) {
            return -1;
        }
        double[] c = values.chunk(at);
        int i = DoubleChunks.position(at);
        c[i++] = arc.cx();
        c[i++] = arc.cy();
        if (!flat) {
            c[i++] = arc.cz();
        }
        c[i++] = arc.radius();
        c[i++] = arc.t0();
        c[i++] = arc.t1();
        c[i] = k;
        lastValueKind = kind;
        return at << KIND_BITS | kind;
    }

    /** The table index of the pair (u, v), added when new; -1 when the table is full. */
    private int axesIndex(Vec3 u, Vec3 v) {
        for (int r = 0; r < RECENT; r++) {
            if (recentU[r] == u && recentV[r] == v) {
                return recentIndex[r];
            }
        }
        Axes key = new Axes(u, v);
        Integer known = axesIndex.get(key);
        if (known == null) {
            if (axes.size() >= MAX_AXES) {
                return -1;
            }
            known = axes.size();
            axes.add(key);
            axesIndex.put(key, known);
        }
        recentU[recentNext] = u;
        recentV[recentNext] = v;
        recentIndex[recentNext] = known;
        recentNext = (recentNext + 1) % RECENT;
        return known;
    }

    private int object(Segment s) {
        if (objects.size() > MAX_PAYLOAD) {
            throw new IllegalStateException("more than " + MAX_PAYLOAD + " curve objects in one packed list");
        }
        objects.add(s);
        return (objects.size() - 1) << KIND_BITS | OBJECT;
    }

    Segment segment(int i) {
        if (i < 0 || i >= size()) {
            throw new IndexOutOfBoundsException("index " + i + " of size " + size());
        }
        int d = descriptors.get(i);
        int at = d >>> KIND_BITS;
        DoubleChunks v = values;
        Provenance p = source(i);
        return switch (d & KIND_MASK) {
            case STRAIGHT -> new Straight(v.get(at), v.get(at + 1), v.get(at + 2), v.get(at + 3), v.get(at + 4),
                    v.get(at + 5), p);
            case STRAIGHT_Z0 -> new Straight(v.get(at), v.get(at + 1), 0.0, v.get(at + 2), v.get(at + 3), 0.0, p);
            case FOLLOW -> new Straight(v.get(at - 3), v.get(at - 2), v.get(at - 1), v.get(at), v.get(at + 1),
                    v.get(at + 2), p);
            case FOLLOW_Z0 -> new Straight(v.get(at - 2), v.get(at - 1), 0.0, v.get(at), v.get(at + 1), 0.0, p);
            case ARC -> arc(new Vec3(v.get(at), v.get(at + 1), v.get(at + 2)), at + 3, p);
            case ARC_Z0 -> arc(new Vec3(v.get(at), v.get(at + 1), 0.0), at + 2, p);
            case BULGE_Z0 -> BulgeArc.of(v.get(at), v.get(at + 1), v.get(at + 3), v.get(at + 4), 0.0, v.get(at + 2),
                    Affine.IDENTITY, Vec3.X, Vec3.Y, MINUS_Y, p);
            case BULGE_FOLLOW_Z0 -> BulgeArc.of(v.get(at - 2), v.get(at - 1), v.get(at + 1), v.get(at + 2), 0.0,
                    v.get(at), Affine.IDENTITY, Vec3.X, Vec3.Y, MINUS_Y, p);
            case OBJECT -> objects.get(at);
            default -> throw new IllegalStateException("unknown record kind " + (d & KIND_MASK) + " of segment " + i);
        };
    }

    private CircularArc arc(Vec3 centre, int at, Provenance p) {
        DoubleChunks v = values;
        Axes a = axes.get((int) v.get(at + 3));
        return new CircularArc(centre, v.get(at), a.u(), a.v(), v.get(at + 1), v.get(at + 2), p);
    }

    private Provenance source(int i) {
        return rows.get(row(i));
    }

    /** The provenance row of segment {@code i}: rows started up to and including it, less one. */
    private int row(int i) {
        int word = i >>> 6;
        return rowsBefore[word] + Long.bitCount(rowStarts[word] & (-1L >>> (63 - (i & 63)))) - 1;
    }

    /** Drops the segments from {@code newSize} on (a converter rolling back a failed entity). */
    void truncate(int newSize) {
        int size = size();
        if (newSize < 0 || newSize > size) {
            throw new IndexOutOfBoundsException("cannot truncate " + size + " segments to " + newSize);
        }
        int newValueEnd = values.end();
        int newObjectCount = objects.size();
        for (int i = size - 1; i >= newSize; i--) {
            int d = descriptors.get(i);
            if ((d & KIND_MASK) == OBJECT) {
                newObjectCount = d >>> KIND_BITS;
            } else {
                newValueEnd = d >>> KIND_BITS;
            }
            rowStarts[i >>> 6] &= ~(1L << (i & 63));
        }
        objects.subList(newObjectCount, objects.size()).clear();
        values.truncate(newValueEnd);
        descriptors.truncate(newSize);
        int last = newSize - 1;
        rows.truncate(newSize == 0 ? 0 : row(last) + 1);
        lastSource = newSize == 0 ? null : source(last);
        lastValueKind = -1;
        for (int i = last; i >= 0; i--) {
            int kind = descriptors.get(i) & KIND_MASK;
            if (kind != OBJECT) {
                lastValueKind = kind;
                break;
            }
        }
    }

    /** A copy that is never changed again, for reading only; this one must not be appended to afterwards. */
    SegmentColumns trimmed() {
        int words = (size() + 63) >>> 6;
        return new SegmentColumns(descriptors.trimmed(), values.trimmed(), List.copyOf(objects), List.copyOf(axes),
                Map.of(), Arrays.copyOf(rowStarts, words), Arrays.copyOf(rowsBefore, words), rows.trimmed());
    }

    private static long bits(double d) {
        return Double.doubleToRawLongBits(d);
    }
}
