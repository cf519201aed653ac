package org.linemass.app;

import java.nio.file.Path;
import org.linemass.drawing.Drawing;
import org.linemass.engine.AnalysisException;
import org.linemass.engine.AnalysisSettings;
import org.linemass.engine.Analyzer;
import org.linemass.engine.result.DrawingResult;
import org.linemass.importer.DxfImporter;
import org.linemass.importer.DxfInputException;
import org.linemass.importer.ImportOptions;
import org.linemass.reports.Report;

/**
 * The real pipeline: {@link DxfImporter#read} then {@link Analyzer#analyze}. Piece shapes for the
 * HTML picture are not yet supplied by the engine, so pieces are drawn start to end until the
 * engine offers sampled centre-lines (integration seam: fill {@link Report#pieceShapes} here).
 */
public final class EnginePipeline implements DrawingPipeline {

    @Override
    public Report analyse(Path file, ImportOptions importOptions, AnalysisSettings settings)
            throws DxfInputException, AnalysisException {
        Drawing drawing = DxfImporter.read(file, importOptions);
        DrawingResult result = Analyzer.analyze(drawing, settings);
        return Report.of(result);
    }
}
