package org.linemass.reports.html;

import org.linemass.engine.result.PieceForm;
import org.linemass.engine.shape.BendLimit;
import org.linemass.reports.UnitSystem;

/**
 * One sentence on a piece's minimum inside bend radius for the bender data: the radius and its basis
 * and how many bends are below it, or that none is known and the bends were not checked.
 */
final class BendLimitText {

    private BendLimitText() {
    }

    static String of(PieceForm f) {
        BendLimit l = f.limit();
        if (!l.known()) {
            return "Minimum inside bend radius: none known (" + l.basis() + ").";
        }
        long below = f.bendsBelowLimit();
        return "Minimum inside bend radius " + UnitSystem.fixed(l.insideRadiusM() * 1000, 1) + " mm (" + l.basis()
                + "): " + (below == 0 ? "no bend below it." : below + (below == 1 ? " bend" : " bends") + " below it.");
    }
}
