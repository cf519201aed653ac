package org.linemass.reports.csv;

import java.io.IOException;
import java.io.Writer;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Collectors;
import org.linemass.engine.result.DrawingResult;
import org.linemass.engine.result.PieceResult;
import org.linemass.engine.result.SourceRef;
import org.linemass.geometry.Vec3;
import org.linemass.reports.DrawingOutcome;
import org.linemass.reports.Report;
import org.linemass.reports.UnitSystem;

/**
 * The cut list: one row per piece with its mark, layer, section, length, mass, closed flag,
 * segment and bend counts, centre of gravity and end points, and the DXF entities it was built
 * from ({@code line:handle} pairs). With several drawings the first column names the drawing.
 */
public final class PiecesCsvWriter {

    private PiecesCsvWriter() {
    }

    public static void write(List<Report> reports, UnitSystem units, Writer out) throws IOException {
        writeOutcomes(reports.stream().map(r -> DrawingOutcome.of(r, 0)).toList(), units, out);
    }

    /**
     * Like {@link #write} for a run over several drawings, some of which may have failed: each row
     * gets its drawing's status, and a drawing that failed gets one row with its status.
     */
    public static void writeOutcomes(List<DrawingOutcome> outcomes, UnitSystem units, Writer out) throws IOException {
        boolean multi = outcomes.size() > 1 || outcomes.stream().anyMatch(DrawingOutcome::isFailed);
        String lu = units.longUnit();
        CsvTable table = CsvTable.withDrawingAndStatusColumns(out, multi, List.of("piece", "mark", "layer", "section", "length [" + units.shortUnit() + "]",
                "mass [" + units.massUnit() + "]", "closed", "segments", "bends",
                "cog x [" + lu + "]", "cog y [" + lu + "]", "cog z [" + lu + "]",
                "start x [" + lu + "]", "start y [" + lu + "]", "start z [" + lu + "]",
                "end x [" + lu + "]", "end y [" + lu + "]", "end z [" + lu + "]", "entities"));
        for (DrawingOutcome o : outcomes) {
            if (o.isFailed()) {
                table.failed(o, false);
                continue;
            }
            DrawingResult r = o.report().result();
            for (PieceResult p : r.pieces()) {
                List<String> row = new ArrayList<>();
                if (multi) {
                    row.add(CsvCell.text(r.drawing().file()));
                    row.add(o.status());
                }
                row.add(Integer.toString(p.id()));
                row.add(CsvCell.text(p.mark()));
                row.add(CsvCell.text(p.layer()));
                row.add(CsvCell.text(p.section()));
                row.add(units.shortLength(p.lengthM()));
                row.add(units.mass(p.massKg()));
                row.add(p.closed() ? "yes" : "no");
                row.add(Integer.toString(p.segments()));
                row.add(Integer.toString(p.bends().size()));
                addPoint(row, p.centroidM(), units);
                addPoint(row, p.startM(), units);
                addPoint(row, p.endM(), units);
                row.add(CsvCell.text(refs(p.sources())));
                table.row(row);
            }
        }
    }

    static void addPoint(List<String> row, Vec3 p, UnitSystem units) {
        row.add(p == null ? "" : units.longLength(p.x()));
        row.add(p == null ? "" : units.longLength(p.y()));
        row.add(p == null ? "" : units.longLength(p.z()));
    }

    /**
     * Entity references as "line 1911 handle 3D" separated by "; " (the handle part left out when
     * empty). Spelled out rather than "1911:3D" because a spreadsheet reads "1911:32" as a time.
     */
    public static String refs(List<SourceRef> sources) {
        return sources.stream()
                .map(s -> "line " + s.line()
                        + (s.handle() == null || s.handle().isEmpty() ? "" : " handle " + s.handle()))
                .collect(Collectors.joining("; "));
    }
}
