package org.linemass.reports.console;

import java.io.PrintWriter;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import org.linemass.engine.result.DrawingResult;
import org.linemass.engine.result.Finding;
import org.linemass.engine.result.LayerResult;
import org.linemass.engine.result.MarkResult;
import org.linemass.engine.result.Severity;
import org.linemass.engine.result.Totals;
import org.linemass.geometry.Vec3;
import org.linemass.reports.Caution;
import org.linemass.engine.result.CombinedTotals;
import org.linemass.reports.DrawingOutcome;
import org.linemass.reports.FindingGroups;
import org.linemass.reports.Report;
import org.linemass.reports.Words;
import org.linemass.reports.UnitSystem;

/**
 * The terminal report. Per drawing: a summary (file, DXF version, units and their source, total
 * length and mass, centre of gravity, pieces and marks, findings by severity, and a warning line
 * when totals are incomplete), then the bill of materials, layer totals and findings as aligned
 * tables. Several drawings end with the combined totals. Quiet mode prints one line per drawing
 * (and one for the total). Colour is used only when {@code colour} is true.
 */
public final class ConsoleReport {

    /** Finding messages wrap at this many characters at most, however wide the terminal. */
    static final int MESSAGE_WIDTH = 60;
    /** Width assumed when the terminal's is not known (output to a file or a pipe), characters. */
    public static final int DEFAULT_WIDTH = 100;

    private final UnitSystem units;
    private final boolean colour;
    /** Most notes listed one by one in the findings table. */
    static final int NOTES_LISTED = 10;

    private final boolean quiet;
    private final boolean listNotes;
    private final boolean allFindings;
    private final int width;

    /** A report that lists notes one by one only when there are at most {@link #NOTES_LISTED}. */
    public ConsoleReport(UnitSystem units, boolean colour, boolean quiet) {
        this(units, colour, quiet, false);
    }

    /**
     * @param listNotes whether every finding of severity info gets a table row; when false and there
     *        are more than {@link #NOTES_LISTED} they are counted by kind under the table (a welded
     *        mesh has hundreds), keeping their numbers so the rows shown match the HTML, CSV and JSON
     */
    public ConsoleReport(UnitSystem units, boolean colour, boolean quiet, boolean listNotes) {
        this(units, colour, quiet, listNotes, false, DEFAULT_WIDTH);
    }

    /**
     * @param allFindings whether alike findings (see {@link FindingGroups}) get a row each; when false
     *        a group of alike findings is one row saying how many there are and which numbers they have
     * @param width the terminal's width in characters: the caution and long messages wrap to fit it
     */
    public ConsoleReport(UnitSystem units, boolean colour, boolean quiet, boolean listNotes, boolean allFindings,
            int width) {
        if (width < 20) {
            throw new IllegalArgumentException("terminal width " + width + " is below 20 characters");
        }
        this.units = units;
        this.colour = colour;
        this.quiet = quiet;
        this.listNotes = listNotes;
        this.allFindings = allFindings;
        this.width = width;
    }

    public void print(List<Report> reports, PrintWriter out) {
        printOutcomes(reports.stream().map(r -> DrawingOutcome.of(r, 0)).toList(), out);
    }

