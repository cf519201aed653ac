package org.linemass.reports.plan;

import java.util.List;
import org.linemass.reports.xlsx.SheetRows;
import org.linemass.reports.xlsx.XlsxSheet;

/** Plan tables as spreadsheet sheets (numbers as numeric cells). */
public final class PlanSheets {

    private PlanSheets() {
    }

    public static XlsxSheet of(PlanTable table) {
        return new XlsxSheet() {
            @Override
            public String name() {
                return table.name();
            }

            @Override
            public List<String> header() {
                return table.header();
            }

            @Override
            public void fill(SheetRows rows) {
                for (List<Object> r : table.rows()) {
                    for (Object c : r) {
                        if (c == null) {
                            rows.blank();
                        } else if (c instanceof PlanTable.Num n) {
                            rows.number(n.value(), n.decimals());
                        } else if (c instanceof Long l) {
                            rows.integer(l);
                        } else {
                            rows.text(c.toString());
                        }
                    }
                    rows.end();
                }
            }
        };
    }
}
