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
 * The real pipeline: {@link DxfImporter#read} then {@link Analyzer#analyze}. Integration seam: the
 * engine's piece stage knows each piece's segments; once {@code Analyzer.analyze(drawing, settings,
 * stage)} is merged, wrap the standard stage to keep its pieces and fill the picture shapes:
 * <pre>
 * List&lt;Piece&gt; kept = new ArrayList&lt;&gt;();
 * DrawingResult result = Analyzer.analyze(drawing, settings, (world, tol, lookup, mirror) -&gt; {
 *     PieceAnalysis pa = PieceAnalyzer.analyze(world, tol, lookup, mirror);
 *     kept.addAll(pa.pieces());
 *     return pa;
 * });
 * return new Report(result, PieceShapes.of(result, kept));
 * </pre>
 * Until then each piece is drawn from its start to its end point.
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
