package org.linemass.engine.pieces.checks;

import java.util.ArrayList;
import java.util.List;
import org.linemass.engine.result.Bend;
import org.linemass.engine.result.Finding;
import org.linemass.engine.result.FindingKind;
import org.linemass.engine.result.Severity;
import org.linemass.engine.section.Section;
import org.linemass.geometry.Provenance;

/**
 * Bend findings for one piece on a section with a minimum inside bend radius: {@code tight_bend}
 * (warning) where an arc's inside radius is below it, {@code sharp_corner} (warning) at every
 * corner without a radius. Nothing when the section has no minimum radius.
 */
public final class BendCheck {

    private BendCheck() {
    }

    public static List<Finding> check(String layer, List<BendFinder.Located> bends, Section section) {
        List<Finding> out = new ArrayList<>();
        if (section == null || section.minBendRadiusM() == null) {
            return out;
        }
        double min = section.minBendRadiusM();
        for (BendFinder.Located located : bends) {
            Bend b = located.bend();
            List<Provenance> sources = located.sources();
            if (b.insideRadiusM() == null) {
                out.add(Findings.of(FindingKind.SHARP_CORNER, Severity.WARNING, b.atM(), null, layer, sources, null,
                        "Sharp corner of " + Findings.deg(b.angleDeg()) + " with no radius on section "
                                + section.id() + ", whose minimum inside bend radius is " + Findings.mm(min)
                                + "; draw the bend with its radius."));
            } else if (b.insideRadiusM() < min) {
                out.add(Findings.of(FindingKind.TIGHT_BEND, Severity.WARNING, b.atM(), b.insideRadiusM(), layer,
                        sources, null, "Bend of " + Findings.deg(b.angleDeg()) + " has an inside radius of "
                                + Findings.mm(b.insideRadiusM()) + ", below the minimum "
                                + Findings.mm(min) + " for section " + section.id() + "."));
            }
        }
        return out;
    }
}
