package org.linemass.app;

import java.nio.file.Path;
import org.linemass.engine.AnalysisException;
import org.linemass.engine.AnalysisSettings;
import org.linemass.importer.ImportOptions;

/**
 * Integration seam: the engine's field integration is connected here at merge time. Until then it
 * answers with a one-line AnalysisException. At merge the body becomes: read the drawing with
 * {@code DxfImporter.read(file, importOptions)}, call
 * {@code Analyzer.integrateField(drawing, settings, expression)} and map its
 * {@code PieceValue(pieceId, layer, lengthM, value, errorBound)} and
 * {@code LayerValue(layer, pieces, lengthM, value, errorBound)} rows, total, total error bound and
 * incomplete reasons onto {@link FieldIntegrator.Result} (the method then also declares
 * {@code DxfInputException}).
 */
public final class EngineFieldIntegrator implements FieldIntegrator {

    @Override
    public Result integrate(Path file, ImportOptions importOptions, AnalysisSettings settings, String expression)
            throws AnalysisException {
        throw new AnalysisException(file + ": field integration is not available in this build");
    }
}
