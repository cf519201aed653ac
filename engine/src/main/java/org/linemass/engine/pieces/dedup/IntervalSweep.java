package org.linemass.engine.pieces.dedup;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;

/**
 * One-dimensional cover sweep: items are intervals on a common carrier (a line or a cut-open
 * circle). Sorted by start (then longer first, then rank so the result does not depend on input
 * order), each interval's part already covered by earlier ones is reported as a {@link Cut}.
 * Because earlier intervals all start no later, the covered part of an interval is always a
 * prefix {@code [lo, reach]}. Overlaps of at most {@code tol} count as touching, not overlapping,
 * and an interval left with at most {@code tol} uncovered is reported as wholly covered.
 */
final class IntervalSweep {

    /** An interval of one member; {@code rank} breaks ties between equal intervals. */
    record Item(int member, double lo, double hi, String rank) {
    }

    /**
     * The covered prefix {@code [lo, hi]} of item {@code item} (index into the item list);
     * {@code owner} is the item whose end reached furthest; {@code whole} when nothing of the item
     * is left.
     */
    record Cut(int item, double lo, double hi, int owner, boolean whole) {
    }

    private IntervalSweep() {
    }

    static List<Cut> sweep(List<Item> items, double tol) {
        Integer[] order = new Integer[items.size()];
        for (int i = 0; i < order.length; i++) {
            order[i] = i;
        }
        java.util.Arrays.sort(order, Comparator.<Integer>comparingDouble(i -> items.get(i).lo())
                .thenComparing(i -> -items.get(i).hi())
                .thenComparing(i -> items.get(i).rank()));
        List<Cut> cuts = new ArrayList<>();
        double reach = Double.NEGATIVE_INFINITY;
        int owner = -1;
        for (int idx : order) {
            Item it = items.get(idx);
            if (owner < 0 || reach - it.lo() <= tol) {
                reach = Math.max(reach, it.hi());
                owner = it.hi() >= reach ? idx : owner;
                continue;
            }
            if (it.hi() <= reach + tol) {
                cuts.add(new Cut(idx, it.lo(), it.hi(), owner, true));
                if (it.hi() > reach) {
                    reach = it.hi();
                }
            } else {
                cuts.add(new Cut(idx, it.lo(), reach, owner, false));
                reach = it.hi();
                owner = idx;
            }
        }
        return cuts;
    }
}
