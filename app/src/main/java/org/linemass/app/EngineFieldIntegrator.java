package org.linemass.app;

import java.nio.file.Path;
import org.linemass.engine.AnalysisException;
import org.linemass.engine.AnalysisSettings;
import org.linemass.importer.ImportOptions;

/**
 * Integration seam: the engine's field integration is connected here at merge time. Until then it
 * answers with a one-line AnalysisException.
 */
public final class EngineFieldIntegrator implements FieldIntegrator {

    @Override
    public Result integrate(Path file, ImportOptions importOptions, AnalysisSettings settings, String expression)
            throws AnalysisException {
        throw new AnalysisException(file + ": field integration is not available in this build");
    }
}
