package org.linemass.plan;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.TreeMap;
import org.linemass.engine.result.DrawingResult;
import org.linemass.engine.result.MarkResult;
import org.linemass.engine.result.SectionUse;
import org.linemass.plan.cutting.CoilPlanner;
import org.linemass.plan.cutting.CuttingStockSolver;
import org.linemass.plan.cutting.CutProblem;
import org.linemass.plan.cutting.CutSettings;
import org.linemass.plan.cutting.Demand;
import org.linemass.plan.stock.SectionStock;
import org.linemass.plan.stock.StockTable;

/**
 * Plans a job: the marks of every drawing (named {@code file:mark} when there are several
 * drawings, so equal marks of different drawings stay apart) are grouped by section; each section
 * with a stock row is cut from bars by {@link CuttingStockSolver} or from coils by
 * {@link CoilPlanner}; marks without a section or without stock are listed as unplanned with the
 * reason. A piece's cut length is its centre-line length, as on the bill.
 */
public final class JobPlanner {

    private JobPlanner() {
    }

    public static JobPlan plan(List<DrawingResult> results, StockTable stock, CutSettings settings) {
        boolean multi = results.size() > 1;
        Map<String, Map<String, Demand>> bySection = new TreeMap<>();
        Map<String, Double> kgPerM = new TreeMap<>();
        List<Unplanned> unplanned = new ArrayList<>();
        for (DrawingResult r : results) {
            for (SectionUse s : r.sections()) {
                kgPerM.putIfAbsent(s.section(), s.kgPerM());
            }
            for (MarkResult m : r.groups()) {
                String mark = multi ? r.drawing().file() + ":" + m.mark() : m.mark();
                if (m.section() == null) {
                    unplanned.add(new Unplanned(null, mark, m.quantity(), "no section"));
                    continue;
                }
                Map<String, Demand> marks = bySection.computeIfAbsent(m.section(), k -> new LinkedHashMap<>());
                Demand old = marks.get(mark);
                marks.put(mark, new Demand(mark, m.lengthEachM(), m.quantity() + (old == null ? 0 : old.quantity())));
            }
        }
        List<SectionPlan> plans = new ArrayList<>();
        for (Map.Entry<String, Map<String, Demand>> e : bySection.entrySet()) {
            String section = e.getKey();
            List<Demand> demands = List.copyOf(e.getValue().values());
            Optional<SectionStock> st = stock.forSection(section);
            Double density = kgPerM.get(section);
            if (st.isEmpty()) {
                demands.forEach(d -> unplanned.add(new Unplanned(section, d.mark(), d.quantity(),
                        "no stock given for this section")));
                continue;
            }
            SectionStock s = st.get();
            if (s.coil() && (density == null || !(density > 0))) {
                demands.forEach(d -> unplanned.add(new Unplanned(section, d.mark(), d.quantity(),
                        "coils need the section's mass per metre, which is not known")));
                continue;
            }
            var plan = s.coil()
                    ? CoilPlanner.solve(section, demands, s.coilKg(), density, s.kerfM(), settings)
                    : CuttingStockSolver.solve(new CutProblem(section, demands, s.lengths(), s.kerfM(), s.minOffcutM()),
                            settings);
            plans.add(new SectionPlan(section, density == null ? Double.NaN : density, s, plan));
        }
        return new JobPlan(plans, unplanned);
    }
}
