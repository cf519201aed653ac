package org.linemass.spark;

import java.util.ArrayList;
import java.util.List;
import org.apache.spark.sql.Row;
import org.apache.spark.sql.RowFactory;
import org.linemass.engine.result.DrawingResult;
import org.linemass.engine.result.Finding;
import org.linemass.engine.result.LayerResult;
import org.linemass.engine.result.MarkResult;
import org.linemass.engine.result.Severity;
import org.linemass.geometry.Vec3;
import org.linemass.reports.DrawingOutcome;
import org.linemass.reports.UnitSystem;
import org.linemass.reports.csv.PiecesCsvWriter;

/**
 * One drawing's row of {@link Tables#ANALYSED}: what {@code check}'s summary, bill, findings and
 * layer reports say of it, each number as a double and as the text those reports print. The text
 * of each column comes from the {@link UnitSystem} call the matching CSV column of {@code check}
 * uses (summary: {@code SummaryCsvWriter}; bill: {@code BomCsvWriter}'s multi-drawing form;
 * findings: {@code FindingsCsvWriter}; layers: the numbers of the JSON report and the decimals of
 * the spreadsheet's layers sheet), metric.
 */
final class ResultRows {

    private static final UnitSystem UNITS = UnitSystem.METRIC;

    private ResultRows() {
    }

    /** The row of a drawing that was analysed. */
    static Row analysed(String path, long bytes, DrawingOutcome o) {
        DrawingResult r = o.report().result();
        long[] bySeverity = new long[3];
        for (Finding f : r.findings()) {
            bySeverity[f.severity() == Severity.ERROR ? 0 : f.severity() == Severity.WARNING ? 1 : 2]++;
        }
        String message = r.complete() ? null : String.join("; ", r.incompleteReasons());
        Double mass = r.totals().massKg();
        return RowFactory.create(r.drawing().file(), path, bytes, o.status(), message,
                r.totals().lengthM(), mass, r.pieces().size(), r.groups().size(),
                bySeverity[0], bySeverity[1], bySeverity[2], seconds(o.elapsedNanos()),
                UNITS.longLength(r.totals().lengthM()), UNITS.mass(mass),
                seq(layers(r)), seq(bill(r)), seq(findings(r)));
    }

    /** The row of a drawing that could not be read or analysed: its status and one-line message only. */
    static Row failed(String drawing, String path, long bytes, String status, String message, long nanos) {
        return RowFactory.create(drawing, path, bytes, status, message, null, null, null, null, null, null, null,
                seconds(nanos), null, null, seq(List.of()), seq(List.of()), seq(List.of()));
    }

    private static List<Row> layers(DrawingResult r) {
        List<Row> rows = new ArrayList<>(r.layers().size());
        for (LayerResult l : r.layers()) {
            Vec3 cog = l.centroidM() != null ? l.centroidM() : l.lengthCentroidM();
            rows.add(RowFactory.create(l.name(), l.section(), l.pieces(), l.lengthM(), l.drawnLengthM(), l.massKg(),
                    cog == null ? null : cog.x(), cog == null ? null : cog.y(), cog == null ? null : cog.z(),
                    cog == null ? null : l.centroidM() != null ? "mass" : "length", l.errorBoundM(),
                    UNITS.longLength(l.lengthM()), UNITS.longLength(l.drawnLengthM()), UNITS.mass(l.massKg())));
        }
        return rows;
    }

    private static List<Row> bill(DrawingResult r) {
        List<Row> rows = new ArrayList<>(r.groups().size());
        for (MarkResult m : r.groups()) {
            rows.add(RowFactory.create(m.mark(), m.quantity(), m.section(), m.material(), m.lengthEachM(),
                    m.bendsEach(), m.massEachKg(), m.massTotalKg(), m.layer(), m.lengthTotalM(),
                    UNITS.shortLength(m.lengthEachM()), UNITS.mass(m.massEachKg()), UNITS.mass(m.massTotalKg()),
                    UNITS.longLength(m.lengthTotalM())));
        }
        return rows;
    }

    private static List<Row> findings(DrawingResult r) {
        List<Row> rows = new ArrayList<>(r.findings().size());
        int n = 0;
        for (Finding f : r.findings()) {
            n++;
            Vec3 p = f.atM();
            rows.add(RowFactory.create(n, f.kind(), f.severity().jsonName(),
                    p == null ? null : p.x(), p == null ? null : p.y(), p == null ? null : p.z(), f.sizeM(),
                    f.layer(), f.massKg(), PiecesCsvWriter.refs(f.entities()), f.message(),
                    UNITS.longLength(p == null ? null : p.x()), UNITS.longLength(p == null ? null : p.y()),
                    UNITS.longLength(p == null ? null : p.z()), UNITS.defectSize(f.sizeM()), UNITS.mass(f.massKg())));
        }
        return rows;
    }

    /** A list as the row encoder wants an array column: a Scala sequence. */
    private static scala.collection.immutable.Seq<Row> seq(List<Row> rows) {
        return scala.jdk.javaapi.CollectionConverters.asScala(rows).toSeq();
    }

    private static double seconds(long nanos) {
        return nanos / 1e9;
    }
}
