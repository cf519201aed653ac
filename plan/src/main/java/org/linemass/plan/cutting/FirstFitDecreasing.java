package org.linemass.plan.cutting;

/**
 * The classic heuristic (Johnson, 1973; at most 11/9 OPT + 6/9 bars for one stock length, Dósa
 * 2007): items longest first, each into the first open bar with room, else a new bar of the
 * longest stock length that has bars left (any length once none has). Used as the starting plan,
 * as the plan when the solver is missing, and for the pieces left after rounding the relaxation down.
 */
final class FirstFitDecreasing {

    private FirstFitDecreasing() {
    }

    /** Adds bars holding {@code residual} items to {@code bars}; {@code used} counts bars per stock. */
    static void pack(IntInstance inst, int[] residual, Bars bars) {
        Integer[] order = new Integer[inst.items()];
        for (int i = 0; i < order.length; i++) {
            order[i] = i;
        }
        java.util.Arrays.sort(order, (x, y) -> Integer.compare(inst.weight[y], inst.weight[x]));
        int[] used = new int[inst.stocks()];
        for (int s : bars.stock) {
            used[s]++;
        }
        int first = bars.counts.size();
        int[] load = new int[0];
        for (int i : order) {
            for (int k = 0; k < residual[i]; k++) {
                int placed = -1;
                for (int b = first; b < bars.counts.size(); b++) {
                    if (load[b - first] + inst.weight[i] <= inst.capacity[bars.stock.get(b)]) {
                        placed = b;
                        break;
                    }
                }
                if (placed < 0) {
                    int s = open(inst, used, inst.weight[i]);
                    used[s]++;
                    bars.add(s, new int[inst.items()], 1);
                    placed = bars.counts.size() - 1;
                    load = java.util.Arrays.copyOf(load, placed - first + 1);
                }
                bars.counts.get(placed)[i]++;
                load[placed - first] += inst.weight[i];
            }
        }
    }

    private static int open(IntInstance inst, int[] used, int weight) {
        int best = -1;
        for (int s = 0; s < inst.stocks(); s++) {
            boolean room = inst.available[s] < 0 || used[s] < inst.available[s];
            if (room && inst.capacity[s] >= weight && (best < 0 || inst.capacity[s] > inst.capacity[best])) {
                best = s;
            }
        }
        if (best < 0) {
            for (int s = 0; s < inst.stocks(); s++) {
                if (inst.capacity[s] >= weight && (best < 0 || inst.capacity[s] > inst.capacity[best])) {
                    best = s;
                }
            }
        }
        return best;
    }
}
