package org.linemass.reports.csv;

import java.io.IOException;
import java.io.Writer;
import java.util.ArrayList;
import java.util.List;
import org.linemass.engine.result.DrawingResult;
import org.linemass.engine.result.Finding;
import org.linemass.engine.result.Severity;
import org.linemass.engine.moments.CompensatedSum;
import org.linemass.reports.DrawingOutcome;
import org.linemass.reports.UnitSystem;

/**
 * The run summary: one row per drawing in input order (drawing, status, length, mass, pieces,
 * marks, errors, warnings, notes, wall-clock seconds, message), then a TOTAL row: lengths, masses,
 * pieces, marks, findings and seconds summed over the drawings that were analysed, and in the
 * message column how many failed. A drawing that failed has only its status, time and one-line
 * message; one whose mass is unknown has an empty mass cell, and so has the total when no drawing
 * has a mass. The time column is the only one that
 * differs between two runs of the same drawings.
 */
public final class SummaryCsvWriter {

    private SummaryCsvWriter() {
    }

    public static void write(List<DrawingOutcome> outcomes, UnitSystem units, Writer out) throws IOException {
        CsvTable table = new CsvTable(out, List.of("drawing", "status", "length [" + units.longUnit() + "]",
                "mass [" + units.massUnit() + "]", "pieces", "marks", "errors", "warnings", "notes", "time [s]",
                "message"));
        CompensatedSum length = new CompensatedSum();
        CompensatedSum mass = new CompensatedSum();
        boolean anyMass = false;
        long pieces = 0;
        long marks = 0;
        long[] severities = new long[3];
        long nanos = 0;
        int failed = 0;
        int incomplete = 0;
        for (DrawingOutcome o : outcomes) {
            nanos += o.elapsedNanos();
            String time = seconds(o.elapsedNanos());
            if (o.isFailed()) {
                failed++;
                table.row(List.of(CsvCell.text(o.file()), o.status(), "", "", "", "", "", "", "", time,
                        CsvCell.text(o.error())));
                continue;
            }
            DrawingResult r = o.report().result();
            long[] s = count(r.findings());
            for (int i = 0; i < 3; i++) {
                severities[i] += s[i];
            }
            length.add(r.totals().lengthM());
            if (r.totals().massKg() != null) {
                mass.add(r.totals().massKg());
                anyMass = true;
            }
            pieces += r.pieces().size();
            marks += r.groups().size();
            if (!r.complete()) {
                incomplete++;
            }
            table.row(List.of(CsvCell.text(r.drawing().file()), o.status(), units.longLength(r.totals().lengthM()),
                    units.mass(r.totals().massKg()), Integer.toString(r.pieces().size()),
                    Integer.toString(r.groups().size()), Long.toString(s[0]), Long.toString(s[1]),
                    Long.toString(s[2]), time, CsvCell.text(String.join("; ", r.incompleteReasons()))));
        }
        List<String> message = new ArrayList<>();
        message.add(outcomes.size() + " drawings");
        if (incomplete > 0) {
            message.add(incomplete + " incomplete");
        }
        if (failed > 0) {
            message.add(failed + " failed, not in the totals");
        }
        table.row(List.of("TOTAL", "", units.longLength(length.value()), anyMass ? units.mass(mass.value()) : "", Long.toString(pieces),
                Long.toString(marks), Long.toString(severities[0]), Long.toString(severities[1]),
                Long.toString(severities[2]), seconds(nanos), String.join(", ", message)));
    }

    /** Errors, warnings and notes among {@code findings}. */
    static long[] count(List<Finding> findings) {
        long[] n = new long[3];
        for (Finding f : findings) {
            n[f.severity() == Severity.ERROR ? 0 : f.severity() == Severity.WARNING ? 1 : 2]++;
        }
        return n;
    }

    private static String seconds(long nanos) {
        return UnitSystem.fixed(nanos / 1e9, 3);
    }
}
