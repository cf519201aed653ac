package org.linemass.app;

import java.nio.file.Path;
import org.linemass.drawing.Drawing;
import org.linemass.engine.error.AnalysisException;
import org.linemass.engine.settings.AnalysisSettings;
import org.linemass.engine.Analyzer;
import org.linemass.engine.field.FieldIntegralResult;
import org.linemass.importer.DxfImporter;
import org.linemass.importer.DxfInputException;
import org.linemass.importer.ImportOptions;

/** Field integration by the engine: read the drawing, then {@link Analyzer#integrateField}. */
public final class EngineFieldIntegrator implements FieldIntegrator {

    @Override
    public Result integrate(Path file, ImportOptions importOptions, AnalysisSettings settings, String expression)
            throws DxfInputException, AnalysisException {
        FieldIntegralResult r;
        try {
            Drawing drawing = DxfImporter.read(file, importOptions);
            r = Analyzer.integrateField(drawing, settings, expression);
        } catch (OutOfMemoryError | StackOverflowError e) {
            throw OutOfResources.of(file, e);
        }
        return new Result(expression,
                r.pieces().stream().map(p -> new Row(p.pieceId(), p.layer(), p.lengthM(), p.value(), p.errorBound()))
                        .toList(),
                r.layers().stream().map(l -> new Row(null, l.layer(), l.lengthM(), l.value(), l.errorBound()))
                        .toList(),
                r.total(), r.totalErrorBound(), r.incompleteReasons());
    }
}
