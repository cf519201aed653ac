package org.linemass.reports.xlsx;

import java.util.List;
import org.linemass.engine.result.LayerResult;
import org.linemass.geometry.Vec3;
import org.linemass.reports.Report;
import org.linemass.reports.UnitSystem;

/**
 * Totals per layer: name, section, pieces, length (duplicates counted once) and drawn length,
 * mass, and the centre of gravity (of the mass where the layer has a section, else of the length).
 */
final class LayersSheet implements XlsxSheet {

    private final List<Report> reports;
    private final UnitSystem units;

    LayersSheet(List<Report> reports, UnitSystem units) {
        this.reports = reports;
        this.units = units;
    }

    @Override
    public String name() {
        return "layers";
    }

    @Override
    public List<String> header() {
        String lu = units.longUnit();
        return CheckSheets.header(reports, List.of("layer", "section", "pieces", "length [" + lu + "]",
                "drawn length [" + lu + "]", "mass [" + units.massUnit() + "]",
                "cog x [" + lu + "]", "cog y [" + lu + "]", "cog z [" + lu + "]", "cog of"));
    }

    @Override
    public void fill(SheetRows rows) {
        for (Report report : reports) {
            for (LayerResult l : report.result().layers()) {
                Vec3 cog = l.centroidM() != null ? l.centroidM() : l.lengthCentroidM();
                CheckSheets.start(rows, reports, report).text(l.name()).text(l.section()).integer(l.pieces())
                        .number(units.inLongUnit(l.lengthM()), units.longDecimals())
                        .number(units.inLongUnit(l.drawnLengthM()), units.longDecimals())
                        .number(l.massKg() == null ? null : units.inMassUnit(l.massKg()), units.massDecimals(l.massKg()));
                PiecesSheet.point(rows, cog, units);
                rows.text(cog == null ? "" : l.centroidM() != null ? "mass" : "length").end();
            }
        }
    }
}
