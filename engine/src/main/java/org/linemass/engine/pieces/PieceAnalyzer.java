package org.linemass.engine.pieces;

import java.util.List;
import org.linemass.engine.Tolerances;
import org.linemass.geometry.Segment;

/** Joins world segments into pieces, checks the drawing and groups identical pieces. */
public final class PieceAnalyzer {

    private PieceAnalyzer() {
    }

    /**
     * @param world segments in world coordinates and metres, layer in each provenance
     */
    public static PieceAnalysis analyze(List<Segment> world, Tolerances tol, SectionLookup sections,
            boolean mirrorGrouping) {
        throw new UnsupportedOperationException("pieces not written yet");
    }
}
