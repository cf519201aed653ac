package org.linemass.reports.csv;

import java.io.IOException;
import java.io.Writer;
import java.util.ArrayList;
import java.util.List;
import org.linemass.engine.result.DrawingResult;
import org.linemass.engine.result.Finding;
import org.linemass.reports.DrawingOutcome;
import org.linemass.reports.Report;
import org.linemass.reports.UnitSystem;

/**
 * The drawing defects and notices: one row per finding, numbered from 1 in each drawing (the same
 * numbers as the HTML markers and the marked-up DXF labels), with kind, severity, place, size,
 * layer, mass concerned, entities and message.
 */
public final class FindingsCsvWriter {

    private FindingsCsvWriter() {
    }

    public static void write(List<Report> reports, UnitSystem units, Writer out) throws IOException {
        writeOutcomes(reports.stream().map(r -> DrawingOutcome.of(r, 0)).toList(), units, out);
    }

    /**
     * Like {@link #write} for a run over several drawings, some of which may have failed: each row
     * gets its drawing's status, and a drawing that failed gets one row with its status and message.
     */
    public static void writeOutcomes(List<DrawingOutcome> outcomes, UnitSystem units, Writer out) throws IOException {
        boolean multi = outcomes.size() > 1 || outcomes.stream().anyMatch(DrawingOutcome::isFailed);
        String lu = units.longUnit();
        CsvTable table = CsvTable.withDrawingAndStatusColumns(out, multi, List.of("number", "kind", "severity", "x [" + lu + "]", "y [" + lu + "]", "z [" + lu + "]",
                "size [" + units.shortUnit() + "]", "layer", "mass [" + units.massUnit() + "]", "entities",
                "message"));
        for (DrawingOutcome o : outcomes) {
            if (o.isFailed()) {
                table.failed(o, true);
                continue;
            }
            DrawingResult r = o.report().result();
            int n = 0;
            for (Finding f : r.findings()) {
                n++;
                List<String> row = new ArrayList<>();
                if (multi) {
                    row.add(CsvCell.text(r.drawing().file()));
                    row.add(o.status());
                }
                row.add(Integer.toString(n));
                row.add(CsvCell.text(f.kind()));
                row.add(f.severity().jsonName());
                PiecesCsvWriter.addPoint(row, f.atM(), units);
                row.add(units.defectSize(f.sizeM()));
                row.add(CsvCell.text(f.layer()));
                row.add(units.mass(f.massKg()));
                row.add(CsvCell.text(PiecesCsvWriter.refs(f.entities())));
                row.add(CsvCell.text(units.message(f.message())));
                table.row(row);
            }
        }
    }
}
