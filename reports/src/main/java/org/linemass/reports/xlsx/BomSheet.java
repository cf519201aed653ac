package org.linemass.reports.xlsx;

import java.util.ArrayList;
import java.util.List;
import org.linemass.engine.result.DrawingResult;
import org.linemass.engine.result.MarkResult;
import org.linemass.reports.Report;
import org.linemass.reports.UnitSystem;

/**
 * The bill of materials: one row per mark (the columns of the CSV bill), a TOTAL row (quantity,
 * length and mass summed over the rows that have them), and a NOTE row when a mass is unknown or a
 * drawing was read incompletely, so the total is never taken for a complete one.
 */
final class BomSheet implements XlsxSheet {

    private final List<Report> reports;
    private final UnitSystem units;

    BomSheet(List<Report> reports, UnitSystem units) {
        this.reports = reports;
        this.units = units;
    }

    @Override
    public String name() {
        return "bill of materials";
    }

    @Override
    public List<String> header() {
        return CheckSheets.header(reports, List.of("mark", "quantity", "section", "material",
                "cut length each [" + units.shortUnit() + "]", "bends each",
                "mass each [" + units.massUnit() + "]", "length total [" + units.longUnit() + "]",
                "mass total [" + units.massUnit() + "]", "layer"));
    }

    @Override
    public void fill(SheetRows rows) {
        long quantity = 0;
        double length = 0;
        double mass = 0;
        List<String> notes = new ArrayList<>();
        boolean multi = reports.size() > 1;
        for (Report report : reports) {
            DrawingResult r = report.result();
            String prefix = multi ? r.drawing().file() + ": " : "";
            for (MarkResult m : r.groups()) {
                CheckSheets.start(rows, reports, report).text(m.mark()).integer(m.quantity()).text(m.section())
                        .text(m.material()).number(units.inShortUnit(m.lengthEachM()), units.shortDecimals())
                        .integer(m.bendsEach()).number(kg(m.massEachKg()), units.massDecimals(m.massEachKg()))
                        .number(units.inLongUnit(m.lengthTotalM()), units.longDecimals())
                        .number(kg(m.massTotalKg()), units.massDecimals(m.massTotalKg())).text(m.layer()).end();
                quantity += m.quantity();
                length += m.lengthTotalM();
                if (m.massTotalKg() != null) {
                    mass += m.massTotalKg();
                } else {
                    notes.add(prefix + "mark " + m.mark() + " has no section, its mass is not in the total");
                }
            }
            for (String reason : r.incompleteReasons()) {
                notes.add(prefix + "drawing read incompletely: " + reason);
            }
        }
        if (multi) {
            rows.blank();
        }
        rows.text("TOTAL").integer(quantity).blank().blank().blank().blank().blank()
                .number(units.inLongUnit(length), units.longDecimals()).number(units.inMassUnit(mass), units.massDecimals())
                .blank().end();
        if (!notes.isEmpty()) {
            if (multi) {
                rows.blank();
            }
            rows.text("NOTE").blank().text("totals incomplete: " + String.join("; ", notes)).blank().blank().blank()
                    .blank().blank().blank().blank().end();
        }
    }

    private Double kg(Double v) {
        return v == null ? null : units.inMassUnit(v);
    }
}
