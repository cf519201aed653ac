package org.linemass.reports.plan;

import java.io.IOException;
import java.io.Writer;
import java.util.ArrayList;
import java.util.List;
import org.linemass.reports.UnitSystem;
import org.linemass.reports.csv.CsvCell;
import org.linemass.reports.csv.CsvTable;

/** One plan table as CSV: RFC 4180, Locale.ROOT numbers with fixed decimals, text cells guarded. */
public final class PlanCsv {

    private PlanCsv() {
    }

    public static void write(PlanTable table, Writer out) throws IOException {
        CsvTable csv = new CsvTable(out, table.header());
        for (List<Object> r : table.rows()) {
            List<String> cells = new ArrayList<>();
            for (Object c : r) {
                cells.add(text(c));
            }
            csv.row(cells);
        }
    }

    static String text(Object c) {
        if (c == null) {
            return "";
        }
        if (c instanceof PlanTable.Num n) {
            return UnitSystem.fixed(n.value(), n.decimals());
        }
        if (c instanceof Long l) {
            return Long.toString(l);
        }
        return CsvCell.text(c.toString());
    }
}
