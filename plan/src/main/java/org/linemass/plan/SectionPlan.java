package org.linemass.plan;

import org.linemass.plan.cutting.CutPlan;
import org.linemass.plan.stock.SectionStock;

/**
 * The plan of one section: its stock, its linear density (kg/m, from the drawing's section data)
 * and the cutting plan. For coils, every plan "bar" is one coil of {@code stock.coilKg()}.
 */
public record SectionPlan(String section, double kgPerM, SectionStock stock, CutPlan plan) {

    /** Mass bought, kg. */
    public double massBoughtKg() {
        return plan.boughtLengthM() * kgPerM;
    }

    /** Mass in the pieces cut, kg. */
    public double massUsedKg() {
        return plan.usedLengthM() * kgPerM;
    }
}
