package org.linemass.reports.xlsx;

import java.util.List;
import org.linemass.engine.result.DrawingResult;
import org.linemass.reports.Caution;
import org.linemass.reports.Report;
import org.linemass.reports.UnitSystem;

/**
 * The first sheet: one row per drawing (file, DXF version, drawing units, whether it was read
 * completely and why not), then the units of the other sheets and the caution.
 */
final class AboutSheet implements XlsxSheet {

    private final List<Report> reports;
    private final UnitSystem units;

    AboutSheet(List<Report> reports, UnitSystem units) {
        this.reports = reports;
        this.units = units;
    }

    @Override
    public String name() {
        return "about";
    }

    @Override
    public List<String> header() {
        return List.of("drawing", "DXF version", "drawing units", "complete", "left out");
    }

    @Override
    public void fill(SheetRows rows) {
        for (Report report : reports) {
            DrawingResult r = report.result();
            rows.text(r.drawing().file()).text(r.drawing().dxfVersion()).text(r.drawing().unit().symbol())
                    .text(r.complete() ? "yes" : "no").text(String.join("; ", r.incompleteReasons())).end();
        }
        rows.blank().blank().blank().blank().blank().end();
        rows.text("units").text("lengths " + units.shortUnit() + ", coordinates " + units.longUnit() + ", mass "
                + units.massUnit()).blank().blank().blank().end();
        rows.text("caution").text(Caution.TEXT).blank().blank().blank().end();
    }
}
