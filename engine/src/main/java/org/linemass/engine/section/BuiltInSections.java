package org.linemass.engine.section;

import java.util.ArrayList;
import java.util.List;

/**
 * The built-in section table, read from the CSV resources beside this class, every row with its
 * source: metric reinforcing bar {@code RB6}-{@code RB50} (BS 4449 / EN 10080 nominal masses,
 * minimum bend radius from EN 1992-1-1 Table 8.1N), US bar {@code A615-3}-{@code A615-18} (ASTM
 * A615 lb/ft converted exactly, bend radius from ACI 318), AWG round wire {@code AWG12-CU},
 * {@code AWG4-AL} ... (ASTM B258 diameter formula, copper 8890 and aluminium 1350 2705 kg/m^3) and
 * plain round steel wire {@code SW0.5}-{@code SW12.0}. Parametric sections are not rows: see
 * {@link ParametricSection}. Loaded once; immutable and thread-safe.
 */
public final class BuiltInSections {

    /** Metres per foot and kilograms per pound (exact, 1959 international agreement). */
    static final double FOOT_M = 0.3048;
    static final double POUND_KG = 0.45359237;
    static final double INCH_M = 0.0254;

    private static final List<Section> ROWS = load();
    private static final SectionTable TABLE = SectionTable.of(ROWS);

    private BuiltInSections() {
    }

    /** The built-in rows as a table. */
    public static SectionTable table() {
        return TABLE;
    }

    /** The built-in rows in table order (for listing with their sources). */
    public static List<Section> rows() {
        return ROWS;
    }

    /** AWG diameter in millimetres, ASTM B258: d = 0.127 mm 92^((36 - n)/39); "00" is n = -1 and so on. */
    public static double awgDiameterMm(String gauge) {
        int n;
        if (gauge.matches("0{2,4}")) {
            n = 1 - gauge.length();
        } else {
            n = Integer.parseInt(gauge);
        }
        return 0.127 * Math.pow(92, (36 - n) / 39.0);
    }

    private static List<Section> load() {
        List<Section> out = new ArrayList<>();
        for (CsvRows.Row r : Materials.Resources.csv("rebar-en.csv").rows()) {
            double d = r.positive("diameter_mm");
            out.add(new Section(r.require("section"), "reinforcing bar " + Shape.format(d) + " mm", "steel",
                    r.positive("mass_kg_per_m"), d / 1000, r.positive("min_bend_radius_mm") / 1000,
                    r.require("source")));
        }
        for (CsvRows.Row r : Materials.Resources.csv("rebar-astm.csv").rows()) {
            double din = r.positive("diameter_in");
            out.add(new Section(r.require("section"), "reinforcing bar " + r.require("bar"), "steel",
                    r.positive("lb_per_ft") * POUND_KG / FOOT_M, din * INCH_M,
                    r.positive("bend_radius_db") * din * INCH_M, r.require("source")));
        }
        for (CsvRows.Row r : Materials.Resources.csv("awg.csv").rows()) {
            String gauge = r.require("gauge");
            Material m = material(r.require("material"));
            double d = awgDiameterMm(gauge);
            out.add(new Section(r.require("section"), "AWG " + gauge + " round wire (" + String.format(
                    java.util.Locale.ROOT, "%.4f", d) + " mm), " + m.id(), m.id(),
                    m.densityKgM3() * Shape.ROUND.areaM2(new double[] {d}), d / 1000, null, source(r, m)));
        }
        for (CsvRows.Row r : Materials.Resources.csv("wire-steel.csv").rows()) {
            double d = r.positive("diameter_mm");
            Material m = material(r.require("material"));
            out.add(new Section(r.require("section"), "round wire " + Shape.format(d) + " mm, " + m.id(), m.id(),
                    m.densityKgM3() * Shape.ROUND.areaM2(new double[] {d}), d / 1000, null, source(r, m)));
        }
        return List.copyOf(out);
    }

    /**
     * The row's source with the table's internal pointer "materials.csv ID" replaced by what it
     * points at: the density and the material row's own source, so a listing shows sources only.
     */
    private static String source(CsvRows.Row r, Material m) {
        String pointer = "materials.csv " + m.id();
        return r.require("source").replace(pointer,
                Shape.format(m.densityKgM3()) + " kg/m3 for " + m.id() + " (" + m.source() + ")");
    }

    private static Material material(String id) {
        return Materials.find(id).orElseThrow(() -> new IllegalStateException("built-in table names unknown material "
                + id));
    }
}
