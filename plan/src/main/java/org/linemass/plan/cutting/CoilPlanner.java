package org.linemass.plan.cutting;

import java.util.List;
import org.linemass.plan.stock.StockLength;

/**
 * Wire bought in coils by mass: a coil of {@code coilKg} holds {@code coilKg / kgPerM} metres.
 * Pieces are cut first-fit decreasing from whole coils; the bound is the material bound (pieces
 * and kerfs over the coil length, rounded up to whole coils), which first-fit decreasing meets
 * whenever the pieces are short beside a coil, as they are for wire.
 */
public final class CoilPlanner {

    private CoilPlanner() {
    }

    public static CutPlan solve(String section, List<Demand> demands, double coilKg, double kgPerM, double kerfM,
            CutSettings settings) {
        if (!(kgPerM > 0)) {
            throw new IllegalArgumentException("coil planning needs a positive mass per metre, got " + kgPerM);
        }
        long start = System.nanoTime();
        double coilM = coilKg / kgPerM;
        CutProblem p = new CutProblem(section, demands, List.of(new StockLength(coilM, null)), kerfM, 0);
        java.util.List<Demand> fits = new java.util.ArrayList<>();
        java.util.List<Demand> uncut = new java.util.ArrayList<>();
        int cap = IntInstance.capacityOf(coilM, settings.resolutionM());
        for (Demand d : p.demands()) {
            (IntInstance.weightOf(d, kerfM, settings.resolutionM()) <= cap ? fits : uncut).add(d);
        }
        if (fits.isEmpty()) {
            return new CutPlan(section, List.of(), uncut, 0, 0, 0, true, "nothing to cut", 0, List.of());
        }
        IntInstance inst = new IntInstance(fits, p.stock(), kerfM, settings.resolutionM());
        Bars bars = new Bars(inst);
        FirstFitDecreasing.pack(inst, inst.demand.clone(), bars);
        long steps = 0;
        double used = 0;
        for (int i = 0; i < inst.items(); i++) {
            steps += (long) inst.weight[i] * inst.demand[i];
            used += fits.get(i).lengthM() * fits.get(i).quantity();
        }
        double bound = Math.ceil((double) steps / inst.capacity[0] - CuttingStockSolver.BOUND_SLACK) * coilM;
        long millis = (System.nanoTime() - start) / 1_000_000L;
        return new CutPlan(section, bars.patterns(kerfM, 0), uncut, bars.boughtM(), used, Math.min(bound, bars.boughtM()),
                true, "coils, first-fit decreasing", millis, List.of());
    }
}
