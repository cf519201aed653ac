package org.linemass.importer.parse;

import java.util.Objects;
import java.util.Optional;
import org.linemass.drawing.LengthUnit;

/**
 * What the reading needs of the import options (the front door copies them in, so this package
 * needs nothing from it): the unit chosen by the user, the deepest block nesting, the largest
 * spline point and polyline vertex counts, and which optional content to read (paper space,
 * invisible entities, 3DFACE edges, MLINE and LEADER paths). The limits were checked when the
 * options were built.
 */
public record ReadSettings(Optional<LengthUnit> unitOverride, int maxBlockDepth, int maxControlPoints,
        int maxVertices, boolean paperSpace, boolean invisible, boolean faceEdges, boolean mlinesAndLeaders) {

    public ReadSettings {
        Objects.requireNonNull(unitOverride, "unitOverride");
    }
}
