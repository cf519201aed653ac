package org.linemass.plan.cost;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVRecord;
import org.linemass.plan.stock.CsvText;
import org.linemass.plan.stock.PlanInputException;

/**
 * Reads a price table: CSV (RFC 4180, UTF-8, an optional byte-order mark) with a header row naming
 * the columns, in any order and any case:
 * <ul>
 * <li>{@code charge} (required): one of {@link Charge#names()}</li>
 * <li>{@code unit_price} (required): the price of one unit (one kg, bar, coil, cut, bend or weld),
 * a number of at least 0 written with a decimal point</li>
 * <li>{@code section}, {@code material} (optional): globs ({@code *}, {@code ?}) of the section id
 * and material the price applies to; empty applies to all</li>
 * <li>{@code stock_length_mm} (optional, {@code per_bar} only): the stock length the bar price is for</li>
 * <li>{@code currency} (optional): the same on every row that names one</li>
 * </ul>
 * Other columns (a {@code note}, say) are ignored; so are blank lines and lines starting with
 * {@code #}. Every error names the file, the line and the column and is a {@link PlanInputException}.
 */
public final class PriceTableReader {

    private PriceTableReader() {
    }

    public static PriceTable read(Path file) throws IOException, PlanInputException {
        String text = Files.readString(file, StandardCharsets.UTF_8);
        String name = file.getFileName() == null ? file.toString() : file.getFileName().toString();
        return read(text, file.toString(), name);
    }

    /** Reads the table from {@code text}; {@code where} names it in messages. */
    static PriceTable read(String text, String where, String fileName) throws PlanInputException {
        List<UnitPrice> rows = new ArrayList<>();
        Map<String, Integer> currencies = new TreeMap<>();
        CsvText csv = CsvText.of(text);
        try (CSVParser p = csv.parser()) {
            for (String need : List.of("charge", "unit_price")) {
                if (!CsvText.has(p, need)) {
                    throw new PlanInputException(where + ": the header has no '" + need + "' column");
                }
            }
            for (CSVRecord r : p) {
                int line = (int) csv.lineOf(r);
                rows.add(row(r, where + ": line " + line + ": ", line));
                String c = CsvText.cell(r, "currency");
                if (!c.isEmpty()) {
                    currencies.putIfAbsent(c, line);
                }
            }
        } catch (IOException | UncheckedIOException | IllegalArgumentException | IllegalStateException e) {
            throw new PlanInputException(where + ": not a readable CSV table: " + e.getMessage());
        }
        if (rows.isEmpty()) {
            throw new PlanInputException(where + ": no price rows");
        }
        if (currencies.size() > 1) {
            throw new PlanInputException(where + ": more than one currency (" + String.join(", ", currencies.keySet())
                    + "): one table holds prices in one currency");
        }
        return new PriceTable(rows, currencies.isEmpty() ? "" : currencies.keySet().iterator().next(), fileName);
    }

    private static UnitPrice row(CSVRecord r, String where, int line) throws PlanInputException {
        if (!r.isConsistent()) {
            throw new PlanInputException(where + r.size() + " fields, the header has " + r.getParser().getHeaderNames().size());
        }
        String chargeText = CsvText.cell(r, "charge");
        Charge charge = Charge.of(chargeText).orElseThrow(() -> new PlanInputException(where + "charge: '" + chargeText
                + "' is not one of " + Charge.names()));
        double price = number(where, "unit_price", CsvText.cell(r, "unit_price"));
        String lengthText = CsvText.cell(r, "stock_length_mm");
        Double length = null;
        if (!lengthText.isEmpty()) {
            if (charge != Charge.PER_BAR) {
                throw new PlanInputException(where + "stock_length_mm: only a per_bar price is for a stock length");
            }
            length = number(where, "stock_length_mm", lengthText) / 1000.0;
            if (!(length > 0)) {
                throw new PlanInputException(where + "stock_length_mm: " + lengthText + " is not positive");
            }
        }
        return new UnitPrice(charge, CsvText.cell(r, "section"), CsvText.cell(r, "material"), length, price, line);
    }

    private static double number(String where, String column, String text) throws PlanInputException {
        if (text.isEmpty()) {
            throw new PlanInputException(where + column + " is empty");
        }
        try {
            double v = Double.parseDouble(text);
            if (!Double.isFinite(v) || v < 0) {
                throw new PlanInputException(where + column + ": " + text + " is not a finite number of at least 0");
            }
            return v;
        } catch (NumberFormatException e) {
            String hint = text.matches("[+-]?\\d+,\\d+") ? " (write decimals with a point: " + text.replace(',', '.')
                    + ")" : "";
            throw new PlanInputException(where + column + ": '" + text + "' is not a number" + hint);
        }
    }
}