    /**
     * Prints a run over several drawings, some of which may have failed: each analysed drawing as
     * {@link #print} does, then (with more than one drawing) a table with one row per drawing
     * (status, length, mass, pieces, findings by severity, and the message of one that failed)
     * and the combined totals of those analysed. Quiet mode adds one line per failed drawing.
     */
    public void printOutcomes(List<DrawingOutcome> outcomes, PrintWriter out) {
        List<Report> reports = new ArrayList<>();
        for (DrawingOutcome o : outcomes) {
            if (o.isFailed()) {
                if (quiet) {
                    out.print(TextTable.clean(o.file()) + ": " + paint("31", "FAILED") + " (" + TextTable.clean(o.error())
                            + ")\n");
                }
                continue;
            }
            Report r = o.report();
            reports.add(r);
            if (quiet) {
                out.print(oneLine(r.result().drawing().file(), r.result().totals(), r.result().findings(),
                        r.result().complete()) + "\n");
            } else {
                drawing(r.result(), out);
            }
        }
        if (outcomes.size() > 1 && !quiet) {
            summaryTable(outcomes, out);
        }
        if (reports.size() > 1) {
            List<Totals> all = new ArrayList<>();
            List<Finding> findings = new ArrayList<>();
            boolean complete = true;
            for (Report r : reports) {
                all.add(r.result().totals());
                findings.addAll(r.result().findings());
                complete &= r.result().complete();
            }
            Totals t = CombinedTotals.of(all);
            if (quiet) {
                out.print(oneLine("all " + reports.size() + " drawings", t, findings, complete) + "\n");
            } else {
                out.print(bold("All " + reports.size() + " drawings together") + "\n");
                totalsLines(t, complete, out);
                field(out, "findings", severityCounts(findings));
                long failed = outcomes.stream().filter(DrawingOutcome::isFailed).count();
                if (failed > 0) {
                    field(out, "failed", paint("31", failed + " of " + outcomes.size()
                            + " drawings could not be read, not in these totals"));
                }
                out.print("\n");
            }
        }
        if (!quiet) {
            for (String line : TextTable.wrap("Caution: " + Caution.TEXT, width - 1)) {
                out.print(line + "\n");
            }
        }
        out.flush();
    }

    private void summaryTable(List<DrawingOutcome> outcomes, PrintWriter out) {
        TextTable t = new TextTable(List.of("drawing", "status", "length [" + units.longUnit() + "]",
                "mass [" + units.massUnit() + "]", "pieces", "errors", "warnings", "notes", "message"),
                false, false, true, true, true, true, true, true, false);
        for (DrawingOutcome o : outcomes) {
            if (o.isFailed()) {
                t.add(List.of(o.file(), o.status(), "-", "-", "-", "-", "-", "-", o.error()));
                continue;
            }
            DrawingResult r = o.report().result();
            Map<Severity, Integer> n = new EnumMap<>(Severity.class);
            r.findings().forEach(f -> n.merge(f.severity(), 1, Integer::sum));
            t.add(List.of(r.drawing().file(), o.status(), units.longLength(r.totals().lengthM()),
                    orDash(units.mass(r.totals().massKg())), Integer.toString(r.pieces().size()),
                    Integer.toString(n.getOrDefault(Severity.ERROR, 0)),
                    Integer.toString(n.getOrDefault(Severity.WARNING, 0)),
                    Integer.toString(n.getOrDefault(Severity.INFO, 0)), orDash(String.join("; ", r.incompleteReasons()))));
        }
        out.print(bold("Drawings") + "\n" + t.renderFitting("  ", MESSAGE_WIDTH, width) + "\n");
    }

    private String oneLine(String name, Totals t, List<Finding> findings, boolean complete) {
        String mass = t.massKg() == null ? "mass unknown" : units.mass(t.massKg()) + " " + units.massUnit()
                + (t.massComplete() ? "" : " (partial)");
        return TextTable.clean(name) + ": " + units.longLength(t.lengthM()) + " " + units.longUnit() + ", " + mass
                + ", findings " + severityCounts(findings) + (complete ? "" : ", INCOMPLETE");
    }

    private void drawing(DrawingResult r, PrintWriter out) {
        out.print(bold(TextTable.clean(r.drawing().file())) + "\n");
        field(out, "DXF version", r.drawing().dxfVersion().isEmpty() ? "(no header)" : r.drawing().dxfVersion());
        field(out, "units", r.drawing().unit().symbol() + " (" + unitSource(r) + ")");
        totalsLines(r.totals(), r.complete(), out);
        field(out, "pieces", r.pieces().size() + " in " + Words.count(r.groups().size(), "mark"));
        field(out, "findings", severityCounts(r.findings()));
        for (String reason : r.incompleteReasons()) {
            out.print("  " + paint("31", "incomplete: " + TextTable.clean(reason)) + "\n");
        }
        out.print("\n");
        bom(r, out);
        layers(r, out);
        findings(r, out);
    }

