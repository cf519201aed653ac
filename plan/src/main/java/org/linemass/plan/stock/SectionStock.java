package org.linemass.plan.stock;

import java.util.List;

/**
 * The stock of one section (or of every section matching {@code sectionPattern}, a glob with
 * {@code *}): bars of the given lengths, or coils of {@code coilKg} kilograms for wire (then
 * {@code lengths} is empty); {@code kerfM} is taken from the bar at every cut (saw kerf or cut
 * allowance); an offcut at least {@code minOffcutM} long is kept as stock, a shorter one is waste.
 */
public record SectionStock(String sectionPattern, List<StockLength> lengths, double kerfM, double minOffcutM,
        Double coilKg) {

    public SectionStock {
        lengths = List.copyOf(lengths);
        if (kerfM < 0 || minOffcutM < 0 || !Double.isFinite(kerfM) || !Double.isFinite(minOffcutM)) {
            throw new IllegalArgumentException("kerf and minimum offcut must be finite and not negative, got "
                    + kerfM + " m and " + minOffcutM + " m");
        }
        if (coilKg != null && !(coilKg > 0 && Double.isFinite(coilKg))) {
            throw new IllegalArgumentException("coil mass must be positive, got " + coilKg + " kg");
        }
        if (lengths.isEmpty() == (coilKg == null)) {
            throw new IllegalArgumentException("stock of " + sectionPattern
                    + " needs either stock lengths or a coil mass, not both or neither");
        }
    }

    /** True when this is wire bought in coils by mass. */
    public boolean coil() {
        return coilKg != null;
    }
}
