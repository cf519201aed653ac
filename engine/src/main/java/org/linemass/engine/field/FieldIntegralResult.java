package org.linemass.engine.field;

import java.util.List;

/**
 * The line integral of one user expression over a drawing: per piece, per layer (layers by name,
 * pieces by id) and in total, each with a bound on its absolute error. {@code incompleteReasons} is
 * empty when every counted entity was integrated; otherwise it says what was left out (e.g. too many
 * segments to form pieces), and printers must show it.
 */
public record FieldIntegralResult(String file, String expression, List<PieceValue> pieces,
        List<LayerValue> layers, double total, double totalErrorBound, List<String> incompleteReasons) {

    public FieldIntegralResult {
        pieces = List.copyOf(pieces);
        layers = List.copyOf(layers);
        incompleteReasons = List.copyOf(incompleteReasons);
    }

    public boolean complete() {
        return incompleteReasons.isEmpty();
    }
}
