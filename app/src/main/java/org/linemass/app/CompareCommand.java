package org.linemass.app;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import java.util.concurrent.Callable;
import org.linemass.importer.ImportOptions;
import org.linemass.engine.settings.AnalysisSettings;
import org.linemass.plan.stock.PlanInputException;
import org.linemass.plan.cost.Costing;
import org.linemass.plan.cost.PriceTable;
import org.linemass.plan.cost.PriceTableReader;
import org.linemass.plan.revision.MatchTolerance;
import org.linemass.plan.revision.RevisionCost;
import org.linemass.plan.revision.RevisionDiff;
import org.linemass.plan.revision.RevisionMatcher;
import org.linemass.reports.Report;
import org.linemass.reports.UnitSystem;
import org.linemass.reports.io.ProtectedFiles;
import org.linemass.reports.plan.PlanCsv;
import org.linemass.reports.revision.RevisionConsole;
import org.linemass.reports.revision.RevisionHtml;
import org.linemass.reports.revision.RevisionTables;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/**
 * {@code linemass compare A.dxf B.dxf}: what changed from revision A to revision B of a drawing
 * ({@link RevisionMatcher}): pieces unchanged, moved, changed, removed and added, the mass (and,
 * with a price table, cost) change per section, per mark and in total, and a picture with the
 * changes coloured in the HTML report. Both drawings are read with the same drawing options.
 * Exit code 0 whether or not anything changed; 2 for bad input.
 */
@Command(name = "compare", mixinStandardHelpOptions = true,
        description = "Compare two revisions of a drawing: pieces added, removed, changed and moved, with the mass "
                + "and cost change per section, per mark and in total.")
final class CompareCommand implements Callable<Integer> {

    @Mixin
    CommonOptions common;

    @Mixin
    DrawingOptions drawing;

    @Parameters(index = "0", paramLabel = "A", description = "Revision A (the earlier drawing).")
    Path revisionA;

    @Parameters(index = "1", paramLabel = "B", description = "Revision B (the later drawing).")
    Path revisionB;

    @Option(names = "--match-tolerance", paramLabel = "LENGTH", converter = Converters.Length.class,
            description = "Centroids this close are in the same place (default 1mm).")
    Double placeM;

    @Option(names = "--shape-tolerance", paramLabel = "LENGTH", converter = Converters.Length.class,
            description = "Lengths and radii of gyration this close are the same shape (default 1mm).")
    Double shapeM;

    @Option(names = "--price-table", paramLabel = "CSV", description = "Unit prices, as for check, for the cost change.")
    Path priceTable;

    @Option(names = "--html", paramLabel = "FILE", description = "Write the comparison with its picture as HTML.")
    String html;

    @Option(names = "--changes-csv", paramLabel = "FILE", description = "Write the changed pieces as CSV.")
    String changesCsv;

    @Option(names = "--sections-csv", paramLabel = "FILE",
            description = "Write the pieces, mass and cost per section of both revisions as CSV.")
    String sectionsCsv;

    @Option(names = "--marks-csv", paramLabel = "FILE",
            description = "Write the pieces, mass and cost per mark of both revisions as CSV.")
    String marksCsv;

    private final AppContext ctx;

    CompareCommand(AppContext ctx) {
        this.ctx = ctx;
    }

    @Override
    public Integer call() throws Exception {
        Path a = one(revisionA);
        Path b = one(revisionB);
        ProtectedFiles inputs = drawing.protectedFiles(List.of(a, b));
        if (priceTable != null) {
            inputs.add(priceTable, "price table");
        }
        ReportFiles sink = new ReportFiles(ctx.out(), inputs);
        List<String> targets = new ArrayList<>();
        for (String t : new String[] {html, changesCsv, sectionsCsv, marksCsv}) {
            if (t != null) {
                targets.add(t);
            }
        }
        if (targets.stream().filter(OutputOptions.STDOUT::equals).count() > 1) {
            throw new InputProblem("only one report can go to standard output ('-')");
        }
        Set<Path> seen = new HashSet<>();
        for (String t : targets) {
            var p = sink.guard(t);
            if (p != null && !seen.add(p.resolved())) {
                throw new InputProblem("two reports would be written to the same file " + t);
            }
        }
        MatchTolerance tol = new MatchTolerance(placeM == null ? MatchTolerance.DEFAULT.placeM() : placeM,
                shapeM == null ? MatchTolerance.DEFAULT.shapeM() : shapeM);
        PriceTable prices = null;
        if (priceTable != null) {
            try {
                prices = PriceTableReader.read(priceTable);
            } catch (PlanInputException e) {
                throw new InputProblem(e.getMessage());
            }
        }
        ImportOptions io = drawing.importOptions();
        AnalysisSettings settings = drawing.settings(ctx.sections());
        Report ra = ctx.pipeline().analyse(a, io, settings);
        Report rb = ctx.pipeline().analyse(b, io, settings);
        RevisionDiff diff = RevisionMatcher.compare(ra.result(), rb.result(), tol);
        RevisionCost cost = prices == null ? null : new RevisionCost(
                Costing.of(List.of(ra.result()), prices, null), ra.result().groups(),
                Costing.of(List.of(rb.result()), prices, null), rb.result().groups());
        UnitSystem units = common.units();
        RevisionTables t = new RevisionTables(units, cost);
        List<Report> both = List.of(ra, rb);
        try {
            sink.text(changesCsv, both, (r, w) -> PlanCsv.write(t.pieces(diff), w), true);
            sink.text(sectionsCsv, both, (r, w) -> PlanCsv.write(t.sections(diff), w), true);
            sink.text(marksCsv, both, (r, w) -> PlanCsv.write(t.marks(diff), w), true);
            sink.text(html, both, (r, w) -> RevisionHtml.write(diff, ra, rb, cost, units, w));
        } catch (java.io.IOException | RuntimeException e) {
            sink.discard();
            throw e;
        }
        sink.commit();
        if (!targets.contains(OutputOptions.STDOUT)) {
            RevisionConsole.print(diff, cost, units, common.quiet, ctx.out());
        }
        ctx.out().flush();
        return ExitCodes.OK;
    }

    private static Path one(Path p) throws InputProblem, java.io.IOException {
        List<Path> files = InputFiles.collect(List.of(p));
        if (files.size() != 1) {
            throw new InputProblem(p + ": compare takes one drawing per revision, found " + files.size());
        }
        return files.get(0);
    }
}
