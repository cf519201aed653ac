package org.linemass.app;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.linemass.drawing.LengthUnit;
import org.linemass.drawing.UnitSource;
import org.linemass.engine.moments.Sym3;
import org.linemass.engine.result.DrawingInfo;
import org.linemass.engine.result.DrawingResult;
import org.linemass.engine.result.EntityCounts;
import org.linemass.engine.result.Finding;
import org.linemass.engine.result.LayerResult;
import org.linemass.engine.result.MarkResult;
import org.linemass.engine.result.PieceResult;
import org.linemass.engine.result.SectionUse;
import org.linemass.engine.result.Severity;
import org.linemass.engine.result.SourceRef;
import org.linemass.engine.result.Totals;
import org.linemass.geometry.Vec3;
import org.linemass.importer.DxfInputException;
import org.linemass.reports.Report;

/**
 * Prepared results for command-line tests: one straight 1 m bar of a 10 mm section (0.617 kg/m,
 * FACTS.md section 1.1) along x; its length inertia about the centre is diag(0, 1/12, 1/12) m^3
 * (closed form L^3/12), and findings of the requested severities.
 */
final class AppFixtures {

    static final double KG_PER_M = 0.617;

    private AppFixtures() {
    }

    static DrawingResult bar(String file, Severity... findings) {
        Vec3 c = new Vec3(0.5, 0, 0);
        Sym3 j = new Sym3(0, 0, 0, 1.0 / 12, 0, 1.0 / 12);
        SourceRef ref = new SourceRef(40, "1F", "LINE", List.of());
        List<Finding> fs = new ArrayList<>();
        for (Severity s : findings) {
            fs.add(new Finding("gap", s, new Vec3(1.0005, 0, 0), 0.001, "BAR", List.of(ref), null, "a gap of 1 mm"));
        }
        return new DrawingResult(new DrawingInfo(file, "AC1015", false, LengthUnit.MILLIMETRE, UnitSource.HEADER),
                new EntityCounts(Map.of("LINE", 1L), Map.of(), 0),
                List.of(new LayerResult("BAR", 1, 1, c, j, "B10", KG_PER_M, c, j.times(KG_PER_M), 1, 1e-16, true)),
                List.of(new PieceResult(1, "BAR", "B10", 1, KG_PER_M, c, j, j.times(KG_PER_M), Vec3.ZERO,
                        new Vec3(1, 0, 0), false, 1, "A", List.of(), List.of(ref), 1e-16)),
                List.of(new MarkResult("A", 1, "BAR", "B10", "steel", 1, KG_PER_M, 1, KG_PER_M, 0, List.of(1))),
                fs, new Totals(1, 1, c, j, KG_PER_M, c, j.times(KG_PER_M), true, 1e-16),
                List.of(new SectionUse("B10", "10 mm bar", "steel", KG_PER_M, 0.01, "FACTS 1.1")), List.of());
    }

    /**
     * A pipeline keyed on file names: "bad*" fails with an input error, "warn*" has a warning,
     * "gap*" an error finding, "crash*" a bug, "argbug*" an argument error between two parts
     * of linemass, "invariant*" a broken invariant ({@code InternalException}), "huge*" and "deep*" run out of heap and stack,
     * anything else is clean. Records the settings it was given.
     */
    static final class FakePipeline implements DrawingPipeline {
        // drawings run side by side, so the records are synchronised lists
        final List<org.linemass.engine.settings.AnalysisSettings> seen =
                java.util.Collections.synchronizedList(new ArrayList<>());
        final List<org.linemass.importer.ImportOptions> imports =
                java.util.Collections.synchronizedList(new ArrayList<>());

        @Override
        public Report analyse(Path file, org.linemass.importer.ImportOptions io,
                org.linemass.engine.settings.AnalysisSettings settings) throws DxfInputException {
            seen.add(settings);
            imports.add(io);
            String n = file.getFileName().toString();
            if (n.startsWith("bad")) {
                throw new DxfInputException(file.toString(), 17, "LINE", "2F", "group 10 value 'abc' is not a number");
            }
            if (n.startsWith("crash")) {
                throw new IllegalStateException("bug");
            }
            if (n.startsWith("argbug")) {
                throw new IllegalArgumentException("radius must be positive, got -1");
            }
            if (n.startsWith("invariant")) {
                throw new org.linemass.errors.InternalException("layer W lost more length than was drawn");
            }
            if (n.startsWith("huge")) {
                throw new OutOfMemoryError("Java heap space");
            }
            if (n.startsWith("deep")) {
                throw new StackOverflowError();
            }
            Severity[] s = n.startsWith("warn") ? new Severity[] {Severity.WARNING}
                    : n.startsWith("gap") ? new Severity[] {Severity.ERROR} : new Severity[0];
            return Report.of(bar(file.getFileName().toString(), s));
        }
    }

    /** Captured output of one run. */
    record Run(int code, String out, String err) {
    }

    static Run run(DrawingPipeline pipeline, String... args) {
        return run(pipeline, new EngineSectionCatalog(), args);
    }

    static Run run(DrawingPipeline pipeline, SectionCatalog catalog, String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        AppContext ctx = new AppContext(new PrintWriter(out), new PrintWriter(err), pipeline, catalog,
                new EngineFieldIntegrator(), false);
        int code = Cli.run(ctx, args);
        return new Run(code, out.toString(), err.toString());
    }
}
