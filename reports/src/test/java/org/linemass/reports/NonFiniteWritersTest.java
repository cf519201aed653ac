package org.linemass.reports;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.linemass.engine.result.DrawingResult;
import org.linemass.engine.result.Finding;
import org.linemass.engine.result.MarkResult;
import org.linemass.engine.result.PieceResult;
import org.linemass.engine.result.Totals;
import org.linemass.geometry.Vec3;
import org.linemass.reports.console.ConsoleReport;
import org.linemass.reports.csv.BomCsvWriter;
import org.linemass.reports.csv.FindingsCsvWriter;
import org.linemass.reports.csv.PiecesCsvWriter;
import org.linemass.reports.dxf.DxfMarkupWriter;
import org.linemass.reports.html.HtmlReportWriter;
import org.linemass.reports.json.JsonReportWriter;

/**
 * A result holding NaN and infinite lengths and masses (the frame fixture with its totals, first
 * piece and first mark broken) must never reach a reader as "NaN", "Infinity" or "inf": every
 * text writer stops with {@link NonFiniteNumber}; the JSON report, whose schema allows null for an
 * unknown value, writes null; the marked-up DXF leaves out places it cannot write.
 */
class NonFiniteWritersTest {

    private static final String DXF = "  0\nSECTION\n  2\nENTITIES\n  0\nENDSEC\n  0\nEOF\n";

    /** The frame fixture with a total length and mass that are NaN. */
    private static List<Report> broken() {
        DrawingResult ok = Fixtures.frame("f.dxf", 0, false);
        Totals t = ok.totals();
        Totals nan = new Totals(Double.NaN, t.drawnLengthM(), t.lengthCentroidM(), t.lengthInertiaM3(), Double.NaN,
                t.centroidM(), t.inertiaKgM2(), t.massComplete(), t.errorBoundM());
        PieceResult p = ok.pieces().get(0);
        List<PieceResult> pieces = new java.util.ArrayList<>(ok.pieces());
        pieces.set(0, new PieceResult(p.id(), p.layer(), p.section(), Double.NaN, p.massKg(), p.centroidM(),
                p.lengthInertiaM3(), p.inertiaKgM2(), p.startM(), p.endM(), p.closed(), p.segments(), p.mark(), p.bends(),
                p.sources(), p.errorBoundM()));
        MarkResult m = ok.groups().get(0);
        List<MarkResult> marks = new java.util.ArrayList<>(ok.groups());
        marks.set(0, new MarkResult(m.mark(), m.quantity(), m.layer(), m.section(), m.material(), Double.NaN,
                m.massEachKg(), Double.POSITIVE_INFINITY, m.massTotalKg(), m.bendsEach(), m.pieceIds()));
        return List.of(Report.of(new DrawingResult(ok.drawing(), ok.entities(), ok.layers(), pieces, marks,
                ok.findings(), nan, ok.sections(), ok.incompleteReasons())));
    }

    @Test
    void textWriters_refuseANonFiniteNumber() {
        UnitSystem u = UnitSystem.METRIC;
        assertThrows(NonFiniteNumber.class, () -> new ConsoleReport(u, false, false).print(broken(),
                new PrintWriter(new StringWriter())));
        assertThrows(NonFiniteNumber.class, () -> BomCsvWriter.write(broken(), u, new StringWriter()));
        assertThrows(NonFiniteNumber.class, () -> PiecesCsvWriter.write(broken(), u, new StringWriter()));
        assertThrows(NonFiniteNumber.class, () -> new HtmlReportWriter(u).write(broken(), new StringWriter()));
        assertThrows(NonFiniteNumber.class, () -> UnitSystem.fixed(Double.POSITIVE_INFINITY, 3));
        assertThrows(NonFiniteNumber.class, () -> UnitSystem.fixed(Double.NaN, 0));
    }

    @Test
    void findingsCsv_refusesAFindingOfNonFiniteSize() {
        List<Report> r = List.of(Report.of(Fixtures.frame("f.dxf", 0, false)));
        // a clean result writes; the same writers then get a finding whose size is not finite
        assertFalse(write(r).contains("NaN"));
        DrawingResult ok = Fixtures.frame("f.dxf", 0, false);
        Finding f = ok.findings().get(0);
        Finding nan = new Finding(f.kind(), f.severity(), f.atM(),
                Double.NaN, f.layer(), f.entities(), null, f.message());
        List<Report> bad = List.of(Report.of(new DrawingResult(ok.drawing(), ok.entities(),
                ok.layers(), ok.pieces(), ok.groups(), List.of(nan), ok.totals(), ok.sections(),
                ok.incompleteReasons())));
        assertThrows(NonFiniteNumber.class, () -> FindingsCsvWriter.write(bad, UnitSystem.METRIC, new StringWriter()));
    }

    @Test
    void markup_findingsBeyondTheRangeOfDrawingUnits_leftOutNeverWrittenAsInfinity() throws IOException {
        // places of 1e307 m are finite, in millimetres (x 1000) they are not; their span overflows too
        DrawingResult ok = Fixtures.frame("f.dxf", 0, false);
        Finding f = ok.findings().get(0);
        List<Finding> far = List.of(
                new Finding(f.kind(), f.severity(), new Vec3(1e307, 0, 0), f.sizeM(), f.layer(), f.entities(), null, "far"),
                new Finding(f.kind(), f.severity(), new Vec3(-1e307, 0, 0), f.sizeM(), f.layer(), f.entities(), null, "far"),
                f);
        DrawingResult r = new DrawingResult(ok.drawing(), ok.entities(), ok.layers(), ok.pieces(), ok.groups(), far,
                ok.totals(), ok.sections(), ok.incompleteReasons());
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        DxfMarkupWriter.write(DXF.getBytes(StandardCharsets.ISO_8859_1), r, out);
        String text = out.toString(StandardCharsets.ISO_8859_1);
        assertFalse(text.contains("Infinity") || text.contains("NaN"), text);
        assertTrue(text.contains("3 gap"), "the finding inside the range is still marked: " + text);
    }

    @Test
    void json_writesNullNeverNaN() throws IOException {
        StringWriter w = new StringWriter();
        JsonReportWriter.write(broken(), w);
        assertFalse(w.toString().contains("NaN"), "no NaN token");
        assertFalse(w.toString().contains("Infinity"));
        assertTrue(w.toString().contains("null"));
    }

    private static String write(List<Report> r) {
        StringWriter w = new StringWriter();
        try {
            FindingsCsvWriter.write(r, UnitSystem.METRIC, w);
        } catch (IOException e) {
            throw new java.io.UncheckedIOException(e);
        }
        return w.toString();
    }
}
