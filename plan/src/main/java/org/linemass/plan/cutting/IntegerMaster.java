package org.linemass.plan.cutting;

import com.google.ortools.linearsolver.MPConstraint;
import com.google.ortools.linearsolver.MPObjective;
import com.google.ortools.linearsolver.MPSolver;
import com.google.ortools.linearsolver.MPVariable;
import java.util.List;

/**
 * The integer plan over the generated patterns: the same model as the relaxation with whole bar
 * counts, solved by SCIP (CBC where SCIP is missing) within a time limit. Returns the counts per
 * pattern, or null when no feasible plan was found in time.
 */
final class IntegerMaster {

    private IntegerMaster() {
    }

    static int[] solve(IntInstance inst, List<int[]> patterns, List<Integer> stockOf, long millis) {
        MPSolver mip = MPSolver.createSolver("SCIP");
        if (mip == null) {
            mip = MPSolver.createSolver("CBC");
        }
        if (mip == null || millis < 1) {
            return null;
        }
        mip.setTimeLimit(millis);
        int n = inst.items();
        MPConstraint[] rows = new MPConstraint[n];
        for (int i = 0; i < n; i++) {
            rows[i] = mip.makeConstraint(inst.demand[i], Double.POSITIVE_INFINITY, "d" + i);
        }
        MPConstraint[] stockRows = new MPConstraint[inst.stocks()];
        for (int s = 0; s < inst.stocks(); s++) {
            if (inst.available[s] >= 0) {
                stockRows[s] = mip.makeConstraint(0, inst.available[s], "n" + s);
            }
        }
        MPObjective obj = mip.objective();
        obj.setMinimization();
        MPVariable[] x = new MPVariable[patterns.size()];
        for (int p = 0; p < patterns.size(); p++) {
            int s = stockOf.get(p);
            x[p] = mip.makeIntVar(0, Double.POSITIVE_INFINITY, "x" + p);
            obj.setCoefficient(x[p], inst.stockM[s]);
            int[] a = patterns.get(p);
            for (int i = 0; i < n; i++) {
                if (a[i] > 0) {
                    rows[i].setCoefficient(x[p], a[i]);
                }
            }
            if (stockRows[s] != null) {
                stockRows[s].setCoefficient(x[p], 1);
            }
        }
        MPSolver.ResultStatus st = mip.solve();
        if (st != MPSolver.ResultStatus.OPTIMAL && st != MPSolver.ResultStatus.FEASIBLE) {
            return null;
        }
        int[] counts = new int[patterns.size()];
        for (int p = 0; p < counts.length; p++) {
            counts[p] = (int) Math.round(x[p].solutionValue());
        }
        return counts;
    }
}