    private void totalsLines(Totals t, boolean complete, PrintWriter out) {
        String length = units.longLength(t.lengthM());
        String drawn = units.longLength(t.drawnLengthM());
        // only when the difference shows at the printed precision
        String fine = units.longLengthReadable(t.lengthM()).substring(length.length());
        field(out, "length", length + " " + units.longUnit() + fine
                + (!drawn.equals(length) ? " (drawn " + drawn + " " + units.longUnit() + ", overlaps counted once)" : ""));
        if (t.massKg() == null) {
            field(out, "mass", "unknown (no layer has a section)");
        } else {
            field(out, "mass", units.massReadable(t.massKg()) + " " + units.massUnit()
                    + (t.massComplete() ? "" : " (only layers with a section)"));
        }
        Vec3 g = t.centroidM() != null ? t.centroidM() : t.lengthCentroidM();
        String which = t.centroidM() != null ? "centre of gravity" : "length centroid";
        field(out, which, g == null ? "none" : point(g, units.extraDecimalsFor(t.lengthM())));
        if (!complete) {
            field(out, "complete", paint("31", "NO: some of the drawing was not counted, see below"));
        }
    }

    private String unitSource(DrawingResult r) {
        return switch (r.drawing().unitSource()) {
            case HEADER -> "from the file header";
            case OPTION -> "set on the command line";
            case ASSUMED -> "assumed, the file does not say";
        };
    }

    private String point(Vec3 g, int extra) {
        return "x " + units.longLength(g.x(), extra) + "  y " + units.longLength(g.y(), extra) + "  z "
                + units.longLength(g.z(), extra) + " " + units.longUnit();
    }

    private String severityCounts(List<Finding> findings) {
        Map<Severity, Integer> n = new EnumMap<>(Severity.class);
        for (Finding f : findings) {
            n.merge(f.severity(), 1, Integer::sum);
        }
        int e = n.getOrDefault(Severity.ERROR, 0);
        int w = n.getOrDefault(Severity.WARNING, 0);
        int i = n.getOrDefault(Severity.INFO, 0);
        return (e > 0 ? paint("31", Words.count(e, "error")) : Words.count(e, "error")) + ", "
                + (w > 0 ? paint("33", Words.count(w, "warning")) : Words.count(w, "warning")) + ", "
                + Words.count(i, "note");
    }

    private void bom(DrawingResult r, PrintWriter out) {
        if (r.groups().isEmpty()) {
            return;
        }
        TextTable t = new TextTable(List.of("mark", "qty", "section", "material",
                "cut length each [" + units.cutUnit() + "]", "bends", "mass each [" + units.massUnit() + "]",
                "mass total [" + units.massUnit() + "]", "layer"),
                false, true, false, false, true, true, true, true, false);
        for (MarkResult m : r.groups()) {
            t.add(List.of(m.mark(), Integer.toString(m.quantity()), orDash(m.section()), orDash(m.material()),
                    units.cutLength(m.lengthEachM()), Integer.toString(m.bendsEach()), orDash(units.mass(m.massEachKg())),
                    orDash(units.mass(m.massTotalKg())), orDash(m.layer())));
        }
        out.print(bold("Bill of materials") + "\n" + t.render("  ") + "\n");
    }

    private void layers(DrawingResult r, PrintWriter out) {
        if (r.layers().isEmpty()) {
            return;
        }
        TextTable t = new TextTable(List.of("layer", "section", "length [" + units.longUnit() + "]",
                "mass [" + units.massUnit() + "]", "pieces", "cog x [" + units.longUnit() + "]",
                "cog y [" + units.longUnit() + "]", "cog z [" + units.longUnit() + "]"),
                false, false, true, true, true, true, true, true);
        for (LayerResult l : r.layers()) {
            Vec3 g = l.centroidM() != null ? l.centroidM() : l.lengthCentroidM();
            t.add(List.of(l.name(), orDash(l.section()), units.longLength(l.lengthM()), orDash(units.mass(l.massKg())),
                    Integer.toString(l.pieces()), g == null ? "-" : units.longLength(g.x()),
                    g == null ? "-" : units.longLength(g.y()), g == null ? "-" : units.longLength(g.z())));
        }
        out.print(bold("Layers") + "\n" + t.render("  ") + "\n");
    }

