package org.linemass.importer;

import java.util.Optional;
import org.linemass.drawing.LengthUnit;

/**
 * Choices and resource limits for one import. {@code unitOverride} replaces the file's
 * $INSUNITS; the limits bound memory and time on hostile files (each documented in the README).
 *
 * @param unitOverride drawing unit chosen by the user, if any
 * @param maxBlockDepth deepest allowed nesting of block inserts
 * @param maxLineBytes longest allowed text line in an ASCII file
 * @param maxControlPoints largest allowed control-point or knot count of one SPLINE
 * @param maxVertices largest allowed vertex count of one polyline
 */
public record ImportOptions(Optional<LengthUnit> unitOverride, int maxBlockDepth, int maxLineBytes,
        int maxControlPoints, int maxVertices) {

    public static final ImportOptions DEFAULTS =
            new ImportOptions(Optional.empty(), 64, 1 << 20, 1_000_000, 10_000_000);

    public ImportOptions withUnit(LengthUnit unit) {
        return new ImportOptions(Optional.ofNullable(unit), maxBlockDepth, maxLineBytes, maxControlPoints,
                maxVertices);
    }
}
