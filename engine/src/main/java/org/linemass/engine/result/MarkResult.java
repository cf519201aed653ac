package org.linemass.engine.result;

import java.util.List;

/**
 * A group of identical pieces (same section, congruent shape): the mark printed on the bill of
 * materials, how many, and length/mass each and in total (mass null without a section).
 */
public record MarkResult(String mark, int quantity, String layer, String section, String material,
        double lengthEachM, Double massEachKg, double lengthTotalM, Double massTotalKg, int bendsEach,
        List<Integer> pieceIds) {

    public MarkResult {
        pieceIds = List.copyOf(pieceIds);
    }
}
