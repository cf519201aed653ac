package org.linemass.engine.section;

import java.util.Locale;
import java.util.Optional;

/**
 * Sections typed as {@code SHAPE:DIMENSIONS:MATERIAL}, dimensions joined by {@code x} in
 * millimetres, or in inches when followed by {@code in} ({@code mm} may be written too; a unit after
 * the last dimension holds for every dimension written without one, so {@code tube:1.9x0.145in}
 * is in inches throughout; 1 in = 25.4 mm exactly), material a built-in material id
 * ({@link Materials}) or a density in kg/m^3:
 * <ul>
 * <li>{@code round:12:steel} - round bar or wire, diameter 12 mm</li>
 * <li>{@code tube:42.4x2.6:steel} - round tube, outside diameter 42.4 mm, wall 2.6 mm</li>
 * <li>{@code square:10:aluminium-6061} - square bar 10 mm</li>
 * <li>{@code rect:40x10:steel} - rectangular bar 40 x 10 mm</li>
 * <li>{@code flat:40x5:stainless-304} - flat bar 40 x 5 mm</li>
 * <li>{@code round:6:8500} - round bar 6 mm of a material of density 8500 kg/m^3</li>
 * <li>{@code round:0.5in:steel} - round bar half an inch (12.7 mm) across</li>
 * </ul>
 * The mass per metre is density times area ({@link Shape}); the minimum bend radius is unknown.
 */
public final class ParametricSection {

    private ParametricSection() {
    }

    /** True when {@code id} has the parametric form (two colons). */
    public static boolean looksParametric(String id) {
        return id.chars().filter(c -> c == ':').count() == 2;
    }

    /**
     * Parses a parametric id.
     *
     * @return empty when {@code id} is not of the parametric form
     * @throws IllegalArgumentException when it is, but its shape, dimensions or material are wrong
     */
    public static Optional<Section> parse(String id) {
        if (!looksParametric(id)) {
            return Optional.empty();
        }
        String[] parts = id.trim().split(":", -1);
        Shape shape = Shape.parse(parts[0]);
        double[] mm = dimensionsMm(id, parts[1]);
        String matText = parts[2].trim();
        double density;
        String materialName;
        String source;
        Optional<Material> mat = Materials.find(matText);
        if (mat.isPresent()) {
            density = mat.get().densityKgM3();
            materialName = mat.get().id();
            source = "computed from dimensions; density " + Shape.format(density) + " kg/m3: " + mat.get().source();
        } else {
            try {
                density = Double.parseDouble(matText);
            } catch (NumberFormatException e) {
                throw new IllegalArgumentException("section " + id + ": " + Materials.unknownMessage(matText)
                        + ", or give a density in kg/m3");
            }
            if (!(density > 0) || !Double.isFinite(density)) {
                throw new IllegalArgumentException("section " + id + ": density must be positive, got " + matText);
            }
            materialName = "";
            source = "computed from dimensions and the density given in the section id";
        }
        double area;
        try {
            area = shape.areaM2(mm);
        } catch (IllegalArgumentException e) {
            throw new IllegalArgumentException("section " + id + ": " + e.getMessage(), e);
        }
        String description = shape.describe(mm) + (materialName.isEmpty() ? ", " + Shape.format(density) + " kg/m3"
                : ", " + materialName);
        return Optional.of(new Section(id.trim(), description, materialName, density * area, shape.diameterM(mm), null,
                source));
    }

    /** Millimetres per inch, exact by definition (international inch, 1959). */
    private static final double MM_PER_IN = 25.4;

    /** The dimensions of {@code text} ("42.4x2.6", "0.5in", "1.9x0.145in") in millimetres. */
    private static double[] dimensionsMm(String id, String text) {
        String[] dimText = text.toLowerCase(Locale.ROOT).split("x", -1);
        String last = dimText[dimText.length - 1].trim();
        double fallback = last.endsWith("in") ? MM_PER_IN : 1;
        double[] mm = new double[dimText.length];
        for (int i = 0; i < mm.length; i++) {
            String d = dimText[i].trim();
            double factor = fallback;
            if (d.endsWith("in")) {
                factor = MM_PER_IN;
                d = d.substring(0, d.length() - 2).trim();
            } else if (d.endsWith("mm")) {
                factor = 1;
                d = d.substring(0, d.length() - 2).trim();
            }
            try {
                mm[i] = Double.parseDouble(d) * factor;
            } catch (NumberFormatException e) {
                throw new IllegalArgumentException("section " + id + ": dimension '" + dimText[i] + "' is not a number"
                        + " (millimetres, or inches followed by in: 0.5in)");
            }
        }
        return mm;
    }
}
