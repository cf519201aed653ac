package org.linemass.geometry;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * The storage behind {@link PackedSegments}: segments as records of doubles in one value array, a
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
    private static final int KIND_BITS = 3;
    private static final int KIND_MASK = (1 << KIND_BITS) - 1;
    /** Largest value offset or object index a descriptor holds; past it segments are kept as objects. */
    private static final int MAX_PAYLOAD = Integer.MAX_VALUE >>> KIND_BITS;
    /** At most this many distinct (u, v) pairs are tabled; arcs in further planes are kept as objects. */
    private static final int MAX_AXES = 1 << 16;
    private static final long POSITIVE_ZERO = 0L;

    private record Axes(Vec3 u, Vec3 v) {
    }

    private int size;
    private int[] descriptors;
    private double[] values;
    private int valueCount;
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
    /** The last arc's axis objects and their table index: arcs of one plane share them. */
    private Vec3 lastU;
    private Vec3 lastV;
    private int lastAxes;

    SegmentColumns() {
        this(0, new int[16], new double[64], 0, new ArrayList<>(), new ArrayList<>(), new HashMap<>(), new long[1],
                new int[1], new ProvenanceColumns());
    }

    private SegmentColumns(int size, int[] descriptors, double[] values, int valueCount, List<Segment> objects,
            List<Axes> axes, Map<Axes, Integer> axesIndex, long[] rowStarts, int[] rowsBefore,
            ProvenanceColumns rows) {
        this.size = size;
        this.descriptors = descriptors;
        this.values = values;
        this.valueCount = valueCount;
        this.objects = objects;
        this.axes = axes;
        this.axesIndex = axesIndex;
        this.rowStarts = rowStarts;
        this.rowsBefore = rowsBefore;
        this.rows = rows;
    }

    /** An array length after growing one of {@code length} by half, within the largest array Java allows. */
    static int grownLength(int length) {
        long n = Math.max(16L, length + (long) (length >> 1));
        if (length >= Integer.MAX_VALUE - 8) {
            throw new IllegalStateException("more than " + length + " entries in one packed column");
        }
        return (int) Math.min(n, Integer.MAX_VALUE - 8);
    }

    int size() {
        return size;
    }

    void add(Segment s) {
        if (size == descriptors.length) {
            descriptors = Arrays.copyOf(descriptors, grownLength(size));
        }
        int word = size >>> 6;
        if (word == rowStarts.length) {
            int n = grownLength(rowStarts.length);
            rowStarts = Arrays.copyOf(rowStarts, n);
            rowsBefore = Arrays.copyOf(rowsBefore, n);
        }
        if ((size & 63) == 0) {
            rowsBefore[word] = rows.size();
        }
        Provenance p = s.source();
        if (size == 0 || p != lastSource && !p.equals(lastSource)) {
            rowStarts[word] |= 1L << (size & 63);
            rows.add(p);
        }
        lastSource = p;
        int d = s instanceof Straight line ? straight(line) : s instanceof CircularArc arc ? arc(arc) : -1;
        descriptors[size] = d >= 0 ? d : object(s);
        size++;
    }

    /** The descriptor of a straight's record, or -1 when the value array is full. */
    private int straight(Straight line) {
        double ax = line.ax();
        double ay = line.ay();
        double az = line.az();
        double bx = line.bx();
        double by = line.by();
        double bz = line.bz();
        boolean flat = bits(az) == POSITIVE_ZERO && bits(bz) == POSITIVE_ZERO;
        double[] v = values;
        int n = valueCount;
        if (flat && (lastValueKind == STRAIGHT_Z0 || lastValueKind == FOLLOW_Z0)
                && bits(v[n - 2]) == bits(ax) && bits(v[n - 1]) == bits(ay)) {
            int at = reserve(2, FOLLOW_Z0);
            if (at >= 0) {
                values[at] = bx;
                values[at + 1] = by;
            }
            return descriptor(at, FOLLOW_Z0);
        }
        if ((lastValueKind == STRAIGHT || lastValueKind == FOLLOW) && bits(v[n - 3]) == bits(ax)
                && bits(v[n - 2]) == bits(ay) && bits(v[n - 1]) == bits(az)) {
            int at = reserve(3, FOLLOW);
            if (at >= 0) {
                values[at] = bx;
                values[at + 1] = by;
                values[at + 2] = bz;
            }
            return descriptor(at, FOLLOW);
        }
        if (flat) {
            int at = reserve(4, STRAIGHT_Z0);
            if (at >= 0) {
                values[at] = ax;
                values[at + 1] = ay;
                values[at + 2] = bx;
                values[at + 3] = by;
            }
            return descriptor(at, STRAIGHT_Z0);
        }
        int at = reserve(6, STRAIGHT);
        if (at >= 0) {
            values[at] = ax;
            values[at + 1] = ay;
            values[at + 2] = az;
            values[at + 3] = bx;
            values[at + 4] = by;
            values[at + 5] = bz;
        }
        return descriptor(at, STRAIGHT);
    }

    /** The descriptor of an arc's record, or -1 when the value array or the axes table is full. */
    private int arc(CircularArc arc) {
        int k;
        if (arc.u() == lastU && arc.v() == lastV) {
            k = lastAxes;
        } else {
            Axes key = new Axes(arc.u(), arc.v());
            Integer known = axesIndex.get(key);
            if (known == null) {
                if (axes.size() >= MAX_AXES) {
                    return -1;
                }
                known = axes.size();
                axes.add(key);
                axesIndex.put(key, known);
            }
            k = known;
            lastU = arc.u();
            lastV = arc.v();
            lastAxes = k;
        }
        boolean flat = bits(arc.cz()) == POSITIVE_ZERO;
        int at = reserve(flat ? 6 : 7, flat ? ARC_Z0 : ARC);
        if (at >= 0) {
            int i = at;
            values[i++] = arc.cx();
            values[i++] = arc.cy();
            if (!flat) {
                values[i++] = arc.cz();
            }
            values[i++] = arc.radius();
            values[i++] = arc.t0();
            values[i++] = arc.t1();
            values[i] = k;
        }
        return descriptor(at, flat ? ARC_Z0 : ARC);
    }

    /** Room for a record of {@code n} values: its offset, or -1 when descriptors cannot address it. */
    private int reserve(int n, int kind) {
        int at = valueCount;
        if (at > MAX_PAYLOAD - n) {
            return -1;
        }
        if (at + n > values.length) {
            values = Arrays.copyOf(values, Math.max(grownLength(values.length), at + n));
        }
        valueCount = at + n;
        lastValueKind = kind;
        return at;
    }

    private static int descriptor(int at, int kind) {
        return at < 0 ? -1 : at << KIND_BITS | kind;
    }

    private int object(Segment s) {
        if (objects.size() > MAX_PAYLOAD) {
            throw new IllegalStateException("more than " + MAX_PAYLOAD + " curve objects in one packed list");
        }
        objects.add(s);
        return (objects.size() - 1) << KIND_BITS | OBJECT;
    }

    Segment segment(int i) {
        if (i < 0 || i >= size) {
            throw new IndexOutOfBoundsException("index " + i + " of size " + size);
        }
        int d = descriptors[i];
        int at = d >>> KIND_BITS;
        double[] v = values;
        Provenance p = source(i);
        return switch (d & KIND_MASK) {
            case STRAIGHT -> new Straight(v[at], v[at + 1], v[at + 2], v[at + 3], v[at + 4], v[at + 5], p);
            case STRAIGHT_Z0 -> new Straight(v[at], v[at + 1], 0.0, v[at + 2], v[at + 3], 0.0, p);
            case FOLLOW -> new Straight(v[at - 3], v[at - 2], v[at - 1], v[at], v[at + 1], v[at + 2], p);
            case FOLLOW_Z0 -> new Straight(v[at - 2], v[at - 1], 0.0, v[at], v[at + 1], 0.0, p);
            case ARC -> arc(new Vec3(v[at], v[at + 1], v[at + 2]), at + 3, p);
            case ARC_Z0 -> arc(new Vec3(v[at], v[at + 1], 0.0), at + 2, p);
            default -> objects.get(at);
        };
    }

    private CircularArc arc(Vec3 centre, int at, Provenance p) {
        double[] v = values;
        Axes a = axes.get((int) v[at + 3]);
        return new CircularArc(centre, v[at], a.u(), a.v(), v[at + 1], v[at + 2], p);
    }

    private Provenance source(int i) {
        int word = i >>> 6;
        long upTo = rowStarts[word] & (-1L >>> (63 - (i & 63)));
        return rows.get(rowsBefore[word] + Long.bitCount(upTo) - 1);
    }

    /** Drops the segments from {@code newSize} on (a converter rolling back a failed entity). */
    void truncate(int newSize) {
        if (newSize < 0 || newSize > size) {
            throw new IndexOutOfBoundsException("cannot truncate " + size + " segments to " + newSize);
        }
        int newValueCount = valueCount;
        int newObjectCount = objects.size();
        for (int i = size - 1; i >= newSize; i--) {
            int d = descriptors[i];
            if ((d & KIND_MASK) == OBJECT) {
                newObjectCount = d >>> KIND_BITS;
            } else {
                newValueCount = d >>> KIND_BITS;
            }
            rowStarts[i >>> 6] &= ~(1L << (i & 63));
        }
        objects.subList(newObjectCount, objects.size()).clear();
        valueCount = newValueCount;
        int rowCount = newSize == 0 ? 0 : rowsBefore[(newSize - 1) >>> 6]
                + Long.bitCount(rowStarts[(newSize - 1) >>> 6] & (-1L >>> (63 - ((newSize - 1) & 63))));
        rows.truncate(rowCount);
        size = newSize;
        lastSource = newSize == 0 ? null : source(newSize - 1);
        lastValueKind = -1;
        for (int i = newSize - 1; i >= 0; i--) {
            int kind = descriptors[i] & KIND_MASK;
            if (kind != OBJECT) {
                lastValueKind = kind;
                break;
            }
        }
    }

    /** A copy with arrays of exactly the used length, for reading only. */
    SegmentColumns trimmed() {
        int words = (size + 63) >>> 6;
        return new SegmentColumns(size, Arrays.copyOf(descriptors, size), Arrays.copyOf(values, valueCount),
                valueCount, List.copyOf(objects), List.copyOf(axes), Map.of(), Arrays.copyOf(rowStarts, words),
                Arrays.copyOf(rowsBefore, words), rows.trimmed());
    }

    private static long bits(double d) {
        return Double.doubleToRawLongBits(d);
    }
}
