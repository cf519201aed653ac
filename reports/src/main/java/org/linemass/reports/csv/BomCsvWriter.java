package org.linemass.reports.csv;

import java.io.IOException;
import java.io.Writer;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import org.linemass.engine.result.DrawingResult;
import org.linemass.engine.result.MarkResult;
import org.linemass.engine.moments.CompensatedSum;
import org.linemass.reports.DrawingOutcome;
import org.linemass.reports.Report;
import org.linemass.reports.UnitSystem;

/**
 * The bill of materials: one row per mark (mark, quantity, section, material, cut length each,
 * bends each, mass each, mass total, layer), then a TOTAL row (quantity and mass summed over the
 * rows that have a mass). When some mass is unknown or some drawing was read incompletely, a NOTE
 * row says so, so a spreadsheet total is never mistaken for a complete one.
 *
 * <p>With several drawings the bill covers them all: the first columns name each row's drawing
 * and its status ({@link DrawingOutcome#status()}; a drawing that failed has one row saying so and
 * nothing else), a last column gives the cut length total of the row, and before the TOTAL row
 * come one TOTAL row per section and material (sorted by section, then material; marks without a
 * section are summed under an empty section).
 */
public final class BomCsvWriter {

    private BomCsvWriter() {
    }

    /** The bill of the analysed drawings {@code reports}. */
    public static void write(List<Report> reports, UnitSystem units, Writer out) throws IOException {
        if (reports.size() == 1) {
            single(reports.get(0).result(), units, out);
        } else {
            several(reports.stream().map(r -> DrawingOutcome.of(r, 0)).toList(), units, out);
        }
    }

    /** The bill of a run over several drawings, some of which may have failed. */
    public static void writeOutcomes(List<DrawingOutcome> outcomes, UnitSystem units, Writer out) throws IOException {
        if (outcomes.size() == 1 && !outcomes.get(0).isFailed()) {
            single(outcomes.get(0).report().result(), units, out);
        } else {
            several(outcomes, units, out);
        }
    }

    private static void single(DrawingResult r, UnitSystem units, Writer out) throws IOException {
        CsvTable table = new CsvTable(out, header(units));
        long quantity = 0;
        double mass = 0;
        List<String> notes = new ArrayList<>();
        for (MarkResult m : r.groups()) {
            table.row(markCells(m, units));
            quantity += m.quantity();
            if (m.massTotalKg() != null) {
                mass += m.massTotalKg();
            } else {
                notes.add("mark " + m.mark() + " has no section, its mass is not in the total");
            }
        }
        for (String reason : r.incompleteReasons()) {
            notes.add("drawing read incompletely: " + reason);
        }
        table.row(List.of("TOTAL", Long.toString(quantity), "", "", "", "", "", units.mass(mass), ""));
        if (!notes.isEmpty()) {
            table.row(note(notes));
        }
    }

    private static void several(List<DrawingOutcome> outcomes, UnitSystem units, Writer out) throws IOException {
        List<String> columns = new ArrayList<>(List.of("drawing", "status"));
        columns.addAll(header(units));
        columns.add("cut length total [" + units.longUnit() + "]");
        CsvTable table = new CsvTable(out, columns);
        Map<List<String>, Subtotal> bySection = new TreeMap<>(BomCsvWriter::compareKeys);
        Subtotal all = new Subtotal();
        List<String> notes = new ArrayList<>();
        for (DrawingOutcome o : outcomes) {
            if (o.isFailed()) {
                List<String> row = new ArrayList<>(List.of(CsvCell.text(o.file()), o.status()));
                while (row.size() < columns.size()) {
                    row.add("");
                }
                table.row(row);
                notes.add(o.file() + ": failed, not in the totals");
                continue;
            }
            DrawingResult r = o.report().result();
            for (MarkResult m : r.groups()) {
                List<String> row = new ArrayList<>(List.of(CsvCell.text(r.drawing().file()), o.status()));
                row.addAll(markCells(m, units));
                row.add(units.longLength(m.lengthTotalM()));
                table.row(row);
                List<String> key = List.of(m.section() == null ? "" : m.section(),
                        m.material() == null ? "" : m.material());
                bySection.computeIfAbsent(key, k -> new Subtotal()).add(m);
                all.add(m);
                if (m.massTotalKg() == null) {
                    notes.add(r.drawing().file() + ": mark " + m.mark() + " has no section, its mass is not in the total");
                }
            }
            for (String reason : r.incompleteReasons()) {
                notes.add(r.drawing().file() + ": drawing read incompletely: " + reason);
            }
        }
        for (Map.Entry<List<String>, Subtotal> e : bySection.entrySet()) {
            table.row(totalRow(e.getValue(), CsvCell.text(e.getKey().get(0)), CsvCell.text(e.getKey().get(1)), units));
        }
        table.row(totalRow(all, "", "", units));
        if (!notes.isEmpty()) {
            List<String> row = new ArrayList<>(List.of("", ""));
            row.addAll(note(notes));
            row.add("");
            table.row(row);
        }
    }

    private static List<String> header(UnitSystem units) {
        return List.of("mark", "quantity", "section", "material", "cut length each [" + units.shortUnit() + "]",
                "bends each", "mass each [" + units.massUnit() + "]", "mass total [" + units.massUnit() + "]", "layer");
    }

    private static List<String> markCells(MarkResult m, UnitSystem units) {
        return List.of(CsvCell.text(m.mark()), Integer.toString(m.quantity()), CsvCell.text(m.section()),
                CsvCell.text(m.material()), units.shortLength(m.lengthEachM()), Integer.toString(m.bendsEach()),
                units.mass(m.massEachKg()), units.mass(m.massTotalKg()), CsvCell.text(m.layer()));
    }

    private static List<String> note(List<String> notes) {
        return List.of("NOTE", "", CsvCell.text("totals incomplete: " + String.join("; ", notes)),
                "", "", "", "", "", "");
    }

    private static List<String> totalRow(Subtotal s, String section, String material, UnitSystem units) {
        return List.of("", "", "TOTAL", Long.toString(s.quantity), section, material, "", "", "",
                s.anyMass ? units.mass(s.mass.value()) : "", "", units.longLength(s.length.value()));
    }

    private static int compareKeys(List<String> a, List<String> b) {
        int c = a.get(0).compareTo(b.get(0));
        return c != 0 ? c : a.get(1).compareTo(b.get(1));
    }

    /** Quantity, cut length and mass of some marks; marks without a mass add no mass. */
    private static final class Subtotal {
        long quantity;
        final CompensatedSum length = new CompensatedSum();
        final CompensatedSum mass = new CompensatedSum();
        boolean anyMass;

        void add(MarkResult m) {
            quantity += m.quantity();
            length.add(m.lengthTotalM());
            if (m.massTotalKg() != null) {
                mass.add(m.massTotalKg());
                anyMass = true;
            }
        }
    }
}
