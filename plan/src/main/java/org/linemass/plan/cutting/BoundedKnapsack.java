package org.linemass.plan.cutting;

/**
 * The pricing problem of column generation: choose whole counts {@code a_i <= bound_i} of items of
 * integer weight {@code w_i} and value {@code v_i} with {@code sum a_i w_i <= capacity}, maximising
 * {@code sum a_i v_i}. Dynamic programming over the capacity with each bounded item split into
 * 0/1 items of 1, 2, 4, ... copies (Martello and Toth, Knapsack Problems, 1990, section 3.2);
 * time and memory O(capacity x sum log bound_i). Items with value at most 0 are never chosen.
 */
final class BoundedKnapsack {

    private BoundedKnapsack() {
    }

    /** The best counts; {@code value[0]} receives their total value. */
    static int[] solve(int[] weight, double[] value, int[] bound, int capacity, double[] best) {
        return solveMany(weight, value, bound, new int[] {capacity}, best)[0];
    }

    /**
     * The best counts for each of several capacities from one table: the table for the largest
     * capacity holds the optimum of every smaller one ({@code best[k]} receives capacity k's value).
     */
    static int[][] solveMany(int[] weight, double[] value, int[] bound, int[] capacities, double[] best) {
        int capacity = 0;
        for (int c : capacities) {
            capacity = Math.max(capacity, c);
        }
        int n = weight.length;
        int parts = 0;
        for (int i = 0; i < n; i++) {
            if (value[i] > 0 && weight[i] <= capacity) {
                parts += 32 - Integer.numberOfLeadingZeros(Math.max(1, Math.min(bound[i], capacity / weight[i])));
            }
        }
        int[] partItem = new int[parts];
        int[] partCopies = new int[parts];
        int k = 0;
        for (int i = 0; i < n; i++) {
            if (value[i] > 0 && weight[i] <= capacity) {
                int left = Math.min(bound[i], capacity / weight[i]);
                for (int c = 1; left > 0; c <<= 1) {
                    int take = Math.min(c, left);
                    partItem[k] = i;
                    partCopies[k] = take;
                    k++;
                    left -= take;
                }
            }
        }
        parts = k;
        double[] dp = new double[capacity + 1];
        boolean[][] took = new boolean[parts][];
        for (int p = 0; p < parts; p++) {
            int w = weight[partItem[p]] * partCopies[p];
            double v = value[partItem[p]] * partCopies[p];
            boolean[] t = new boolean[capacity + 1];
            for (int c = capacity; c >= w; c--) {
                double cand = dp[c - w] + v;
                if (cand > dp[c]) {
                    dp[c] = cand;
                    t[c] = true;
                }
            }
            took[p] = t;
        }
        int[][] out = new int[capacities.length][];
        for (int q = 0; q < capacities.length; q++) {
            int[] counts = new int[n];
            int c = capacities[q];
            for (int p = parts - 1; p >= 0; p--) {
                if (took[p][c]) {
                    counts[partItem[p]] += partCopies[p];
                    c -= weight[partItem[p]] * partCopies[p];
                }
            }
            best[q] = dp[capacities[q]];
            out[q] = counts;
        }
        return out;
    }
}
