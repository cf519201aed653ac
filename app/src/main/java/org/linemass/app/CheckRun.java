package org.linemass.app;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.linemass.engine.error.AnalysisException;
import org.linemass.engine.settings.AnalysisSettings;
import org.linemass.engine.result.Finding;
import org.linemass.importer.DxfInputException;
import org.linemass.importer.ImportOptions;
import org.linemass.reports.DrawingOutcome;
import org.linemass.reports.Report;
import org.linemass.reports.UnitSystem;
import org.linemass.reports.console.ConsoleReport;
import org.linemass.reports.csv.BenderCsvWriter;
import org.linemass.reports.csv.BomCsvWriter;
import org.linemass.reports.csv.FindingsCsvWriter;
import org.linemass.reports.csv.PiecesCsvWriter;
import org.linemass.reports.csv.ScheduleCsvWriter;
import org.linemass.reports.csv.SummaryCsvWriter;
import org.linemass.reports.dxf.DxfMarkupWriter;
import org.linemass.reports.html.HtmlReportWriter;
import org.linemass.reports.json.JsonReportWriter;
import org.linemass.plan.cost.PriceTable;
import org.linemass.plan.cutting.CutSettings;
import org.linemass.plan.stock.StockTable;
import org.linemass.reports.xlsx.CheckSheets;
import org.linemass.reports.xlsx.XlsxSheet;
import org.linemass.reports.xlsx.XlsxWorkbook;

/**
 * One run of {@code check}: expand the inputs, build the settings, refuse outputs that would land
 * on a file the run reads, analyse the drawings side by side ({@link DrawingBatch}; a bad drawing
 * among several is reported on stderr, in input order, and the others go on), write the requested
 * reports, print the summary, and work out the exit code. A drawing that cannot be read among
 * several is listed as failed in the reports and the exit code is 2; with {@code --all-or-none}
 * such a run writes no report instead. A report that cannot be written means no report in any
 * format: the reports are written to temporaries first and moved into place only when all of them
 * succeeded. What is printed and written is the same for any number of jobs, except the time column
 * of the summary CSV.
 */
final class CheckRun {

    private final AppContext ctx;
    private final CommonOptions common;
    private final DrawingOptions drawing;
    private final OutputOptions outputs;
    private final PlanOptions plan;
    private final int jobs;

    /** One drawing per processor the JVM may use. */
    static int defaultJobs() {
        return Runtime.getRuntime().availableProcessors();
    }

    CheckRun(AppContext ctx, CommonOptions common, DrawingOptions drawing, OutputOptions outputs, PlanOptions plan) {
        this(ctx, common, drawing, outputs, plan, defaultJobs());
    }

    /** A run analysing up to {@code jobs} drawings side by side. */
    CheckRun(AppContext ctx, CommonOptions common, DrawingOptions drawing, OutputOptions outputs, PlanOptions plan,
            int jobs) {
        this.jobs = jobs;
        this.ctx = ctx;
        this.common = common;
        this.drawing = drawing;
        this.outputs = outputs;
        this.plan = plan == null ? new PlanOptions() : plan;
    }