    /**
     * The findings table: errors and warnings first, each under its number in every report; notes
     * follow in the table while there are at most {@value #NOTES_LISTED}, else they are summed up
     * by kind in one line (a welded frame has dozens of weld notes that would bury the errors).
     * Alike findings ({@link FindingGroups}) share one row unless every finding is asked for: its
     * number column reads "x76", its message starts with what they are and ends with their numbers.
     */
    private void findings(DrawingResult r, PrintWriter out) {
        if (r.findings().isEmpty()) {
            return;
        }
        TextTable t = new TextTable(List.of("#", "severity", "kind", "x [" + units.longUnit() + "]",
                "y [" + units.longUnit() + "]", "z [" + units.longUnit() + "]", "size [" + units.shortUnit() + "]",
                "layer", "message"), true, false, false, true, true, true, true, false, false);
        long notes = r.findings().stream().filter(f -> f.severity() == Severity.INFO).count();
        boolean showNotes = listNotes || notes <= NOTES_LISTED;
        Map<String, Integer> noteKinds = new TreeMap<>();
        int grouped = 0;
        for (FindingGroups.Group g : FindingGroups.of(r)) {
            if (g.severity() == Severity.INFO && !showNotes) {
                noteKinds.merge(g.kind(), g.count(), Integer::sum);
                continue;
            }
            if (g.count() == 1 || allFindings) {
                for (int n : g.numbers()) {
                    Finding f = r.findings().get(n - 1);
                    Vec3 a = f.atM();
                    t.add(List.of(Integer.toString(n), f.severity().jsonName(), f.kind(),
                            a == null ? "-" : units.longLength(a.x()), a == null ? "-" : units.longLength(a.y()),
                            a == null ? "-" : units.longLength(a.z()), orDash(units.defectSize(f.sizeM())),
                            orDash(f.layer()), units.message(f.message())));
                }
                continue;
            }
            grouped++;
            t.add(List.of("x" + g.count(), g.severity().jsonName(), g.kind(), "-", "-", "-",
                    orDash(units.defectSize(g.sizeM())), g.layers().size() == 1 ? g.layers().get(0)
                            : g.layers().isEmpty() ? "-" : g.layers().size() + " layers",
                    g.headline() + ": " + units.message(g.message()) + " (findings " + g.numberText() + ")"));
        }
        out.print(bold("Findings") + "\n" + (t.isEmpty() ? "" : t.renderFitting("  ", MESSAGE_WIDTH, width)));
        List<String> tail = new ArrayList<>();
        if (!noteKinds.isEmpty()) {
            StringBuilder b = new StringBuilder();
            noteKinds.forEach((k, c) -> b.append(b.length() == 0 ? "" : ", ").append(c).append(' ').append(k));
            tail.add(Words.count((int) notes, "note") + " not listed here (" + b + "): each is in the findings CSV, "
                    + "the JSON and the HTML report, or add --list-notes");
        }
        if (grouped > 0) {
            tail.add("Rows marked xN stand for N alike findings; --all-findings lists each one.");
        }
        for (String line : tail) {
            for (String part : TextTable.wrap(line, width - 3)) {
                out.print("  " + part + "\n");
            }
        }
        out.print("\n");
    }

    private static void field(PrintWriter out, String name, String value) {
        out.print("  " + String.format(java.util.Locale.ROOT, "%-20s", name) + value + "\n");
    }

    private static String orDash(String s) {
        return s == null || s.isEmpty() ? "-" : s;
    }

    private String bold(String s) {
        return paint("1", s);
    }

    private String paint(String code, String s) {
        return colour ? "\u001b[" + code + "m" + s + "\u001b[0m" : s;
    }
}
