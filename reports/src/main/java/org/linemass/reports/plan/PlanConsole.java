package org.linemass.reports.plan;

import java.io.PrintWriter;
import org.linemass.plan.JobPlan;
import org.linemass.plan.SectionPlan;
import org.linemass.plan.Unplanned;
import org.linemass.plan.cutting.CutPlan;
import org.linemass.reports.UnitSystem;

/** A few lines of the plan for the terminal: per section bars, bought and used, waste, bound and gap. */
public final class PlanConsole {

    private PlanConsole() {
    }

    public static void print(JobPlan job, UnitSystem u, PrintWriter out) {
        out.println("cutting plan:");
        for (SectionPlan sp : job.sections()) {
            CutPlan p = sp.plan();
            out.println("  " + sp.section() + ": " + p.bars() + (sp.stock().coil() ? " coils" : " bars") + ", bought "
                    + u.longLength(p.boughtLengthM()) + " " + u.longUnit() + " (" + mass(u, sp.massBoughtKg()) + "), used "
                    + u.longLength(p.usedLengthM()) + " " + u.longUnit() + ", waste "
                    + UnitSystem.fixed(100 * p.wasteShare(), 1) + " %, lower bound "
                    + u.longLength(p.lowerBoundM()) + " " + u.longUnit() + ", gap " + UnitSystem.fixed(100 * p.gap(), 2)
                    + " %" + (p.boundProven() ? "" : " (Lagrangian bound)") + ", " + p.solveMillis() + " ms");
            if (!p.uncut().isEmpty()) {
                out.println("    " + p.uncut().stream().mapToInt(d -> d.quantity()).sum()
                        + " pieces longer than any stock: not cut");
            }
            p.notes().forEach(n -> out.println("    note: " + n));
        }
        int left = job.unplanned().stream().mapToInt(Unplanned::quantity).sum();
        if (left > 0) {
            out.println("  " + left + " pieces not planned (no section or no stock): see the cutting plan report");
        }
        out.println("  total bought " + mass(u, job.massBoughtKg()) + ", in pieces " + mass(u, job.massUsedKg()));
        out.flush();
    }

    private static String mass(UnitSystem u, double kg) {
        return Double.isFinite(kg) ? u.mass(kg) + " " + u.massUnit() : "mass unknown";
    }
}
