package org.linemass.reports.csv;

import java.io.IOException;
import java.io.Writer;
import java.util.ArrayList;
import java.util.List;
import org.linemass.engine.bender.BenderProgram;
import org.linemass.engine.bender.BenderStep;
import org.linemass.engine.result.DrawingResult;
import org.linemass.engine.result.PieceResult;
import org.linemass.engine.shape.BendLimit;
import org.linemass.geometry.Vec3;
import org.linemass.reports.Report;
import org.linemass.reports.UnitSystem;

/**
 * Bender data of every piece, one block of rows per piece (column {@code piece}): a {@code start}
 * row (start point), a {@code direction} row (the unit feed direction, to 1e-9), a {@code plane}
 * row (the unit normal of the first bending plane, the reference for the rotations), one row per step from that end ({@code bend} or {@code coil}:
 * feed, rotation of the bending plane about the feed direction, right-handed, degrees; bend angle;
 * centre-line radius; arc length; for a coil turns and pitch; whether the step reproduces the drawing
 * exactly), an {@code end} row with the last feed, then {@code corner} rows: the corner points of the
 * straights (start, the intersection of the straight lines at each bend, end), and a {@code limit} row:
 * the section's minimum inside bend radius in the radius column (empty when none is known) with its
 * basis and the number of bends below it in the note column. Lengths in mm to 0.001,
 * points in world mm, angles to 0.0001 degree. Geometry only: springback is the machine's business.
 */
public final class BenderCsvWriter {

    private BenderCsvWriter() {
    }

    public static void write(List<Report> reports, Writer out) throws IOException {
        boolean multi = reports.size() > 1;
        CsvTable table = CsvTable.withDrawingColumn(out, multi, List.of("piece", "mark", "row", "feed [mm]",
                "rotation [deg]", "bend angle [deg]", "radius [mm]", "arc length [mm]", "turns", "pitch [mm]",
                "x [mm]", "y [mm]", "z [mm]", "exact", "note"));
        for (Report report : reports) {
            DrawingResult r = report.result();
            for (PieceResult p : r.pieces()) {
                BenderProgram prog = p.form().program();
                String id = Integer.toString(p.id());
                String mark = CsvCell.text(p.mark());
                table.row(row(multi, r, id, mark, "start", "", "", "", "", "", "", "", prog.startM(), ""));
                table.row(unit(row(multi, r, id, mark, "direction", "", "", "", "", "", "", "", null, ""),
                        prog.startDirection()));
                table.row(unit(row(multi, r, id, mark, "plane", "", "", "", "", "", "", "", null, ""),
                        prog.firstPlaneNormal()));
                for (BenderStep s : prog.steps()) {
                    boolean coil = s.kind() == BenderStep.Kind.COIL;
                    table.row(row(multi, r, id, mark, coil ? "coil" : "bend", len(s.feedM()), deg(s.rotationDeg()),
                            deg(s.angleDeg()), len(s.radiusM()), len(s.arcLengthM()),
                            coil ? UnitSystem.fixed(s.turns(), 4) : "", coil ? len(s.pitchM()) : "", null,
                            s.exact() ? "yes" : "no"));
                }
                table.row(row(multi, r, id, mark, "end", len(prog.lastFeedM()), "", "", "", "", "", "", null, ""));
                for (Vec3 c : prog.cornersM()) {
                    table.row(row(multi, r, id, mark, "corner", "", "", "", "", "", "", "", c, ""));
                }
                BendLimit limit = p.form().limit();
                List<String> last = row(multi, r, id, mark, "limit", "", "", "", limit.known()
                        ? len(limit.insideRadiusM()) : "", "", "", "", null, "");
                long below = p.form().bendsBelowLimit();
                last.set(last.size() - 1, CsvCell.text(limit.known() ? "minimum inside radius (" + limit.basis() + "); "
                        + below + (below == 1 ? " bend" : " bends") + " below it" : "none known: " + limit.basis()));
                table.row(last);
            }
        }
    }

    private static List<String> row(boolean multi, DrawingResult r, String id, String mark, String kind, String feed,
            String rotation, String angle, String radius, String arc, String turns, String pitch, Vec3 point,
            String exact) {
        List<String> row = new ArrayList<>();
        if (multi) {
            row.add(CsvCell.text(r.drawing().file()));
        }
        row.addAll(List.of(id, mark, kind, feed, rotation, angle, radius, arc, turns, pitch));
        if (point == null) {
            row.addAll(List.of("", "", ""));
        } else {
            row.add(len(point.x()));
            row.add(len(point.y()));
            row.add(len(point.z()));
        }
        row.add(exact);
        row.add("");
        return row;
    }

    /** The row with the unit vector's components (to 1e-9) in the x, y, z columns. */
    private static List<String> unit(List<String> row, Vec3 v) {
        int x = row.size() - 5;
        row.set(x, UnitSystem.fixed(v.x(), 9));
        row.set(x + 1, UnitSystem.fixed(v.y(), 9));
        row.set(x + 2, UnitSystem.fixed(v.z(), 9));
        return row;
    }

    private static String len(double m) {
        return UnitSystem.fixed(m * 1000, 3);
    }

    private static String deg(double d) {
        return UnitSystem.fixed(d, 4);
    }
}
