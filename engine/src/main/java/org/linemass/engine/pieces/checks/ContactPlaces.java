package org.linemass.engine.pieces.checks;

import java.util.Arrays;
import org.linemass.geometry.Vec3;

/**
 * The places where pairs of pieces were already found touching, kept in primitive arrays (about
 * 50 bytes a place instead of a map of lists of points), so that every contact of a drawing with
 * millions of crossings can be counted once. {@link #addIfNew} answers exactly as a scan of all
 * earlier places of the same pair of pieces for one within the tolerance would. Not thread-safe.
 */
final class ContactPlaces {

    private static final int NONE = -1;

    /** Open-addressing table of pair keys; {@code head[slot]} is the newest place of that pair. */
    private long[] keys;
    private int[] head;
    private int used;

    private double[] xyz = new double[3 * 64];
    private int[] next = new int[64];
    private int size;

    ContactPlaces() {
        keys = new long[64];
        head = new int[64];
        Arrays.fill(head, NONE);
    }

    /** Places recorded so far. */
    int size() {
        return size;
    }

    /**
     * Records {@code at} for pieces {@code a} and {@code b} (in either order) unless an earlier place
     * of the same pair lies within {@code tolM}.
     *
     * @return true when the place is new
     */
    boolean addIfNew(int a, int b, Vec3 at, double tolM) {
        long key = ((long) Math.min(a, b) << 32) | (Math.max(a, b) & 0xFFFFFFFFL);
        int slot = slotOf(key);
        if (head[slot] == NONE) {
            if (2 * (used + 1) > keys.length) {
                grow();
                slot = slotOf(key);
            }
            keys[slot] = key;
            used++;
        } else {
            for (int p = head[slot]; p != NONE; p = next[p]) {
                if (at.distance(new Vec3(xyz[3 * p], xyz[3 * p + 1], xyz[3 * p + 2])) <= tolM) {
                    return false;
                }
            }
        }
        if (size == next.length) {
            next = Arrays.copyOf(next, 2 * size);
            xyz = Arrays.copyOf(xyz, 6 * size);
        }
        xyz[3 * size] = at.x();
        xyz[3 * size + 1] = at.y();
        xyz[3 * size + 2] = at.z();
        next[size] = head[slot];
        head[slot] = size++;
        return true;
    }

    /** The slot holding {@code key}, or the empty slot where it goes (linear probing). */
    private int slotOf(long key) {
        int mask = keys.length - 1;
        long h = key * 0x9E3779B97F4A7C15L;
        int slot = (int) (h ^ (h >>> 32)) & mask;
        while (head[slot] != NONE && keys[slot] != key) {
            slot = (slot + 1) & mask;
        }
        return slot;
    }

    private void grow() {
        long[] oldKeys = keys;
        int[] oldHead = head;
        keys = new long[2 * oldKeys.length];
        head = new int[2 * oldKeys.length];
        Arrays.fill(head, NONE);
        for (int s = 0; s < oldKeys.length; s++) {
            if (oldHead[s] != NONE) {
                int slot = slotOf(oldKeys[s]);
                keys[slot] = oldKeys[s];
                head[slot] = oldHead[s];
            }
        }
    }
}
