package org.linemass.reports.plan;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import java.util.stream.Collectors;
import org.linemass.plan.JobPlan;
import org.linemass.plan.SectionPlan;
import org.linemass.plan.Unplanned;
import org.linemass.plan.cutting.CutPattern;
import org.linemass.plan.cutting.CutPlan;
import org.linemass.plan.cutting.Demand;
import org.linemass.reports.UnitSystem;
import org.linemass.reports.plan.PlanTable.Num;

/**
 * The three tables of a job plan: the cutting patterns (one row per pattern: section, stock
 * length, bars, pieces by mark, offcut and whether it is kept), the order list (per section and
 * stock length or coil: count, length, mass) and the summary (per section: bars, stock bought and
 * used, masses, waste, reusable offcuts, lower bound, gap, method, solver time, notes), followed
 * by rows for pieces that fit no stock or were not planned, so the piece counts add up to the bill.
 */
public final class PlanTables {

    private final UnitSystem u;

    public PlanTables(UnitSystem units) {
        this.u = units;
    }

    public PlanTable patterns(JobPlan job) {
        List<List<Object>> rows = new ArrayList<>();
        for (SectionPlan sp : job.sections()) {
            for (CutPattern p : sp.plan().patterns()) {
                String pieces = p.pieces().stream().map(x -> x.count() + " x " + x.mark() + " ("
                        + u.shortLength(x.lengthM()) + " " + u.shortUnit() + ")").collect(Collectors.joining("; "));
                rows.add(row(sp.section(), stockName(sp, p.stockLengthM()), (long) p.bars(), (long) p.piecesPerBar(),
                        pieces, shortNum(p.offcutM()), p.offcutReusable() ? "keep" : "waste"));
            }
            for (Demand d : sp.plan().uncut()) {
                rows.add(row(sp.section(), "none long enough", null, null, d.quantity() + " x " + d.mark() + " ("
                        + u.shortLength(d.lengthM()) + " " + u.shortUnit() + ")", null, "not cut: join or buy longer"));
            }
        }
        for (Unplanned x : job.unplanned()) {
            rows.add(row(x.section(), "", null, null, x.quantity() + " x " + x.mark(), null, "not planned: " + x.reason()));
        }
        return new PlanTable("cutting plan", List.of("section", "stock", "bars", "pieces per bar", "pieces",
                "offcut [" + u.shortUnit() + "]", "offcut use"), rows);
    }

    public PlanTable order(JobPlan job) {
        List<List<Object>> rows = new ArrayList<>();
        for (SectionPlan sp : job.sections()) {
            Map<Double, Integer> bars = new TreeMap<>();
            for (CutPattern p : sp.plan().patterns()) {
                bars.merge(p.stockLengthM(), p.bars(), Integer::sum);
            }
            for (Map.Entry<Double, Integer> e : bars.entrySet()) {
                double len = e.getKey() * e.getValue();
                rows.add(row(sp.section(), stockName(sp, e.getKey()), (long) e.getValue(),
                        sp.stock().coil() ? "coil" : "bar", longNum(len), massNum(len * sp.kgPerM())));
            }
        }
        return new PlanTable("order list", List.of("section", "stock", "count", "unit", "length [" + u.longUnit() + "]",
                "mass [" + u.massUnit() + "]"), rows);
    }

    public PlanTable summary(JobPlan job) {
        List<List<Object>> rows = new ArrayList<>();
        for (SectionPlan sp : job.sections()) {
            CutPlan p = sp.plan();
            rows.add(row(sp.section(), (long) p.bars(), (long) p.piecesCut(), longNum(p.boughtLengthM()),
                    longNum(p.usedLengthM()), massNum(sp.massBoughtKg()), massNum(sp.massUsedKg()),
                    new Num(100 * p.wasteShare(), 2), longNum(p.reusableOffcutM()), longNum(p.lowerBoundM()),
                    new Num(100 * p.gap(), 2), p.boundProven() ? "yes" : "no: Lagrangian bound", p.method(),
                    p.solveMillis(), String.join("; ", p.notes())));
        }
        return new PlanTable("plan summary", List.of("section", "bars or coils", "pieces cut",
                "bought [" + u.longUnit() + "]", "used [" + u.longUnit() + "]", "mass bought [" + u.massUnit() + "]",
                "mass used [" + u.massUnit() + "]", "waste [%]", "reusable offcuts [" + u.longUnit() + "]",
                "lower bound [" + u.longUnit() + "]", "gap [%]", "relaxation solved", "method", "solver time [ms]", "notes"),
                rows);
    }

    private String stockName(SectionPlan sp, double lengthM) {
        if (sp.stock().coil()) {
            return "coil " + UnitSystem.fixed(u.inMassUnit(sp.stock().coilKg()), 1) + " " + u.massUnit();
        }
        return u.shortLength(lengthM) + " " + u.shortUnit();
    }

    private Num shortNum(double m) {
        return new Num(u.inShortUnit(m), u.shortDecimals());
    }

    private Num longNum(double m) {
        return new Num(u.inLongUnit(m), u.longDecimals());
    }

    private Num massNum(double kg) {
        return Double.isFinite(kg) ? new Num(u.inMassUnit(kg), u.massDecimals()) : null;
    }

    private static List<Object> row(Object... cells) {
        List<Object> r = new ArrayList<>();
        java.util.Collections.addAll(r, cells);
        return r;
    }
}
