/**
 * The one-dimensional cutting-stock problem: cut demanded pieces from stock bars of one or more
 * lengths with the least stock bought. {@link org.linemass.plan.cutting.CuttingStockSolver} runs
 * column generation (Gilmore and Gomory, Operations Research 9 (1961) and 11 (1963)): the linear
 * relaxation over cutting patterns is solved with OR-Tools' GLOP, new patterns come from a bounded
 * knapsack priced with its duals, and the final integer plan is solved over the generated patterns
 * with SCIP under a time limit, against a first-fit-decreasing plan, keeping the better. The
 * relaxation's optimum is a proven lower bound once no pattern prices out; the plan reports it and
 * the gap. Coils ({@link org.linemass.plan.cutting.CoilPlanner}) use first-fit decreasing with the
 * material bound.
 */
package org.linemass.plan.cutting;
