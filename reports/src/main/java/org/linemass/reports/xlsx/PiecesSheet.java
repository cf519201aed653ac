package org.linemass.reports.xlsx;

import java.util.List;
import java.util.stream.Collectors;
import org.linemass.engine.result.PieceResult;
import org.linemass.geometry.Vec3;
import org.linemass.reports.Report;
import org.linemass.reports.UnitSystem;

/**
 * The cut list: one row per piece (id, mark, layer, section, length, mass, closed, segments,
 * bends, centre of gravity, start and end points, source entities).
 */
final class PiecesSheet implements XlsxSheet {

    private final List<Report> reports;
    private final UnitSystem units;

    PiecesSheet(List<Report> reports, UnitSystem units) {
        this.reports = reports;
        this.units = units;
    }

    @Override
    public String name() {
        return "pieces";
    }

    @Override
    public List<String> header() {
        String lu = units.longUnit();
        return CheckSheets.header(reports, List.of("piece", "mark", "layer", "section",
                "length [" + units.shortUnit() + "]", "mass [" + units.massUnit() + "]", "closed", "segments", "bends",
                "cog x [" + lu + "]", "cog y [" + lu + "]", "cog z [" + lu + "]",
                "start x [" + lu + "]", "start y [" + lu + "]", "start z [" + lu + "]",
                "end x [" + lu + "]", "end y [" + lu + "]", "end z [" + lu + "]", "entities"));
    }

    @Override
    public void fill(SheetRows rows) {
        for (Report report : reports) {
            for (PieceResult p : report.result().pieces()) {
                CheckSheets.start(rows, reports, report).integer(p.id()).text(p.mark()).text(p.layer())
                        .text(p.section()).number(units.inShortUnit(p.lengthM()), units.shortDecimals())
                        .number(p.massKg() == null ? null : units.inMassUnit(p.massKg()), units.massDecimals(p.massKg()))
                        .text(p.closed() ? "yes" : "no").integer(p.segments()).integer(p.bends().size());
                point(rows, p.centroidM());
                point(rows, p.startM());
                point(rows, p.endM());
                rows.text(p.sources().stream().map(s -> "line " + s.line()
                        + (s.handle() == null || s.handle().isEmpty() ? "" : " handle " + s.handle()))
                        .collect(Collectors.joining("; "))).end();
            }
        }
    }

    /** Three coordinate cells in the long unit, with three more decimals than a total length. */
    static void point(SheetRows rows, Vec3 p, UnitSystem units) {
        int d = units.longDecimals() + 3;
        rows.number(p == null ? null : units.inLongUnit(p.x()), d)
                .number(p == null ? null : units.inLongUnit(p.y()), d)
                .number(p == null ? null : units.inLongUnit(p.z()), d);
    }

    private void point(SheetRows rows, Vec3 p) {
        point(rows, p, units);
    }
}
