package org.linemass.plan.cutting;

import java.util.List;

/**
 * A problem in whole resolution steps: item weights (length plus kerf, rounded up), demands,
 * stock capacities (rounded down), lengths in metres and counts ({@code -1} unlimited). Items
 * are the demands that fit at least one stock length, in the given order.
 */
final class IntInstance {

    /**
     * Share of one resolution step forgiven before rounding, so that 1.000 m stored as
     * 0.99999999999 m does not lose a step (far below any saw's accuracy).
     */
    static final double ROUNDING_SLACK = 1e-6;

    final List<Demand> items;
    final int[] weight;
    final int[] demand;
    final int[] capacity;
    final double[] stockM;
    final int[] available;

    IntInstance(List<Demand> items, List<org.linemass.plan.stock.StockLength> stock, double kerfM, double resM) {
        this.items = List.copyOf(items);
        int n = items.size();
        weight = new int[n];
        demand = new int[n];
        for (int i = 0; i < n; i++) {
            weight[i] = (int) Math.ceil((items.get(i).lengthM() + kerfM) / resM - ROUNDING_SLACK);
            demand[i] = items.get(i).quantity();
        }
        int m = stock.size();
        capacity = new int[m];
        stockM = new double[m];
        available = new int[m];
        for (int s = 0; s < m; s++) {
            stockM[s] = stock.get(s).lengthM();
            capacity[s] = (int) Math.floor(stockM[s] / resM + ROUNDING_SLACK);
            available[s] = stock.get(s).available() == null ? -1 : stock.get(s).available();
        }
    }

    static int weightOf(Demand d, double kerfM, double resM) {
        return (int) Math.ceil((d.lengthM() + kerfM) / resM - ROUNDING_SLACK);
    }

    static int capacityOf(double stockM, double resM) {
        return (int) Math.floor(stockM / resM + ROUNDING_SLACK);
    }

    int items() {
        return weight.length;
    }

    int stocks() {
        return capacity.length;
    }

    /** Index of the longest stock length that is not limited to zero bars. */
    int longest() {
        int best = -1;
        for (int s = 0; s < stocks(); s++) {
            if (available[s] != 0 && (best < 0 || capacity[s] > capacity[best])) {
                best = s;
            }
        }
        return best;
    }
}
