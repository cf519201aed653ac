package org.linemass.drawing;

import org.linemass.geometry.Affine;
import org.linemass.geometry.Provenance;
import org.linemass.geometry.Vec3;

/**
 * One INSERT: a reference to block {@code blockName} placed by {@code placement} (block definition
 * coordinates, base point already subtracted, to the coordinates of the owner), repeated as a
 * {@code columns x rows} array whose copy (i, j) is additionally shifted by
 * {@code i * columnStep + j * rowStep} (owner coordinates; rotated with the insert, not scaled).
 * {@code source.layer()} is the insert's own layer, which entities on layer 0 inside the block take.
 */
public record Insert(String blockName, Affine placement, int columns, int rows, Vec3 columnStep,
        Vec3 rowStep, Provenance source) {

    public Insert {
        if (columns < 1 || rows < 1) {
            throw new IllegalArgumentException("insert array counts must be at least 1, got "
                    + columns + " x " + rows);
        }
    }

    public static Insert single(String blockName, Affine placement, Provenance source) {
        return new Insert(blockName, placement, 1, 1, Vec3.ZERO, Vec3.ZERO, source);
    }

    /** Number of copies this insert places: columns times rows (may exceed int range). */
    public long copies() {
        return (long) columns * rows;
    }

    /** The placement of copy (column i, row j). */
    public Affine placement(int i, int j) {
        if (i == 0 && j == 0) {
            return placement;
        }
        Vec3 shift = columnStep.times(i).plus(rowStep.times(j));
        return placement.andThen(Affine.translation(shift));
    }
}
