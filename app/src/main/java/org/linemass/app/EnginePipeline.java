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
 * The real pipeline: {@link DxfImporter#read} then {@link Analyzer#analyze}. Integration seam:
 * the engine does not yet hand out the segments of each piece, so the HTML picture draws each
 * piece from its start to its end; once it does, fill {@link Report#pieceShapes} here with
 * {@code org.linemass.reports.ShapeSampler.sample(piece.segments(), chordM)} per piece id.
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
