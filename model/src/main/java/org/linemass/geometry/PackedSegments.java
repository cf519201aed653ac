package org.linemass.geometry;

import java.util.AbstractList;
import java.util.Collection;
import java.util.Objects;
import java.util.RandomAccess;

/**
 * An immutable list of segments held compactly: straights and circular arcs as records of doubles,
 * provenance as one row per entity (see {@link SegmentColumns} for the layout). {@link #get}
 * builds the segment on each call; it is equal to the segment that was added, value for value,
 * not the same object. Safe to read from any thread.
 *
 * <p>A large drawing's model is mostly straights; held this way a straight costs 20 to 50 bytes
 * instead of about 100 as objects. Lists of a few segments gain nothing but lose nothing either.
 */
public final class PackedSegments extends AbstractList<Segment> implements RandomAccess {

    private static final PackedSegments EMPTY = new PackedSegments(new SegmentColumns().trimmed());

    private final SegmentColumns columns;

    private PackedSegments(SegmentColumns columns) {
        this.columns = columns;
    }

    /** The segments of {@code segments} in order, packed; the argument itself when it is already packed. */
    public static PackedSegments copyOf(Collection<? extends Segment> segments) {
        if (segments instanceof PackedSegments p) {
            return p;
        }
        if (segments.isEmpty()) {
            return EMPTY;
        }
        Builder b = new Builder();
        for (Segment s : segments) {
            b.add(s);
        }
        return b.build();
    }

    @Override
    public Segment get(int index) {
        return columns.segment(index);
    }

    @Override
    public int size() {
        return columns.size();
    }

    /**
     * Collects segments for a {@link PackedSegments}. A list itself, so code that fills a
     * {@code List<Segment>} can fill it directly: it supports {@link #add}, {@link #get},
     * {@link #size} and removal of a tail range ({@code subList(from, size()).clear()}, used to roll
     * back an entity that failed half way); other changes are unsupported. Nulls are refused. Not
     * thread-safe. After {@link #build()} it can only be read.
     */
    public static final class Builder extends AbstractList<Segment> implements RandomAccess {

        private final SegmentColumns columns = new SegmentColumns();
        private boolean built;

        @Override
        public boolean add(Segment s) {
            Objects.requireNonNull(s, "segment");
            requireOpen();
            columns.add(s);
            modCount++;
            return true;
        }

        /**
         * Adds the straight from (ax, ay, az) to (bx, by, bz): the same as adding that
         * {@link Straight}, without building the object (the importer's bulk path).
         */
        public void addStraight(double ax, double ay, double az, double bx, double by, double bz, Provenance p) {
            Objects.requireNonNull(p, "provenance");
            requireOpen();
            columns.addStraight(ax, ay, az, bx, by, bz, p);
            modCount++;
        }

        /**
         * Adds the arc {@link BulgeArc#of} gives for these arguments, the same as adding that arc;
         * a plan polyline's arcs are then kept as their bulge and end vertex only.
         *
         * @throws IllegalArgumentException as {@link BulgeArc#of}, with nothing added
         */
        public void addBulgeArc(double x1, double y1, double x2, double y2, double z, double b, Affine map, Vec3 x,
                Vec3 y, Vec3 minusY, Provenance p) {
            Objects.requireNonNull(p, "provenance");
            requireOpen();
            columns.addBulgeArc(x1, y1, x2, y2, z, b, map, x, y, minusY, p);
            modCount++;
        }

        @Override
        public Segment get(int index) {
            return columns.segment(index);
        }

        @Override
        public int size() {
            return columns.size();
        }

        /** Only a tail range can be removed. */
        @Override
        protected void removeRange(int fromIndex, int toIndex) {
            if (toIndex != size() || fromIndex < 0 || fromIndex > toIndex) {
                throw new UnsupportedOperationException("only a tail range can be removed, not " + fromIndex + ".."
                        + toIndex + " of " + size());
            }
            requireOpen();
            columns.truncate(fromIndex);
            modCount++;
        }

        /** The segments added, packed. Call once: the list shares storage with the builder, which is then closed. */
        public PackedSegments build() {
            requireOpen();
            built = true;
            return new PackedSegments(columns.trimmed());
        }

        private void requireOpen() {
            if (built) {
                throw new IllegalStateException("this builder has already built its list");
            }
        }
    }
}
