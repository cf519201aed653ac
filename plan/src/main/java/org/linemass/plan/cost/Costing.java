package org.linemass.plan.cost;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import java.util.TreeMap;
import org.linemass.engine.moments.CompensatedSum;
import org.linemass.engine.result.DrawingResult;
import org.linemass.engine.result.Finding;
import org.linemass.engine.result.FindingKind;
import org.linemass.engine.result.LayerResult;
import org.linemass.engine.result.MarkResult;
import org.linemass.engine.result.SectionUse;
import org.linemass.plan.JobPlan;
import org.linemass.plan.SectionPlan;
import org.linemass.plan.cutting.CutPattern;
import org.linemass.plan.cutting.Demand;

/**
 * Prices a job from a {@link PriceTable}. The rules, in the order a mark is priced:
 * <ul>
 * <li>material: without a cutting plan, the mark's mass times the {@code per_kg} price of its
 * section (or material). With a plan, each planned section's stock is priced first (bars by their
 * {@code per_bar} price for that stock length, coils by {@code per_coil}, either by {@code per_kg}
 * of the mass bought when there is no such price) and each mark cut from it pays a share of that
 * stock cost in proportion to its length in pieces ({@code stock share}), so offcuts and waste are
 * paid for by the pieces that caused them; a mark the plan could not cut is priced by mass;</li>
 * <li>cuts: one cut per piece ({@code per_cut}; common practice for pieces cut to length from
 * stock, no source);</li>
 * <li>bends: the mark's bends times its quantity ({@code per_bend}); no line for a straight mark;</li>
 * <li>welds: per drawing, every crossing and T-junction the analysis found is one weld, priced by
 * the section of the finding's layer ({@code per_weld}).</li>
 * </ul>
 * A price the table lacks gives a line without cost that names the missing price; a mark without
 * a known mass gives a material line saying so. Marks of several drawings are named as in the
 * plan ({@code file:mark}). Stateless.
 */
public final class Costing {

    private final PriceTable prices;
    private final Map<String, String> materials = new HashMap<>();

    private Costing(PriceTable prices, List<DrawingResult> results) {
        this.prices = prices;
        for (DrawingResult r : results) {
            for (SectionUse s : r.sections()) {
                materials.putIfAbsent(s.section(), s.material() == null ? "" : s.material());
            }
        }
    }

    /** The costs of {@code results} priced by {@code prices}; {@code plan} may be null (no plan). */
    public static JobCost of(List<DrawingResult> results, PriceTable prices, JobPlan plan) {
        return new Costing(prices, results).run(results, plan);
    }

    private JobCost run(List<DrawingResult> results, JobPlan plan) {
        List<CostLine> stock = new ArrayList<>();
        Map<String, StockShare> shares = new HashMap<>();
        if (plan != null) {
            for (SectionPlan sp : plan.sections()) {
                shares.put(sp.section(), stockOf(sp, stock));
            }
        }
        boolean multi = results.size() > 1;
        List<CostLine> lines = new ArrayList<>();
        for (DrawingResult r : results) {
            String file = r.drawing().file();
            for (MarkResult m : r.groups()) {
                String mark = multi ? file + ":" + m.mark() : m.mark();
                StockShare share = m.section() == null ? null : shares.get(m.section());
                lines.add(share != null && share.cut().contains(mark) ? share.line(file, m) : material(file, m));
                lines.add(counted(file, m.mark(), m.section(), "cuts", Charge.PER_CUT, m.quantity()));
                if (m.bendsEach() > 0) {
                    lines.add(counted(file, m.mark(), m.section(), "bends", Charge.PER_BEND,
                            (long) m.bendsEach() * m.quantity()));
                }
            }
            lines.addAll(welds(r));
        }
        return new JobCost(lines, stock, prices.currency(), prices.fileName());
    }

    private CostLine material(String file, MarkResult m) {
        if (m.massTotalKg() == null) {
            return new CostLine(file, m.mark(), m.section(), "material", Double.NaN, "kg", null, null, "",
                    "", "mass unknown (no section)");
        }
        Optional<UnitPrice> p = prices.find(Charge.PER_KG, m.section(), material(m.section()), 0);
        return line(file, m.mark(), m.section(), "material", m.massTotalKg(), "kg", p,
                "per_kg for " + name(m.section()));
    }

    private CostLine counted(String file, String mark, String section, String item, Charge charge, long count) {
        return line(file, mark, section, item, count, charge.unit(), prices.find(charge, section, material(section), 0),
                charge.tableName() + " for " + name(section));
    }

