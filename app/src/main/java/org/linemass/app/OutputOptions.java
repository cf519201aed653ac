package org.linemass.app;

import java.util.ArrayList;
import java.util.List;
import picocli.CommandLine.Option;

/** Which report files {@code check} writes (a path, or {@code -} for standard output) and the exit threshold. */
public final class OutputOptions {

    /** The value that sends a report to standard output. */
    static final String STDOUT = "-";

    @Option(names = "--json", paramLabel = "FILE", description = "Write the JSON report (schema in the docs).")
    String json;

    @Option(names = "--bom-csv", paramLabel = "FILE", description = "Write the bill of materials as CSV.")
    String bomCsv;

    @Option(names = "--pieces-csv", paramLabel = "FILE", description = "Write the cut list (one row per piece) as CSV.")
    String piecesCsv;

    @Option(names = "--findings-csv", paramLabel = "FILE", description = "Write the drawing findings as CSV.")
    String findingsCsv;

    @Option(names = "--schedule-csv", paramLabel = "FILE",
            description = "Write the bar bending schedule (BS 8666 shape codes, dimensions, lengths) as CSV.")
    String scheduleCsv;

    @Option(names = "--bender-csv", paramLabel = "FILE",
            description = "Write the bender data of every piece (feed, rotation, bend angle, radius, corner points) as CSV.")
    String benderCsv;

    @Option(names = "--xlsx", paramLabel = "FILE",
            description = "Write a spreadsheet workbook (bill of materials, pieces, findings, layers) with numeric cells.")
    String xlsx;

    @Option(names = "--summary-csv", paramLabel = "FILE", description = "Write one row per drawing (status, length, "
            + "mass, pieces, findings by severity, time, the message of one that failed) and a total row as CSV.")
    String summaryCsv;

    @Option(names = "--html", paramLabel = "FILE", description = "Write the HTML report with the picture of the drawing.")
    String html;

    @Option(names = "--markup-dxf", paramLabel = "FILE|FOLDER",
            description = "Write a copy of the drawing with the findings marked on an added layer; with several "
                    + "drawings give a folder.")
    String markupDxf;

    @Option(names = "--all-or-none", description = "Write no report at all when some drawing cannot be read; by "
            + "default the reports list such a drawing as failed and the exit code is 2.")
    boolean allOrNone;

    @Option(names = "--fail-at", paramLabel = "SEVERITY", converter = Converters.Threshold.class,
            description = "Exit with 1 when a finding is at least this severe: info, warning, error (default) or never.")
    FailThreshold failAt = FailThreshold.ERROR;

    /** The report targets given, in a fixed order. */
    List<String> targets() {
        List<String> t = new ArrayList<>();
        for (String s : new String[] {json, bomCsv, piecesCsv, findingsCsv, summaryCsv, scheduleCsv, benderCsv, xlsx, html, markupDxf}) {
            if (s != null) {
                t.add(s);
            }
        }
        return t;
    }

    /** True when some report goes to standard output (then the summary is not printed there). */
    boolean usesStdout() {
        return targets().contains(STDOUT);
    }
}
