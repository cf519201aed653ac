package org.linemass.plan.stock;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVRecord;

/**
 * Reads stock from CSV (RFC 4180, UTF-8, an optional byte-order mark) with a header row naming the
 * columns {@code section} (a name or glob), {@code stock_lengths_mm} (lengths separated by
 * {@code ;}), {@code stock_counts} (optional, counts in the same order, an empty entry for
 * unlimited), {@code kerf_mm}, {@code min_offcut_mm} and {@code coil_kg} (for wire in coils; then
 * no stock lengths). Columns may come in any order and any case; unknown columns, blank lines and
 * lines starting with {@code #} are ignored. Every error names the file, the line and the column.
 *
 * <p>{@link #read} reads a stock table, where every row must give stock. {@link #readColumns}
 * reads the same columns from a section table, where they are optional: rows that give neither
 * stock lengths nor a coil mass are skipped, and a table without those columns has no stock.
 */
public final class StockTableReader {

    private StockTableReader() {
    }

    /** A stock table: at least one row, each with stock lengths or a coil mass. */
    public static StockTable read(Path file) throws IOException, PlanInputException {
        StockTable t = read(file, false);
        if (t.rows().isEmpty()) {
            throw new PlanInputException(file + ": no stock rows");
        }
        return t;
    }

    /** The stock columns of a section table (possibly none: an empty table). */
    public static StockTable readColumns(Path sectionTable) throws IOException, PlanInputException {
        return read(sectionTable, true);
    }

    private static StockTable read(Path file, boolean optional) throws IOException, PlanInputException {
        CsvText csv = CsvText.of(Files.readString(file, StandardCharsets.UTF_8));
        List<SectionStock> rows = new ArrayList<>();
        try (CSVParser p = csv.parser()) {
            Map<String, Integer> header = p.getHeaderMap();
            if (!CsvText.has(p, "section")) {
                throw new PlanInputException(file + ": line 1: the header has no 'section' column");
            }
            for (CSVRecord r : p) {
                String where = file + ": line " + csv.lineOf(r) + ": ";
                if (!r.isConsistent() && r.size() > header.size()) {
                    throw new PlanInputException(where + r.size() + " fields, the header has " + header.size());
                }
                if (optional && CsvText.cell(r, "stock_lengths_mm").isEmpty() && CsvText.cell(r, "coil_kg").isEmpty()) {
                    continue;
                }
                rows.add(row(where, r));
            }
        } catch (IOException | UncheckedIOException | IllegalArgumentException | IllegalStateException e) {
            throw new PlanInputException(file + ": not a readable CSV table: " + e.getMessage());
        }
        return new StockTable(rows);
    }

    private static SectionStock row(String where, CSVRecord r) throws PlanInputException {
        String section = CsvText.cell(r, "section");
        if (section.isEmpty()) {
            throw new PlanInputException(where + "empty section");
        }
        List<Double> lengths = numbers(where, "stock_lengths_mm", CsvText.cell(r, "stock_lengths_mm"));
        List<Double> counts = new ArrayList<>();
        String countText = CsvText.cell(r, "stock_counts");
        if (!countText.isEmpty()) {
            for (String part : countText.split(";", -1)) {
                counts.add(single(where, "stock_counts", part.strip(), -1));
            }
        }
        if (!counts.isEmpty() && counts.size() != lengths.size()) {
            throw new PlanInputException(where + "stock_counts has " + counts.size() + " values for "
                    + lengths.size() + " stock lengths");
        }
        List<StockLength> stock = new ArrayList<>();
        for (int i = 0; i < lengths.size(); i++) {
            double c = counts.isEmpty() ? -1 : counts.get(i);
            // an empty count in the list means unlimited
            if (c >= 0 && c != Math.rint(c)) {
                throw new PlanInputException(where + "stock_counts: " + c + " is not a whole number");
            }
            if (!(lengths.get(i) > 0)) {
                throw new PlanInputException(where + "stock_lengths_mm: " + lengths.get(i) + " is not positive");
            }
            stock.add(new StockLength(lengths.get(i) / 1000.0, c >= 0 ? (int) c : null));
        }
        double kerf = single(where, "kerf_mm", CsvText.cell(r, "kerf_mm"), 0) / 1000.0;
        double min = single(where, "min_offcut_mm", CsvText.cell(r, "min_offcut_mm"), 0) / 1000.0;
        String coilText = CsvText.cell(r, "coil_kg");
        Double coil = coilText.isEmpty() ? null : single(where, "coil_kg", coilText, 0);
        if (stock.isEmpty() == (coil == null)) {
            throw new PlanInputException(where + "give either stock_lengths_mm or coil_kg for " + section);
        }
        try {
            return new SectionStock(section, stock, kerf, min, coil);
        } catch (IllegalArgumentException e) {
            throw new PlanInputException(where + e.getMessage());
        }
    }

    private static List<Double> numbers(String where, String column, String text) throws PlanInputException {
        List<Double> out = new ArrayList<>();
        if (text.isEmpty()) {
            return out;
        }
        for (String part : text.split(";", -1)) {
            out.add(single(where, column, part.strip(), Double.NaN));
        }
        return out;
    }

    private static double single(String where, String column, String text, double empty) throws PlanInputException {
        if (text.isEmpty()) {
            if (Double.isNaN(empty)) {
                throw new PlanInputException(where + column + ": empty value in a list");
            }
            return empty;
        }
        try {
            double v = Double.parseDouble(text);
            if (!Double.isFinite(v) || v < 0) {
                throw new PlanInputException(where + column + ": " + text + " is not a finite number of at least 0");
            }
            return v;
        } catch (NumberFormatException e) {
            throw new PlanInputException(where + column + ": '" + text + "' is not a number");
        }
    }
}
