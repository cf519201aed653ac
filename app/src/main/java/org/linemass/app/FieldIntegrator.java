package org.linemass.app;

import java.nio.file.Path;
import java.util.List;
import org.linemass.engine.error.AnalysisException;
import org.linemass.engine.settings.AnalysisSettings;
import org.linemass.importer.DxfInputException;
import org.linemass.importer.ImportOptions;

/** Line integrals of a user expression along the wires of a drawing. */
@FunctionalInterface
public interface FieldIntegrator {

    /** One value: a piece (id set) or a whole layer (id null), its length, and the value's absolute error bound. */
    record Row(Integer pieceId, String layer, double lengthM, double value, double errorBound) {
    }

    /**
     * The integral per piece and per layer and in total, in SI units (coordinates and s in metres);
     * {@code incompleteReasons} says what was left out, empty when nothing was.
     */
    record Result(String expression, List<Row> pieces, List<Row> layers, double total, double totalErrorBound,
            List<String> incompleteReasons) {
        public Result {
            pieces = List.copyOf(pieces);
            layers = List.copyOf(layers);
            incompleteReasons = List.copyOf(incompleteReasons);
        }
    }

    /**
     * Integrates {@code expression} (in x, y, z and arc length s, metres) along every counted
     * wire of {@code file}.
     */
    Result integrate(Path file, ImportOptions importOptions, AnalysisSettings settings, String expression)
            throws DxfInputException, AnalysisException;
}
