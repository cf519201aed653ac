package org.linemass.importer;

import java.util.Objects;
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
 * @param paperSpace read paper-space entities as well, into model space (by default only model
 *     space counts and paper-space entities are only counted)
 * @param invisible read invisible entities (group 60 = 1) as well; by default they are left out and
 *     counted, as no CAD program draws them (dynamic-block states are stored this way)
 * @param faceEdges read the visible edges of 3DFACE entities as wire (wireframe models written as
 *     faces); by default faces are listed per layer as material that was not weighed
 * @param mlinesAndLeaders read MLINE element lines and LEADER paths as wire; by default these
 *     drafting entities (walls drawn as double lines, arrows to notes) are counted, not weighed
 * @throws IllegalArgumentException when a limit is below its minimum (depth 0, the others 1)
 */
public record ImportOptions(Optional<LengthUnit> unitOverride, int maxBlockDepth, int maxLineBytes,
        int maxControlPoints, int maxVertices, boolean paperSpace, boolean invisible, boolean faceEdges,
        boolean mlinesAndLeaders) {

    public static final ImportOptions DEFAULTS =
            new ImportOptions(Optional.empty(), 64, 1 << 20, 1_000_000, 10_000_000);

    /** Model space only, with the given unit override and limits. */
    public ImportOptions(Optional<LengthUnit> unitOverride, int maxBlockDepth, int maxLineBytes, int maxControlPoints,
            int maxVertices) {
        this(unitOverride, maxBlockDepth, maxLineBytes, maxControlPoints, maxVertices, false);
    }

    /** Invisible entities and face edges left out, paper space as given. */
    public ImportOptions(Optional<LengthUnit> unitOverride, int maxBlockDepth, int maxLineBytes, int maxControlPoints,
            int maxVertices, boolean paperSpace) {
        this(unitOverride, maxBlockDepth, maxLineBytes, maxControlPoints, maxVertices, paperSpace, false, false, false);
    }

    public ImportOptions {
        Objects.requireNonNull(unitOverride, "unitOverride");

        if (maxBlockDepth < 0 || maxLineBytes < 1 || maxControlPoints < 1 || maxVertices < 1) {
            throw new IllegalArgumentException("import limits out of range: maxBlockDepth=" + maxBlockDepth
                    + " (at least 0), maxLineBytes=" + maxLineBytes + ", maxControlPoints=" + maxControlPoints
                    + ", maxVertices=" + maxVertices + " (each at least 1)");
        }
    }

    public ImportOptions withUnit(LengthUnit unit) {
        return new ImportOptions(Optional.ofNullable(unit), maxBlockDepth, maxLineBytes, maxControlPoints,
                maxVertices, paperSpace, invisible, faceEdges, mlinesAndLeaders);
    }

    /** These options, reading paper space as well ({@code true}) or model space only. */
    public ImportOptions withPaperSpace(boolean read) {
        return new ImportOptions(unitOverride, maxBlockDepth, maxLineBytes, maxControlPoints, maxVertices, read,
                invisible, faceEdges, mlinesAndLeaders);
    }

    /** These options, reading invisible entities (group 60 = 1) as well ({@code true}) or leaving them out. */
    public ImportOptions withInvisible(boolean read) {
        return new ImportOptions(unitOverride, maxBlockDepth, maxLineBytes, maxControlPoints, maxVertices, paperSpace,
                read, faceEdges, mlinesAndLeaders);
    }

    /** These options, reading 3DFACE edges as wire ({@code true}) or listing faces as not weighed. */
    public ImportOptions withFaceEdges(boolean read) {
        return new ImportOptions(unitOverride, maxBlockDepth, maxLineBytes, maxControlPoints, maxVertices, paperSpace,
                invisible, read, mlinesAndLeaders);
    }

    /** These options, reading MLINE element lines and LEADER paths as wire ({@code true}) or only counting them. */
    public ImportOptions withMlinesAndLeaders(boolean read) {
        return new ImportOptions(unitOverride, maxBlockDepth, maxLineBytes, maxControlPoints, maxVertices, paperSpace,
                invisible, faceEdges, read);
    }

}
