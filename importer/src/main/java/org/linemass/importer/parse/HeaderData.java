package org.linemass.importer.parse;

import org.linemass.importer.read.Record;

/**
 * The HEADER variables the importer uses: $ACADVER (1), $INSUNITS (70), $MEASUREMENT (70) and
 * $DWGCODEPAGE (3). Everything else, $EXTMIN/$EXTMAX included, is ignored. -1 means absent.
 */
record HeaderData(String acadVer, int insunits, int measurement, String codePage) {

    static final HeaderData NONE = new HeaderData("", -1, -1, "");

    /** Reads the variables from the HEADER section record (9 name, then its value groups). */
    static HeaderData read(Record r) {
        String ver = "";
        int ins = -1;
        int meas = -1;
        String cp = "";
        String var = "";
        for (int i = 0; i < r.size(); i++) {
            int code = r.code(i);
            if (code == 9) {
                var = r.str(i) == null ? "" : r.str(i);
                continue;
            }
            switch (var) {
                case "$ACADVER" -> {
                    if (code == 1 && r.str(i) != null) {
                        ver = r.str(i).trim();
                    }
                }
                case "$INSUNITS" -> {
                    if (code == 70 && Double.isFinite(r.num(i))) {
                        ins = (int) r.num(i);
                    }
                }
                case "$MEASUREMENT" -> {
                    if (code == 70 && Double.isFinite(r.num(i))) {
                        meas = (int) r.num(i);
                    }
                }
                case "$DWGCODEPAGE" -> {
                    if (code == 3 && r.str(i) != null) {
                        cp = r.str(i).trim();
                    }
                }
                default -> {
                }
            }
        }
        return new HeaderData(ver, ins, meas, cp);
    }

    /** These variables, each replaced by {@code later}'s where that one gives it (a HEADER read in parts). */
    HeaderData then(HeaderData later) {
        return new HeaderData(later.acadVer.isEmpty() ? acadVer : later.acadVer,
                later.insunits < 0 ? insunits : later.insunits, later.measurement < 0 ? measurement : later.measurement,
                later.codePage.isEmpty() ? codePage : later.codePage);
    }

    /** True for AC1021 (2007) and later, whose strings are UTF-8. */
    boolean utf8() {
        if (acadVer.length() == 6 && acadVer.startsWith("AC")) {
            try {
                return Integer.parseInt(acadVer.substring(2)) >= 1021;
            } catch (NumberFormatException e) {
                return false;
            }
        }
        return false;
    }
}
