package org.linemass.app;

import java.nio.file.Path;
import org.linemass.drawing.Drawing;
import org.linemass.engine.Analyzer;
import org.linemass.engine.error.AnalysisException;
import org.linemass.engine.settings.AnalysisSettings;
import org.linemass.importer.DxfImporter;
import org.linemass.importer.DxfInputException;
import org.linemass.importer.ImportOptions;
import org.linemass.reports.Report;

/**
 * The real pipeline: {@link DxfImporter#read} then {@link Analyzer#analyze}; the report's piece
 * pictures are sampled from the exact segments the result carries (within a chord tolerance; no
 * number is computed from the samples).
 */
public final class EnginePipeline implements DrawingPipeline {

    @Override
    public Report analyse(Path file, ImportOptions importOptions, AnalysisSettings settings)
            throws DxfInputException, AnalysisException {
        return analyse(file, importOptions, settings, Analyzer.StageWatch.NONE);
    }

    @Override
    public Report analyse(Path file, ImportOptions importOptions, AnalysisSettings settings,
            Analyzer.StageWatch watch) throws DxfInputException, AnalysisException {
        try {
            watch.entering(Progress.READING);
            Drawing drawing = DxfImporter.read(file, importOptions);
            return Report.of(Analyzer.analyze(drawing, settings, watch));
        } catch (OutOfMemoryError | StackOverflowError e) {
            throw OutOfResources.of(file, e);
        }
    }

    /**
     * As {@link #analyse}, for a drawing held in memory (the archive job's binary records);
     * {@code name} stands for the file in the reports and messages.
     */
    public Report analyse(String name, byte[] content, ImportOptions importOptions, AnalysisSettings settings)
            throws DxfInputException, AnalysisException {
        try {
            Drawing drawing = DxfImporter.read(name, content, importOptions);
            return Report.of(Analyzer.analyze(drawing, settings));
        } catch (OutOfMemoryError | StackOverflowError e) {
            throw OutOfResources.of(name, e);
        }
    }
}
