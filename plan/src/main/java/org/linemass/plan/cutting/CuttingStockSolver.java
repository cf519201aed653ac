package org.linemass.plan.cutting;

import java.util.ArrayList;
import java.util.List;
import org.linemass.plan.stock.StockLength;

/**
 * Cuts the pieces of one section from its stock with the least stock length bought (see the
 * package documentation for the method). Pieces longer than every stock length are returned as
 * uncut, never dropped: pieces cut plus pieces uncut always equal the demand. When stock counts
 * are too few for the pieces, the counts are set aside and a note says so. Deterministic apart
 * from the time limit: a slower machine may stop the integer search earlier.
 */
public final class CuttingStockSolver {

    /** Share of the relaxation's time in the whole limit; the integer search gets the rest. */
    static final double RELAXATION_SHARE = 0.6;
    /** Forgiven share of a bar when rounding a bound up to whole bars (float noise in the LP value). */
    static final double BOUND_SLACK = 1e-6;

    private CuttingStockSolver() {
    }

    public static CutPlan solve(CutProblem problem, CutSettings settings) {
        long start = System.nanoTime();
        long limitNanos = settings.timeLimitMs() * 1_000_000L;
        List<Demand> fits = new ArrayList<>();
        List<Demand> uncut = new ArrayList<>();
        int maxCap = 0;
        for (StockLength s : problem.stock()) {
            maxCap = Math.max(maxCap, IntInstance.capacityOf(s.lengthM(), settings.resolutionM()));
        }
        for (Demand d : problem.demands()) {
            (IntInstance.weightOf(d, problem.kerfM(), settings.resolutionM()) <= maxCap ? fits : uncut).add(d);
        }
        List<String> notes = new ArrayList<>();
        if (fits.isEmpty()) {
            return new CutPlan(problem.section(), List.of(), uncut, 0, 0, 0, true, "nothing to cut", 0, notes);
        }
        IntInstance inst = new IntInstance(fits, problem.stock(), problem.kerfM(), settings.resolutionM());
        if (!stockSuffices(inst)) {
            notes.add("the stock counts given cannot hold every piece of " + problem.section()
                    + "; the plan buys beyond them");
            inst = new IntInstance(fits, unlimited(problem.stock()), problem.kerfM(), settings.resolutionM());
        }
        double materialBound = materialBound(inst, settings.resolutionM());
        Bars best = new Bars(inst);
        FirstFitDecreasing.pack(inst, inst.demand.clone(), best);
        best.trim();
        best.shrink();
        String method = "first-fit decreasing";
        double bound = materialBound;
        boolean proven = false;
        if (!OrTools.available()) {
            notes.add(OrTools.problem() + "; plan by first-fit decreasing, bound from the material alone");
        } else {
            ColumnGeneration cg = new ColumnGeneration(inst);
            cg.run(start + (long) (limitNanos * RELAXATION_SHARE));
            if (!cg.feasible) {
                notes.add("the stock counts given cannot hold every piece of " + problem.section()
                        + "; the plan by first-fit decreasing buys beyond them");
            } else {
                bound = Math.max(bound, cg.lagrangianBound);
                proven = cg.converged;
                method = "first-fit decreasing, bound by column generation (GLOP)";
                if (!cg.converged && cg.lagrangianBound <= materialBound) {
                    notes.add("time limit reached early in the relaxation: the bound is the material bound");
                }
                Bars rounded = new Bars(inst);
                int[] residual = inst.demand.clone();
                for (int p = 0; p < cg.patterns.size(); p++) {
                    int times = (int) Math.floor(cg.lpX[p] + BOUND_SLACK);
                    rounded.add(cg.patternStock.get(p), cg.patterns.get(p), times);
                    for (int i = 0; i < residual.length; i++) {
                        residual[i] -= times * cg.patterns.get(p)[i];
                    }
                }
                for (int i = 0; i < residual.length; i++) {
                    residual[i] = Math.max(0, residual[i]);
                }
                FirstFitDecreasing.pack(inst, residual, rounded);
                rounded.trim();
                rounded.shrink();
                if (rounded.boughtM() < best.boughtM() - BOUND_SLACK) {
                    best = rounded;
                    method = "column generation, relaxation rounded down and the rest first-fit";
                }
                long left = (start + limitNanos - System.nanoTime()) / 1_000_000L;
                int[] x = IntegerMaster.solve(inst, cg.patterns, cg.patternStock, left);
                if (x != null) {
                    Bars mip = new Bars(inst);
                    for (int p = 0; p < x.length; p++) {
                        mip.add(cg.patternStock.get(p), cg.patterns.get(p), x[p]);
                    }
                    mip.trim();
                    mip.shrink();
                    if (mip.boughtM() < best.boughtM() - BOUND_SLACK) {
                        best = mip;
                        method = "column generation (GLOP) and integer plan over the patterns (SCIP)";
                    }
                }
            }
        }
        bound = roundUp(inst, bound);
        double used = 0;
        for (Demand d : fits) {
            used += d.lengthM() * d.quantity();
        }
        long millis = (System.nanoTime() - start) / 1_000_000L;
        return new CutPlan(problem.section(), best.patterns(problem.kerfM(), problem.minOffcutM()), uncut,
                best.boughtM(), used, Math.min(bound, best.boughtM()), proven, method, millis, notes);
    }

    /** With one unlimited stock length, any plan buys whole bars: the bound rounds up to one. */
    private static double roundUp(IntInstance inst, double bound) {
        if (inst.stocks() == 1 && inst.available[0] < 0) {
            double bars = Math.ceil(bound / inst.stockM[0] - BOUND_SLACK);
            return bars * inst.stockM[0];
        }
        return bound;
    }

    /** Every bar holds at most its capacity: the steps needed, in metres of the longest-per-step stock. */
    private static double materialBound(IntInstance inst, double resM) {
        long steps = 0;
        for (int i = 0; i < inst.items(); i++) {
            steps += (long) inst.weight[i] * inst.demand[i];
        }
        double metresPerStep = Double.POSITIVE_INFINITY;
        for (int s = 0; s < inst.stocks(); s++) {
            metresPerStep = Math.min(metresPerStep, inst.stockM[s] / inst.capacity[s]);
        }
        return steps * metresPerStep;
    }

    /** A cheap necessary check: the limited and unlimited stock together can hold the total load. */
    private static boolean stockSuffices(IntInstance inst) {
        long need = 0;
        for (int i = 0; i < inst.items(); i++) {
            need += (long) inst.weight[i] * inst.demand[i];
        }
        long have = 0;
        for (int s = 0; s < inst.stocks(); s++) {
            if (inst.available[s] < 0) {
                return true;
            }
            have += (long) inst.available[s] * inst.capacity[s];
        }
        return have >= need;
    }

    private static List<StockLength> unlimited(List<StockLength> stock) {
        return stock.stream().map(s -> new StockLength(s.lengthM(), null)).toList();
    }
}
