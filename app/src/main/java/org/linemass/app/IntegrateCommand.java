package org.linemass.app;

import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/** {@code linemass integrate}: the line integral of an expression along the wires. */
@Command(name = "integrate", mixinStandardHelpOptions = true,
        description = "Integrate an expression in x, y, z (metres) and arc length s (metres) along every counted "
                + "wire, per piece and per layer, with an error bound; with --imperial x, y, z, s and ds are in feet.")
final class IntegrateCommand implements Callable<Integer> {

    @Mixin
    CommonOptions common;

    @Mixin
    DrawingOptions drawing;

    @Option(names = "--field", required = true, paramLabel = "EXPR",
            description = "The integrand, e.g. '0.395*(1+0.1*z)' or 'x*x+y*y'.")
    String field;

    @Parameters(arity = "1", paramLabel = "DRAWING", description = "The DXF file.")
    Path input;

    /** Metres in a foot, exact by definition (international foot). */
    private static final double M_PER_FT = 0.3048;
    /** The variables of an expression (whole words x, y, z, s; function names such as sqrt are other words). */
    private static final java.util.regex.Pattern IN_FEET = java.util.regex.Pattern.compile("\\b([xyzs])\\b");

    private final AppContext ctx;

    IntegrateCommand(AppContext ctx) {
        this.ctx = ctx;
    }

    @Override
    public Integer call() throws Exception {
        List<Path> files = InputFiles.collect(List.of(input));
        if (files.size() != 1) {
            throw new InputProblem(input + ": integrate takes one drawing, found " + files.size());
        }
        boolean feet = common.units().isImperial();
        // in feet: the engine integrates in metres, so each variable is turned into feet inside the
        // expression and the integral (over ds in metres) is divided by the metres in a foot
        String metric = feet ? IN_FEET.matcher(field).replaceAll("($1/" + M_PER_FT + ")") : field;
        double per = feet ? 1 / M_PER_FT : 1;
        FieldIntegrator.Result r = ctx.integrator().integrate(files.get(0), drawing.importOptions(),
                drawing.settings(ctx.sections()), metric);
        String unit = feet ? "feet" : "metres";
        StringBuilder b = new StringBuilder();
        b.append("integral of ").append(feet ? field : r.expression()).append(" ds along the wires (x, y, z, s in ")
                .append(unit).append(")\n");
        String head = "%-8s %-24s %14s %22s %12s\n";
        String row = "%-8s %-24s %14.6f %22.12g %12.3g\n";
        if (!common.quiet) {
            b.append(String.format(Locale.ROOT, head, "piece", "layer", feet ? "length [ft]" : "length [m]", "value",
                    "error bound"));
            for (FieldIntegrator.Row p : r.pieces()) {
                b.append(String.format(Locale.ROOT, row, p.pieceId(), clean(p.layer()), p.lengthM() * per,
                        p.value() * per, p.errorBound() * per));
            }
            for (FieldIntegrator.Row l : r.layers()) {
                b.append(String.format(Locale.ROOT, row, "layer", clean(l.layer()), l.lengthM() * per, l.value() * per,
                        l.errorBound() * per));
            }
        }
        b.append(String.format(Locale.ROOT, "%-8s %-24s %14s %22.12g %12.3g\n", "total", "", "", r.total() * per,
                r.totalErrorBound() * per));
        for (String reason : r.incompleteReasons()) {
            b.append("incomplete: ").append(clean(reason)).append('\n');
        }
        ctx.out().print(b);
        ctx.out().flush();
        return ExitCodes.OK;
    }

    private static String clean(String s) {
        return s == null ? "" : s.replaceAll("\\p{Cntrl}", "?");
    }
}
