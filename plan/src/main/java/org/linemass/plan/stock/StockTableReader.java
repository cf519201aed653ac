package org.linemass.plan.stock;

import java.io.BufferedReader;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;

/**
 * Reads a stock table: a CSV file with a header row naming the columns {@code section} (a name or
 * glob), {@code stock_lengths_mm} (lengths separated by {@code ;}), {@code stock_counts} (optional,
 * counts in the same order, an empty entry for unlimited), {@code kerf_mm}, {@code min_offcut_mm} and
 * {@code coil_kg} (for wire in coils; then no stock lengths). Columns may come in any order;
 * unknown columns and blank lines and lines starting with {@code #} are ignored. Every error names
 * the file, the line and the column.
 */
public final class StockTableReader {

    private StockTableReader() {
    }

    public static StockTable read(Path file) throws IOException, PlanInputException {
        List<SectionStock> rows = new ArrayList<>();
        try (BufferedReader r = Files.newBufferedReader(file, StandardCharsets.UTF_8)) {
            List<String> header = null;
            String line;
            int no = 0;
            while ((line = r.readLine()) != null) {
                no++;
                if (no == 1 && line.startsWith("\uFEFF")) {
                    line = line.substring(1);
                }
                if (line.isBlank() || line.startsWith("#")) {
                    continue;
                }
                List<String> cells = Arrays.stream(line.split(",", -1)).map(String::strip).toList();
                if (header == null) {
                    header = cells.stream().map(c -> c.toLowerCase(Locale.ROOT)).toList();
                    if (!header.contains("section")) {
                        throw new PlanInputException(file + ": line " + no + ": the header has no 'section' column");
                    }
                    continue;
                }
                rows.add(row(file, no, header, cells));
            }
            if (rows.isEmpty()) {
                throw new PlanInputException(file + ": no stock rows");
            }
        }
        return new StockTable(rows);
    }

    private static SectionStock row(Path file, int no, List<String> header, List<String> cells)
            throws PlanInputException {
        String where = file + ": line " + no + ": ";
        if (cells.size() > header.size()) {
            throw new PlanInputException(where + cells.size() + " fields, the header has " + header.size());
        }
        String section = cell(header, cells, "section");
        if (section.isEmpty()) {
            throw new PlanInputException(where + "empty section");
        }
        List<Double> lengths = numbers(where, "stock_lengths_mm", cell(header, cells, "stock_lengths_mm"));
        List<Double> counts = new ArrayList<>();
        String countText = cell(header, cells, "stock_counts");
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
        double kerf = single(where, "kerf_mm", cell(header, cells, "kerf_mm"), 0) / 1000.0;
        double min = single(where, "min_offcut_mm", cell(header, cells, "min_offcut_mm"), 0) / 1000.0;
        String coilText = cell(header, cells, "coil_kg");
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

    private static String cell(List<String> header, List<String> cells, String name) {
        int i = header.indexOf(name);
        return i < 0 || i >= cells.size() ? "" : cells.get(i);
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
