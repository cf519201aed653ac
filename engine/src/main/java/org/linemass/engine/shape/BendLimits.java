package org.linemass.engine.shape;

import java.util.Locale;
import java.util.OptionalDouble;
import org.linemass.engine.section.Section;

/**
 * The {@link BendLimit} of a section, first match wins:
 * <ol>
 * <li>the section's own minimum inside bend radius (a section table's {@code min_bend_radius_mm}, or a
 * built-in reinforcing-bar row: BS 8666:2005 Table 2, ACI 318 for US bars);</li>
 * <li>a round section of a BS 8666:2005 Table 2 bar size: that table's radius (team reference sheet
 * 6.1, verified);</li>
 * <li>a round tube (a section whose id or description names a tube): inside radius 1.5 times the
 * outside diameter, i.e. a centre-line radius of 2 OD. Common practice, no source (from memory: a
 * tube bent without a mandrel; tighter bends need a mandrel and the tooling maker's data). For
 * comparison, ASTM A53/A53M-20 7.2 (reference sheet 6.1, verified) requires pipe up to NPS 2 to take a
 * cold 90 degree bend round a mandrel of 12 OD;</li>
 * <li>any other round section (wire, round bar): inside radius one diameter. Common practice, no
 * source (reference sheet 6.2: about 1 d for annealed wire; hard-drawn steel 1.5 to 2 d, spring wire 2
 * to 3 d or the maker's advice);</li>
 * <li>otherwise none: no section, or a square, rectangular or flat section.</li>
 * </ol>
 */
public final class BendLimits {

    /** Inside radius of a tube, in outside diameters (common practice, no source). */
    static final double TUBE_INSIDE_OD = 1.5;
    /** Inside radius of wire and round bar, in diameters (common practice, no source; reference sheet 6.2). */
    static final double WIRE_INSIDE_D = 1.0;

    private BendLimits() {
    }

    /** The limit for {@code section} (null: the piece has no section). */
    public static BendLimit of(Section section) {
        if (section == null) {
            return BendLimit.none("no section: no minimum bend radius known, bends not checked");
        }
        if (section.minBendRadiusM() != null) {
            return new BendLimit(section.minBendRadiusM(), d0(section), "the section's own minimum; section source: " + section.source());
        }
        Double d = section.diameterM();
        if (d == null || !(d > 0)) {
            return BendLimit.none("no minimum bend radius known for section " + section.id()
                    + " (not round): bends not checked");
        }
        OptionalDouble table = MinimumRadius.forDiameterM(d);
        if (table.isPresent()) {
            return new BendLimit(table.getAsDouble(), d, "BS 8666:2005 Table 2");
        }
        if (isTube(section)) {
            return new BendLimit(TUBE_INSIDE_OD * d, d, "common practice, no source: tube inside radius 1.5 OD"
                    + " (centre-line 2 OD, no mandrel)");
        }
        return new BendLimit(WIRE_INSIDE_D * d, d, "common practice, no source: wire inside radius 1 d (annealed;"
                + " hard-drawn 1.5-2 d, spring wire 2-3 d)");
    }

    private static double d0(Section s) {
        return s.diameterM() == null || !(s.diameterM() > 0) ? 0 : s.diameterM();
    }

    private static boolean isTube(Section s) {
        String id = s.id().toLowerCase(Locale.ROOT);
        String desc = s.description() == null ? "" : s.description().toLowerCase(Locale.ROOT);
        return id.startsWith("tube") || desc.contains("tube") || desc.contains("pipe");
    }
}
