package org.linemass.app;

import java.nio.file.Path;
import org.linemass.drawing.Drawing;
import org.linemass.engine.error.AnalysisException;
import org.linemass.engine.settings.AnalysisSettings;
import org.linemass.engine.Analyzer;
import org.linemass.engine.pieces.PieceAnalysis;
import org.linemass.engine.pieces.PieceAnalyzer;
import org.linemass.engine.result.DrawingResult;
import org.linemass.importer.DxfImporter;
import org.linemass.importer.DxfInputException;
import org.linemass.importer.ImportOptions;
import org.linemass.reports.Report;

/**
 * The real pipeline: {@link DxfImporter#read} then {@link Analyzer#analyze} with the standard piece
 * stage; the report's piece pictures are sampled from the exact segments the result carries
 * (within a chord tolerance; no number is computed from the samples).
 */
public final class EnginePipeline implements DrawingPipeline {

    /** Told when the engine moves from one stage to the next; may throw to stop the run there. */
    @FunctionalInterface
    public interface StageWatch {
        /** {@code stage} is a few words for a person ("joining and checking pieces"). */
        void entering(String stage);

        /** A watch that does nothing. */
        StageWatch NONE = stage -> { };
    }

    @Override
    public Report analyse(Path file, ImportOptions importOptions, AnalysisSettings settings)
            throws DxfInputException, AnalysisException {
        try {
            Drawing drawing = DxfImporter.read(file, importOptions);
            return report(drawing, settings, StageWatch.NONE);
        } catch (OutOfMemoryError | StackOverflowError e) {
            throw OutOfResources.of(file, e);
        }
    }

    /**
     * Runs only the engine on an already imported drawing (new sections or assignments need no
     * second reading of the file), telling {@code watch} before the piece stage and after it.
     */
    public static Report report(Drawing drawing, AnalysisSettings settings, StageWatch watch)
            throws AnalysisException {
        watch.entering("expanding blocks and adding up layers");
        // the standard piece stage, wrapped only to tell the watch when it starts and ends
        DrawingResult result = Analyzer.analyze(drawing, settings, (world, tol, lookup, mirror) -> {
            watch.entering("joining and checking pieces");
            PieceAnalysis pa = PieceAnalyzer.analyze(world, tol, lookup, mirror);
            watch.entering("grouping marks and writing totals");
            return pa;
        });
        return Report.of(result);
    }
}
