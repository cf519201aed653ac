package org.linemass.app.serve;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.OutputStreamWriter;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.util.List;
import java.util.Locale;
import org.linemass.engine.section.LayerAssignment;
import org.linemass.reports.Report;
import org.linemass.reports.UnitSystem;
import org.linemass.reports.csv.BomCsvWriter;
import org.linemass.reports.csv.CsvCell;
import org.linemass.reports.csv.FindingsCsvWriter;
import org.linemass.reports.csv.PiecesCsvWriter;
import org.linemass.reports.dxf.DxfMarkupWriter;
import org.linemass.reports.html.HtmlReportWriter;
import org.linemass.reports.json.JsonReportWriter;
import org.linemass.reports.xlsx.CheckSheets;
import org.linemass.reports.xlsx.XlsxWorkbook;

/**
 * The files a page offers, made by the command line's writers so that they are byte for byte what
 * {@code linemass check} writes for the same drawings and sections: the spreadsheet (bill, pieces,
 * findings and layers sheets), bill, pieces and findings CSV (with the same byte-order mark), the JSON and HTML reports, the marked-up DXF of one drawing, and
 * the tab's assignment file (its uploaded rules, then one row per pick) for the next run.
 */
final class Downloads {

    /** A file to send: its name (made here, never taken from a request), type and bytes. */
    record File(String name, String type, byte[] content) {
    }

    /** Writes text. */
    @FunctionalInterface
    private interface Text {
        void write(Writer w) throws IOException;
    }

    private final UnitSystem units;

    Downloads(UnitSystem units) {
        this.units = units;
    }

    /**
     * @param kind one of report.xlsx, bom.csv, pieces.csv, findings.csv, report.json, report.html, markup.dxf,
     *     assignments.csv
     * @param one the drawing asked for, or null for all of them
     */
    File make(String kind, List<Report> reports, LoadedDrawing one, Session s) throws Problem, IOException {
        if ("assignments.csv".equals(kind)) {
            return new File("linemass-assignments.csv", "text/csv; charset=utf-8", text(false, w -> {
                w.write("layer,section\n");
                for (LayerAssignment a : s.rules()) {
                    w.write(CsvCell.quote(a.layerGlob()) + "," + CsvCell.quote(a.sectionId()) + "\n");
                }
            }));
        }
        if (reports.isEmpty()) {
            throw new Problem(409, "no drawing has been read yet: drop a DXF file on the page first");
        }
        String base = one == null ? (reports.size() == 1 ? stem(reports.get(0).result().drawing().file()) : "linemass")
                : stem(one.name);
        switch (kind) {
            case "bom.csv":
                return new File(base + "-bom.csv", "text/csv; charset=utf-8",
                        text(true, w -> BomCsvWriter.write(reports, units, w)));
            case "pieces.csv":
                return new File(base + "-pieces.csv", "text/csv; charset=utf-8",
                        text(true, w -> PiecesCsvWriter.write(reports, units, w)));
            case "findings.csv":
                return new File(base + "-findings.csv", "text/csv; charset=utf-8",
                        text(true, w -> FindingsCsvWriter.write(reports, units, w)));
            case "report.xlsx":
                ByteArrayOutputStream book = new ByteArrayOutputStream();
                XlsxWorkbook.write(CheckSheets.of(reports, units), book);
                return new File(base + ".xlsx", "application/vnd.openxmlformats-officedocument.spreadsheetml.sheet",
                        book.toByteArray());
            case "report.json":
                return new File(base + ".json", "application/json; charset=utf-8",
                        text(false, w -> JsonReportWriter.write(reports, w)));
            case "report.html":
                return new File(base + ".html", "text/html; charset=utf-8",
                        text(false, w -> new HtmlReportWriter(units).write(reports, w)));
            case "markup.dxf":
                if (one == null) {
                    throw new Problem(400, "the marked-up DXF is made for one drawing at a time: say which");
                }
                ByteArrayOutputStream out = new ByteArrayOutputStream();
                DxfMarkupWriter.write(one.bytes, reports.get(0).result(), out);
                return new File(base + "-findings.dxf", "application/dxf", out.toByteArray());
            default:
                throw new Problem(404, "no download '" + kind + "'");
        }
    }

    private static byte[] text(boolean byteOrderMark, Text t) throws IOException {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        Writer w = new OutputStreamWriter(out, StandardCharsets.UTF_8);
        if (byteOrderMark) {
            w.write('\uFEFF');
        }
        t.write(w);
        w.flush();
        return out.toByteArray();
    }

    /** A safe file-name stem from a drawing's name: letters, digits, '.', '-' and '_' only. */
    static String stem(String name) {
        String n = name.substring(Math.max(name.lastIndexOf('/'), name.lastIndexOf('\\')) + 1);
        int dot = n.toLowerCase(Locale.ROOT).lastIndexOf(".dxf");
        if (dot > 0) {
            n = n.substring(0, dot);
        }
        n = n.replaceAll("[^A-Za-z0-9._-]", "_");
        n = n.replaceAll("^[._]+", "");
        return n.isEmpty() ? "drawing" : n.length() > 100 ? n.substring(0, 100) : n;
    }
}
