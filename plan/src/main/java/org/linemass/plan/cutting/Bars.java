package org.linemass.plan.cutting;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * A plan as individual bars (stock index and item counts): built from pattern counts, trimmed of
 * surplus pieces, each bar moved to the shortest stock length that still holds it, then grouped
 * into {@link CutPattern}s. Not thread-safe.
 */
final class Bars {

    final IntInstance inst;
    final List<Integer> stock = new ArrayList<>();
    final List<int[]> counts = new ArrayList<>();

    Bars(IntInstance inst) {
        this.inst = inst;
    }

    void add(int s, int[] a, int times) {
        for (int t = 0; t < times; t++) {
            stock.add(s);
            counts.add(a.clone());
        }
    }

    /** Removes pieces made beyond demand (from the fullest bars last), then empty bars. */
    void trim() {
        int n = inst.items();
        int[] made = new int[n];
        for (int[] a : counts) {
            for (int i = 0; i < n; i++) {
                made[i] += a[i];
            }
        }
        for (int b = 0; b < counts.size(); b++) {
            int[] a = counts.get(b);
            for (int i = 0; i < n; i++) {
                int surplus = Math.min(a[i], made[i] - inst.demand[i]);
                if (surplus > 0) {
                    a[i] -= surplus;
                    made[i] -= surplus;
                }
            }
        }
        for (int b = counts.size() - 1; b >= 0; b--) {
            if (Arrays.stream(counts.get(b)).sum() == 0) {
                counts.remove(b);
                stock.remove(b);
            }
        }
    }

    /** Moves each bar to the shortest stock length that holds it and has bars left. */
    void shrink() {
        int[] used = new int[inst.stocks()];
        for (int s : stock) {
            used[s]++;
        }
        for (int b = 0; b < counts.size(); b++) {
            int load = load(counts.get(b));
            int cur = stock.get(b);
            int best = cur;
            for (int s = 0; s < inst.stocks(); s++) {
                boolean room = inst.available[s] < 0 || used[s] < inst.available[s];
                if (room && inst.capacity[s] >= load && inst.stockM[s] < inst.stockM[best]) {
                    best = s;
                }
            }
            if (best != cur) {
                used[cur]--;
                used[best]++;
                stock.set(b, best);
            }
        }
    }

    int load(int[] a) {
        int w = 0;
        for (int i = 0; i < a.length; i++) {
            w += a[i] * inst.weight[i];
        }
        return w;
    }

    double boughtM() {
        double sum = 0;
        for (int s : stock) {
            sum += inst.stockM[s];
        }
        return sum;
    }

    /** Identical bars grouped, most bars first, then longest stock. */
    List<CutPattern> patterns(double kerfM, double minOffcutM) {
        Map<String, int[]> groups = new LinkedHashMap<>();
        Map<String, Integer> stockOf = new LinkedHashMap<>();
        Map<String, Integer> times = new LinkedHashMap<>();
        for (int b = 0; b < counts.size(); b++) {
            String key = stock.get(b) + ":" + Arrays.toString(counts.get(b));
            groups.putIfAbsent(key, counts.get(b));
            stockOf.putIfAbsent(key, stock.get(b));
            times.merge(key, 1, Integer::sum);
        }
        List<CutPattern> out = new ArrayList<>();
        for (String key : groups.keySet()) {
            int[] a = groups.get(key);
            double length = inst.stockM[stockOf.get(key)];
            List<PatternPiece> pieces = new ArrayList<>();
            double used = 0;
            int cuts = 0;
            for (int i = 0; i < a.length; i++) {
                if (a[i] > 0) {
                    Demand d = inst.items.get(i);
                    pieces.add(new PatternPiece(d.mark(), d.lengthM(), a[i]));
                    used += d.lengthM() * a[i];
                    cuts += a[i];
                }
            }
            pieces.sort(Comparator.comparingDouble(PatternPiece::lengthM).reversed()
                    .thenComparing(PatternPiece::mark));
            double offcut = Math.max(0, length - used - cuts * kerfM);
            out.add(new CutPattern(length, times.get(key), pieces, offcut, minOffcutM > 0 && offcut >= minOffcutM));
        }
        out.sort(Comparator.comparingInt(CutPattern::bars).reversed()
                .thenComparing(Comparator.comparingDouble(CutPattern::stockLengthM).reversed())
                .thenComparingDouble(CutPattern::offcutM));
        return out;
    }
}
