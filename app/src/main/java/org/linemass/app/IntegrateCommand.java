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
                + "wire, per piece and per layer, with an error bound.")
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
        FieldIntegrator.Result r = ctx.integrator().integrate(files.get(0), drawing.importOptions(),
                drawing.settings(ctx.sections()), field);
        StringBuilder b = new StringBuilder();
        b.append("integral of ").append(r.expression()).append(" ds (SI units)\n");
        if (!common.quiet) {
            b.append(String.format(Locale.ROOT, "%-8s %-24s %22s %12s\n", "piece", "layer", "value", "error bound"));
            for (FieldIntegrator.Row row : r.pieces()) {
                b.append(String.format(Locale.ROOT, "%-8s %-24s %22.12g %12.3g\n", row.pieceId(), row.layer(),
                        row.value(), row.errorBound()));
            }
            for (FieldIntegrator.Row row : r.layers()) {
                b.append(String.format(Locale.ROOT, "%-8s %-24s %22.12g %12.3g\n", "layer", row.layer(),
                        row.value(), row.errorBound()));
            }
        }
        b.append(String.format(Locale.ROOT, "%-8s %-24s %22.12g %12.3g\n", "total", "", r.total(), r.totalErrorBound()));
        ctx.out().print(b);
        ctx.out().flush();
        return ExitCodes.OK;
    }
}
