package org.linemass.app;

import java.nio.file.Path;
import org.linemass.engine.Analyzer;
import org.linemass.engine.error.AnalysisException;
import org.linemass.engine.settings.AnalysisSettings;
import org.linemass.importer.DxfInputException;
import org.linemass.importer.ImportOptions;
import org.linemass.reports.Report;

/** From a drawing file to what the reports print. */
@FunctionalInterface
public interface DrawingPipeline {

    /**
     * Imports and analyses {@code file}.
     *
     * @throws DxfInputException when the file cannot be read as a drawing
     * @throws AnalysisException when the settings or section data make the analysis impossible
     */
    Report analyse(Path file, ImportOptions importOptions, AnalysisSettings settings)
            throws DxfInputException, AnalysisException;

    /**
     * As {@link #analyse(Path, ImportOptions, AnalysisSettings)}, telling {@code watch} as the work
     * moves from stage to stage ("reading the drawing", then the engine's stages); a pipeline without
     * stages of its own tells it nothing.
     */
    default Report analyse(Path file, ImportOptions importOptions, AnalysisSettings settings,
            Analyzer.StageWatch watch) throws DxfInputException, AnalysisException {
        return analyse(file, importOptions, settings);
    }
}
