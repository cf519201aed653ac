package org.linemass.reports.csv;

import java.io.IOException;
import java.io.Writer;
import java.util.ArrayList;
import java.util.List;
import org.linemass.engine.result.DrawingResult;
import org.linemass.engine.result.MarkResult;
import org.linemass.reports.Report;
import org.linemass.reports.UnitSystem;

/**
 * The bill of materials: one row per mark (mark, quantity, section, material, cut length each,
 * bends each, mass each, mass total, layer), then a TOTAL row (quantity and mass summed over the
 * rows that have a mass). When some mass is unknown or some drawing was read incompletely, a NOTE
 * row says so, so a spreadsheet total is never mistaken for a complete one. With several drawings
 * the first column names the drawing.
 */
public final class BomCsvWriter {

    private BomCsvWriter() {
    }

    public static void write(List<Report> reports, UnitSystem units, Writer out) throws IOException {
        boolean multi = reports.size() > 1;
        CsvTable table = CsvTable.withDrawingColumn(out, multi, List.of("mark", "quantity", "section", "material",
                "cut length each [" + units.shortUnit() + "]", "bends each",
                "mass each [" + units.massUnit() + "]", "mass total [" + units.massUnit() + "]", "layer"));
        long quantity = 0;
        double mass = 0;
        List<String> notes = new ArrayList<>();
        for (Report report : reports) {
            DrawingResult r = report.result();
            for (MarkResult m : r.groups()) {
                List<String> row = new ArrayList<>();
                if (multi) {
                    row.add(CsvCell.text(r.drawing().file()));
                }
                row.add(CsvCell.text(m.mark()));
                row.add(Integer.toString(m.quantity()));
                row.add(CsvCell.text(m.section()));
                row.add(CsvCell.text(m.material()));
                row.add(units.shortLength(m.lengthEachM()));
                row.add(Integer.toString(m.bendsEach()));
                row.add(units.mass(m.massEachKg()));
                row.add(units.mass(m.massTotalKg()));
                row.add(CsvCell.text(m.layer()));
                table.row(row);
                quantity += m.quantity();
                if (m.massTotalKg() != null) {
                    mass += m.massTotalKg();
                } else {
                    notes.add(prefix(multi, r) + "mark " + m.mark() + " has no section, its mass is not in the total");
                }
            }
            for (String reason : r.incompleteReasons()) {
                notes.add(prefix(multi, r) + "drawing read incompletely: " + reason);
            }
        }
        List<String> total = new ArrayList<>();
        if (multi) {
            total.add("");
        }
        total.addAll(List.of("TOTAL", Long.toString(quantity), "", "", "", "", "", units.mass(mass), ""));
        table.row(total);
        if (!notes.isEmpty()) {
            List<String> note = new ArrayList<>();
            if (multi) {
                note.add("");
            }
            note.addAll(List.of("NOTE", "", CsvCell.text("totals incomplete: " + String.join("; ", notes)),
                    "", "", "", "", "", ""));
            table.row(note);
        }
    }

    private static String prefix(boolean multi, DrawingResult r) {
        return multi ? r.drawing().file() + ": " : "";
    }
}