    private List<CostLine> welds(DrawingResult r) {
        Map<String, String> sectionOf = new HashMap<>();
        for (LayerResult l : r.layers()) {
            if (l.section() != null) {
                sectionOf.put(l.name(), l.section());
            }
        }
        Map<String, Long> count = new TreeMap<>();
        for (Finding f : r.findings()) {
            if (FindingKind.CROSSING.equals(f.kind()) || FindingKind.T_JUNCTION.equals(f.kind())) {
                count.merge(sectionOf.getOrDefault(f.layer(), ""), 1L, Long::sum);
            }
        }
        List<CostLine> out = new ArrayList<>();
        count.forEach((s, n) -> out.add(counted(r.drawing().file(), "", s.isEmpty() ? null : s, "welds",
                Charge.PER_WELD, n)));
        return out;
    }

    /** Prices the stock of one planned section into {@code out}; returns the share rule for its marks. */
    private StockShare stockOf(SectionPlan sp, List<CostLine> out) {
        String section = sp.section();
        String material = material(section);
        Map<Double, Integer> bars = new TreeMap<>();
        Set<String> cut = new HashSet<>();
        for (CutPattern p : sp.plan().patterns()) {
            bars.merge(p.stockLengthM(), p.bars(), Integer::sum);
            p.pieces().forEach(x -> cut.add(x.mark()));
        }
        sp.plan().uncut().stream().map(Demand::mark).forEach(cut::remove);
        CompensatedSum total = new CompensatedSum();
        boolean known = true;
        for (Map.Entry<Double, Integer> e : bars.entrySet()) {
            boolean coil = sp.stock().coil();
            Charge unit = coil ? Charge.PER_COIL : Charge.PER_BAR;
            Optional<UnitPrice> p = prices.find(unit, section, material, e.getKey());
            CostLine l;
            String what = coil ? "coils" : "bars";
            String name = coil ? "coil" : Math.round(e.getKey() * 1000) + " mm";
            if (p.isPresent()) {
                l = line("", name, section, what, e.getValue(), unit.unit(), p, "");
            } else {
                double kg = e.getKey() * e.getValue() * sp.kgPerM();
                Optional<UnitPrice> kgPrice = Double.isFinite(kg) ? prices.find(Charge.PER_KG, section, material, 0)
                        : Optional.empty();
                l = kgPrice.isPresent() ? line("", name, section, what + " by mass", kg, "kg", kgPrice, "")
                        : line("", name, section, what, e.getValue(), unit.unit(), Optional.empty(),
                                unit.tableName() + " or per_kg for " + section
                                        + (coil ? "" : " (" + Math.round(e.getKey() * 1000) + " mm)"));
            }
            out.add(l);
            if (l.priced()) {
                total.add(l.cost());
            } else {
                known = false;
            }
        }
        return new StockShare(section, known ? total.value() : null, sp.plan().usedLengthM(), cut);
    }

    private CostLine line(String file, String mark, String section, String item, double quantity, String unit,
            Optional<UnitPrice> price, String missing) {
        if (price.isEmpty()) {
            return new CostLine(file, mark, section, item, quantity, unit, null, null, "", "", missing);
        }
        UnitPrice p = price.get();
        double cost = quantity * p.price();
        String formula = Money.quantity(quantity, unit) + " " + Money.plural(quantity, unit) + " x " + Money.price(p.price()) + " = "
                + Money.cost(cost);
        return new CostLine(file, mark, section, item, quantity, unit, p.price(), cost, formula,
                prices.fileName() + " line " + p.line(), null);
    }

    private String material(String section) {
        return section == null ? "" : materials.getOrDefault(section, "");
    }

    private static String name(String section) {
        return section == null ? "pieces without a section" : section;
    }

    /** The stock cost of a planned section (null when a price is missing) shared over its marks by length. */
    private record StockShare(String section, Double stockCost, double usedLengthM, Set<String> cut) {

        CostLine line(String file, MarkResult m) {
            if (stockCost == null || !(usedLengthM > 0)) {
                return new CostLine(file, m.mark(), section, "stock share", m.lengthTotalM(), "m", null, null, "", "",
                        "stock price for " + section);
            }
            double perM = stockCost / usedLengthM;
            double cost = m.lengthTotalM() * perM;
            String formula = Money.quantity(m.lengthTotalM(), "m") + " m x " + Money.cost(stockCost) + " / "
                    + Money.quantity(usedLengthM, "m") + " m = " + Money.cost(cost);
            return new CostLine(file, m.mark(), section, "stock share", m.lengthTotalM(), "m", perM, cost, formula,
                    "stock lines of " + section, null);
        }
    }
}
