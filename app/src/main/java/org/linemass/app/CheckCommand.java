package org.linemass.app;

import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/** {@code linemass check}: weigh and check drawings. */
@Command(name = "check", mixinStandardHelpOptions = true,
        description = {"Read DXF drawings, join the wires into pieces, and report length, mass, centre of gravity, "
                + "bill of materials and drawing defects.",
            "Exit code: 0 done, 1 findings at or above --fail-at, 2 bad input or usage, 3 internal error."})
final class CheckCommand implements Callable<Integer> {

    @Mixin
    CommonOptions common;

    @Mixin
    DrawingOptions drawing;

    @Mixin
    OutputOptions outputs;

    @Mixin
    PlanOptions plan;

    @Option(names = {"-j", "--jobs"}, paramLabel = "N", description = "Drawings analysed side by side (default: one "
            + "per processor, here ${DEFAULT-VALUE}); a drawing too big for the heap beside others waits for them.")
    int jobs = CheckRun.defaultJobs();

    @Parameters(arity = "1..*", paramLabel = "DRAWING|FOLDER",
            description = "DXF files, or folders searched for *.dxf (any case, recursively).")
    List<Path> inputs;

    private final AppContext ctx;

    CheckCommand(AppContext ctx) {
        this.ctx = ctx;
    }

    @Override
    public Integer call() throws Exception {
        return new CheckRun(ctx, common, drawing, outputs, plan, jobs).run(inputs);
    }
}
