package org.linemass.app;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.linemass.drawing.Drawing;
import org.linemass.engine.AnalysisException;
import org.linemass.engine.settings.AnalysisSettings;
import org.linemass.engine.Analyzer;
import org.linemass.engine.pieces.Piece;
import org.linemass.engine.pieces.PieceAnalysis;
import org.linemass.engine.pieces.PieceAnalyzer;
import org.linemass.engine.result.DrawingResult;
import org.linemass.importer.DxfImporter;
import org.linemass.importer.DxfInputException;
import org.linemass.importer.ImportOptions;
import org.linemass.reports.PieceShapes;
import org.linemass.reports.Report;

/**
 * The real pipeline: {@link DxfImporter#read} then {@link Analyzer#analyze} with the standard piece
 * stage, keeping each piece's exact segments so the picture can draw them (sampled within a chord
 * tolerance; no number is computed from the samples).
 */
public final class EnginePipeline implements DrawingPipeline {

    @Override
    public Report analyse(Path file, ImportOptions importOptions, AnalysisSettings settings)
            throws DxfInputException, AnalysisException {
        try {
            Drawing drawing = DxfImporter.read(file, importOptions);
            List<Piece> kept = new ArrayList<>();
            DrawingResult result = Analyzer.analyze(drawing, settings, (world, tol, lookup, mirror) -> {
                PieceAnalysis pa = PieceAnalyzer.analyze(world, tol, lookup, mirror);
                kept.addAll(pa.pieces());
                return pa;
            });
            return new Report(result, PieceShapes.of(result, kept));
        } catch (OutOfMemoryError | StackOverflowError e) {
            throw OutOfResources.of(file, e);
        }
    }
}
