package org.linemass.reports.xlsx;

import java.util.List;
import java.util.stream.Collectors;
import org.linemass.engine.result.Finding;
import org.linemass.reports.Report;
import org.linemass.reports.UnitSystem;

/**
 * The drawing findings: one row per finding, numbered from 1 in each drawing (the numbers of the
 * HTML markers), with kind, severity, place, size, layer, mass concerned, entities and message.
 */
final class FindingsSheet implements XlsxSheet {

    /** Two more decimals than a cut length, so a 0.05 mm gap does not read 0.0 (as in the CSV). */
    private static final int SIZE_EXTRA_DECIMALS = 2;

    private final List<Report> reports;
    private final UnitSystem units;

    FindingsSheet(List<Report> reports, UnitSystem units) {
        this.reports = reports;
        this.units = units;
    }

    @Override
    public String name() {
        return "findings";
    }

    @Override
    public List<String> header() {
        String lu = units.longUnit();
        return CheckSheets.header(reports, List.of("number", "kind", "severity", "x [" + lu + "]", "y [" + lu + "]",
                "z [" + lu + "]", "size [" + units.shortUnit() + "]", "layer", "mass [" + units.massUnit() + "]",
                "entities", "message"));
    }

    @Override
    public void fill(SheetRows rows) {
        for (Report report : reports) {
            int n = 0;
            for (Finding f : report.result().findings()) {
                n++;
                CheckSheets.start(rows, reports, report).integer(n).text(f.kind()).text(f.severity().jsonName());
                PiecesSheet.point(rows, f.atM(), units);
                rows.number(f.sizeM() == null ? null : units.inShortUnit(f.sizeM()),
                        units.shortDecimals() + SIZE_EXTRA_DECIMALS)
                        .text(f.layer()).number(f.massKg() == null ? null : units.inMassUnit(f.massKg()),
                                units.massDecimals(f.massKg()))
                        .text(f.entities().stream().map(s -> "line " + s.line()
                                + (s.handle() == null || s.handle().isEmpty() ? "" : " handle " + s.handle()))
                                .collect(Collectors.joining("; ")))
                        .text(units.message(f.message())).end();
            }
        }
    }
}