    /** Runs and returns the exit code; single-drawing input errors propagate as exceptions (exit 2). */
    int run(List<Path> args)
            throws InputProblem, AnalysisException, DxfInputException, IOException, InterruptedException {
        ReportFiles.removeStale(java.util.stream.Stream.concat(outputs.targets().stream(), plan.targets().stream()).toList());
        List<Path> files = InputFiles.collect(args);
        long toStdout = java.util.stream.Stream.concat(outputs.targets().stream(), plan.targets().stream()).filter(OutputOptions.STDOUT::equals).count();
        if (toStdout > 1) {
            throw new InputProblem("only one report can go to standard output ('-')");
        }
        if (OutputOptions.STDOUT.equals(outputs.xlsx)) {
            throw new InputProblem("--xlsx needs a file name, not '-'");
        }
        if (OutputOptions.STDOUT.equals(outputs.markupDxf)) {
            throw new InputProblem("--markup-dxf needs a file name, not '-'");
        }
        if (outputs.markupDxf != null && files.size() > 1 && !Files.isDirectory(Path.of(outputs.markupDxf))
                && outputs.markupDxf.toLowerCase(Locale.ROOT).endsWith(".dxf")) {
            throw new InputProblem("--markup-dxf " + outputs.markupDxf + " names one file, but " + files.size()
                    + " drawings are checked: give a folder for their marked-up copies");
        }
        if (plan.marks.file() != null && files.size() != 1) {
            throw new InputProblem("--marks-from gives the marks of an earlier revision to one drawing, but "
                    + files.size() + " are checked");
        }
        if (jobs < 1) {
            throw new InputProblem("--jobs must be 1 or more, got " + jobs);
        }
        ReportFiles sink = new ReportFiles(ctx.out(), plan.protect(drawing.protectedFiles(files)));
        java.util.Set<Path> seen = new java.util.HashSet<>();
        List<String> allTargets = new ArrayList<>(outputs.targets());
        allTargets.addAll(plan.targets());
        for (String t : allTargets) {
            boolean folder = t.equals(outputs.markupDxf) && (files.size() > 1 || Files.isDirectory(Path.of(t)));
            if (folder) {
                // a folder of marked-up copies: each file is guarded when it is written
                if (Files.isDirectory(Path.of(t))) {
                    org.linemass.reports.io.AtomicWrite.removeStale(Path.of(t));
                }
                continue;
            }
            org.linemass.reports.io.OutputPath p = sink.guard(t);
            if (p != null && !seen.add(p.resolved())) {
                throw new InputProblem("two reports would be written to the same file " + t);
            }
        }
        StockTable stock = plan.table(drawing.sectionTable);
        PriceTable prices = plan.costs.prices();
        CutSettings cutSettings = plan.settings();
        ImportOptions io = drawing.importOptions();
        AnalysisSettings settings = drawing.settings(ctx.sections());
        if (files.size() > 1 && !drawing.threadsGiven()) {
            // several drawings already fill the processors side by side (--jobs); threads inside each
            // small drawing then only add start-up work: on 2000 small drawings, 2 threads each took
            // 54 s of CPU against 28 s with one (bench/many-drawings archive, --jobs 1, 2 cores)
            settings = settings.withThreads(1);
        }
        if (common.listNotes) {
            // every T-junction and crossing note in the reports too, not only a sample
            settings = settings.withListedNotes(Integer.MAX_VALUE);
        }

        List<DrawingBatch.Done> done;
        DrawingBatch batch = new DrawingBatch(ctx.pipeline(), io, settings, jobs, MemoryGate.forThisHeap(),
                outputs.html != null);
        try (Progress progress = new Progress(ctx.err(), files.size(), ctx.terminal() && !common.quiet)) {
            done = batch.run(files, progress, d -> {
                if (d.error() != null && files.size() > 1) {
                    ctx.err().println(d.error().getMessage());
                    ctx.err().flush();
                }
            });
        }
        if (files.size() == 1 && done.get(0).error() != null) {
            rethrow(done.get(0).error());
        }
        List<DrawingOutcome> outcomes = new ArrayList<>();
        List<Report> reports = new ArrayList<>();
        List<Path> analysed = new ArrayList<>();
        for (DrawingBatch.Done d : done) {
            if (d.report() != null) {
                Report rep = plan.marks.apply(ctx.pipeline(), d.report(), io, settings);
                outcomes.add(DrawingOutcome.of(rep, d.nanos()));
                reports.add(rep);
                analysed.add(d.file());
            } else {
                outcomes.add(DrawingOutcome.failed(d.file().toString(), Cli.oneLine(d.error().getMessage()), d.nanos()));
            }
        }
        if (reports.isEmpty()) {
            throw new InputProblem("none of the " + files.size() + " drawings could be read");
        }
        int bad = files.size() - reports.size();
        if (bad > 0 && outputs.allOrNone) {
            // --all-or-none: a run with a drawing refused writes no report, in any format
            throw new InputProblem("no report written: " + bad + " of the " + files.size() + " drawings could not "
                    + "be read (see above); correct them or leave them out");
        }
        UnitSystem units = common.units();
        JobReports job = JobReports.of(reports, stock, cutSettings, prices, plan, units);
        List<String> htmlExtra = job.htmlSections();
        List<String> marked = new ArrayList<>();
        try {
            sink.text(outputs.json, reports, (r, w) -> JsonReportWriter.write(r, job.jsonParts(), w));
            sink.text(outputs.bomCsv, outcomes, (r, w) -> BomCsvWriter.writeOutcomes(r, units, w), true);
            sink.text(outputs.piecesCsv, outcomes, (r, w) -> PiecesCsvWriter.writeOutcomes(r, units, w), true);
            sink.text(outputs.findingsCsv, outcomes, (r, w) -> FindingsCsvWriter.writeOutcomes(r, units, w), true);
            sink.text(outputs.summaryCsv, outcomes, (r, w) -> SummaryCsvWriter.write(r, units, w), true);
            sink.text(outputs.scheduleCsv, reports, ScheduleCsvWriter::write, true);
            sink.text(outputs.benderCsv, reports, BenderCsvWriter::write, true);
            job.writeCsv(sink, reports);
            if (outputs.xlsx != null) {
                List<XlsxSheet> sheets = CheckSheets.of(reports, units);
                sheets.addAll(job.sheets());
                sink.bytes(Path.of(outputs.xlsx), os -> XlsxWorkbook.write(sheets, os));
            }
            sink.text(outputs.html, reports, (r, w) -> new HtmlReportWriter(units).write(r, htmlExtra, w));
            if (outputs.markupDxf != null) {
                marked = markup(sink, reports, analysed);
            }
        } catch (IOException | RuntimeException | Error e) {
            sink.discard();
            throw e;
        }
        sink.commit();
        boolean quietStdout = outputs.usesStdout() || plan.targets().contains(OutputOptions.STDOUT);
        if (!quietStdout) {
            new ConsoleReport(units, ctx.terminal(), common.quiet, common.listNotes, common.allFindings,
                    TerminalWidth.of(ctx.terminal())).printOutcomes(outcomes, ctx.out());
            if (!common.quiet) {
                marked.forEach(m -> ctx.out().println("marked-up drawing: " + m));
            }
        }
        if (!quietStdout && !common.quiet) {
            job.print(units, ctx.out());
        }
        ctx.out().flush();
        if (bad > 0) {
            ctx.err().println("linemass: " + bad + " of the " + files.size() + " drawings could not be read; "
                    + "the reports list them as failed");
            ctx.err().flush();
            return ExitCodes.BAD_INPUT;
        }
        List<Finding> all = new ArrayList<>();
        reports.forEach(r -> all.addAll(r.result().findings()));
        return outputs.failAt.tripped(all) ? ExitCodes.FINDINGS : ExitCodes.OK;
    }

