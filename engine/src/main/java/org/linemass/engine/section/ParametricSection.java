package org.linemass.engine.section;

import java.util.Locale;
import java.util.Optional;

/**
 * Sections typed as {@code SHAPE:DIMENSIONS:MATERIAL}, dimensions in millimetres joined by
 * {@code x}, material a built-in material id ({@link Materials}) or a density in kg/m^3:
 * <ul>
 * <li>{@code round:12:steel} - round bar or wire, diameter 12 mm</li>
 * <li>{@code tube:42.4x2.6:steel} - round tube, outside diameter 42.4 mm, wall 2.6 mm</li>
 * <li>{@code square:10:aluminium-6061} - square bar 10 mm</li>
 * <li>{@code rect:40x10:steel} - rectangular bar 40 x 10 mm</li>
 * <li>{@code flat:40x5:stainless-304} - flat bar 40 x 5 mm</li>
 * <li>{@code round:6:8500} - round bar 6 mm of a material of density 8500 kg/m^3</li>
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
        String[] dimText = parts[1].toLowerCase(Locale.ROOT).split("x", -1);
        double[] mm = new double[dimText.length];
        for (int i = 0; i < mm.length; i++) {
            try {
                mm[i] = Double.parseDouble(dimText[i].trim());
            } catch (NumberFormatException e) {
                throw new IllegalArgumentException("section " + id + ": dimension '" + dimText[i] + "' is not a number");
            }
        }
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
}
