package org.linemass.plan.cutting;

import com.google.ortools.linearsolver.MPConstraint;
import com.google.ortools.linearsolver.MPObjective;
import com.google.ortools.linearsolver.MPSolver;
import com.google.ortools.linearsolver.MPVariable;
import java.util.ArrayList;
import java.util.List;

/**
 * The linear relaxation of the cutting-stock problem over all patterns, solved by column
 * generation: minimise {@code sum L_s x_p} subject to {@code sum_p a_ip x_p >= d_i} for every item
 * and {@code sum_{p of s} x_p <= n_s} for every limited stock length, starting from one
 * homogeneous pattern per item and stock length; each round prices one knapsack per stock length
 * with the duals and adds every pattern of negative reduced cost. When no pattern prices out the
 * relaxation is solved over all patterns and its value is a lower bound for any plan.
 */
final class ColumnGeneration {

    /** Reduced cost (as a share of the stock length) below which a pattern is added: far above GLOP's 1e-7 tolerances. */
    static final double PRICE_TOL = 1e-6;

    /** Relative distance of bound and relaxation at which generation stops (a gap nobody can cut a saw to). */
    static final double STOP_SHARE = 1e-4;

    final IntInstance inst;
    final List<int[]> patterns = new ArrayList<>();
    final List<Integer> patternStock = new ArrayList<>();
    double lpValue = Double.NaN;
    /** The best Lagrangian (Farley) bound seen: valid for every plan even when not converged. */
    double lagrangianBound = 0;
    double[] lpX = new double[0];
    boolean converged;
    boolean feasible;

    ColumnGeneration(IntInstance inst) {
        this.inst = inst;
    }

    /** Runs until converged or {@code deadlineNanos}. */
    void run(long deadlineNanos) {
        MPSolver lp = MPSolver.createSolver("GLOP");
        int n = inst.items();
        MPConstraint[] demandRows = new MPConstraint[n];
        for (int i = 0; i < n; i++) {
            demandRows[i] = lp.makeConstraint(inst.demand[i], Double.POSITIVE_INFINITY, "d" + i);
        }
        MPConstraint[] stockRows = new MPConstraint[inst.stocks()];
        for (int s = 0; s < inst.stocks(); s++) {
            if (inst.available[s] >= 0) {
                stockRows[s] = lp.makeConstraint(0, inst.available[s], "n" + s);
            }
        }
        MPObjective obj = lp.objective();
        obj.setMinimization();
        List<MPVariable> vars = new ArrayList<>();
        for (int s = 0; s < inst.stocks(); s++) {
            for (int i = 0; i < n; i++) {
                if (inst.weight[i] <= inst.capacity[s]) {
                    int[] a = new int[n];
                    a[i] = Math.min(inst.demand[i], inst.capacity[s] / inst.weight[i]);
                    add(lp, obj, demandRows, stockRows, vars, s, a);
                }
            }
        }
        double[] pi = new double[n];
        int[] bound = inst.demand.clone();
        while (true) {
            MPSolver.ResultStatus st = lp.solve();
            if (st != MPSolver.ResultStatus.OPTIMAL) {
                feasible = false;
                return;
            }
            feasible = true;
            lpValue = obj.value();
            lpX = vars.stream().mapToDouble(MPVariable::solutionValue).toArray();
            if (System.nanoTime() > deadlineNanos) {
                return;
            }
            for (int i = 0; i < n; i++) {
                pi[i] = demandRows[i].dualValue();
            }
            double[] vals = new double[inst.stocks()];
            int[][] best = BoundedKnapsack.solveMany(inst.weight, pi, bound, inst.capacity, vals);
            double piD = 0;
            for (int i = 0; i < n; i++) {
                piD += pi[i] * inst.demand[i];
            }
            double worstRatio = 0;
            List<Integer> pricedOut = new ArrayList<>();
            for (int s = 0; s < inst.stocks(); s++) {
                if (inst.available[s] == 0) {
                    continue;
                }
                double mu = stockRows[s] == null ? 0 : stockRows[s].dualValue();
                worstRatio = Math.min(worstRatio, (inst.stockM[s] - vals[s]) / inst.stockM[s]);
                if (inst.stockM[s] - vals[s] - mu < -PRICE_TOL * inst.stockM[s]) {
                    pricedOut.add(s);
                }
            }
            if (pricedOut.isEmpty()) {
                converged = true;
                lagrangianBound = Math.max(lagrangianBound, lpValue);
                return;
            }
            // Farley's bound: every bar's reduced cost is at least worstRatio times its length, so
            // z >= pi.d + worstRatio z for any plan z (duals pi >= 0, count duals left out).
            lagrangianBound = Math.max(lagrangianBound, piD / (1 - worstRatio));
            if (closeEnough()) {
                return;
            }
            for (int s : pricedOut) {
                add(lp, obj, demandRows, stockRows, vars, s, best[s]);
            }
        }
    }

    /**
     * The relaxation need not be solved further when the bound already meets it to within
     * {@link #STOP_SHARE}, or, with one unlimited stock length, rounds up to the same whole bars.
     */
    private boolean closeEnough() {
        if (inst.stocks() == 1 && inst.available[0] < 0) {
            double l = inst.stockM[0];
            if (Math.ceil(lagrangianBound / l - CuttingStockSolver.BOUND_SLACK)
                    >= Math.ceil(lpValue / l - CuttingStockSolver.BOUND_SLACK)) {
                return true;
            }
        }
        return lpValue - lagrangianBound <= STOP_SHARE * lpValue;
    }

    private void add(MPSolver lp, MPObjective obj, MPConstraint[] demandRows, MPConstraint[] stockRows,
            List<MPVariable> vars, int s, int[] a) {
        MPVariable x = lp.makeNumVar(0, Double.POSITIVE_INFINITY, "x" + vars.size());
        obj.setCoefficient(x, inst.stockM[s]);
        for (int i = 0; i < a.length; i++) {
            if (a[i] > 0) {
                demandRows[i].setCoefficient(x, a[i]);
            }
        }
        if (stockRows[s] != null) {
            stockRows[s].setCoefficient(x, 1);
        }
        vars.add(x);
        patterns.add(a);
        patternStock.add(s);
    }
}
