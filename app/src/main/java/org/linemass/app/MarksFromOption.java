package org.linemass.app;

import java.io.IOException;
import java.nio.file.Path;
import java.util.List;
import org.linemass.engine.error.AnalysisException;
import org.linemass.engine.settings.AnalysisSettings;
import org.linemass.importer.DxfInputException;
import org.linemass.importer.ImportOptions;
import org.linemass.plan.revision.MarkCarrier;
import org.linemass.plan.revision.MatchTolerance;
import org.linemass.plan.revision.RevisionMatcher;
import org.linemass.reports.Report;
import picocli.CommandLine.Option;

/**
 * {@code check --marks-from A.dxf}: the drawing checked is a later revision of A, and its pieces
 * that did not change (unchanged or moved, by the rule of {@link RevisionMatcher} at the default
 * tolerance) keep A's marks ({@link MarkCarrier}); new and changed pieces get new marks after A's.
 */
final class MarksFromOption {

    @Option(names = "--marks-from", paramLabel = "DRAWING",
            description = "An earlier revision of the drawing: pieces that did not change keep its marks.")
    Path earlier;

    /** The earlier revision as a file to protect from outputs, or null. */
    Path file() {
        return earlier;
    }

    /** {@code report} with the earlier revision's marks carried over, or {@code report} itself without the option. */
    Report apply(DrawingPipeline pipeline, Report report, ImportOptions io, AnalysisSettings settings)
            throws DxfInputException, AnalysisException, InputProblem, IOException {
        if (earlier == null) {
            return report;
        }
        List<Path> files = InputFiles.collect(List.of(earlier));
        if (files.size() != 1) {
            throw new InputProblem("--marks-from " + earlier + ": give one drawing, found " + files.size());
        }
        Report a = pipeline.analyse(files.get(0), io, settings);
        var diff = RevisionMatcher.compare(a.result(), report.result(), MatchTolerance.DEFAULT);
        return new Report(MarkCarrier.carry(a.result(), report.result(), diff), report.pieceShapes());
    }
}