    private static void rethrow(Exception e) throws DxfInputException, AnalysisException {
        if (e instanceof DxfInputException d) {
            throw d;
        }
        throw (AnalysisException) e;
    }

    /** Writes the marked-up copies (staged in {@code sink}); returns their paths for the summary. */
    private List<String> markup(ReportFiles sink, List<Report> reports, List<Path> analysed) throws IOException {
        Path target = Path.of(outputs.markupDxf);
        boolean folder = reports.size() > 1 || Files.isDirectory(target);
        java.util.Set<String> used = new java.util.HashSet<>();
        List<String> written = new ArrayList<>();
        for (int i = 0; i < reports.size(); i++) {
            Path in = analysed.get(i);
            Path out = target;
            if (folder) {
                String name = markedName(in);
                for (int k = 2; !used.add(name.toLowerCase(Locale.ROOT)); k++) {
                    name = markedName(in).replace("-findings.dxf", "-findings-" + k + ".dxf");
                }
                out = target.resolve(name);
            }
            byte[] original = Files.readAllBytes(in);
            Report r = reports.get(i);
            sink.bytes(out, os -> DxfMarkupWriter.write(original, r.result(), os));
            written.add(out.toString());
        }
        return written;
    }

    /** {@code name.dxf} becomes {@code name-findings.dxf} (a second drawing of the same name gets {@code -2}, ...). */
    static String markedName(Path in) {
        String n = in.getFileName().toString();
        int dot = n.toLowerCase(Locale.ROOT).lastIndexOf(".dxf");
        return (dot > 0 ? n.substring(0, dot) : n) + "-findings.dxf";
    }
}
