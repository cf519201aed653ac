package org.linemass.app;

import picocli.CommandLine.Command;

/** The top-level {@code linemass} command; all work is done by its subcommands. */
@Command(name = "linemass", mixinStandardHelpOptions = true, version = "linemass 0.1.0",
        description = "Centre-line length, mass, centre of gravity and drawing checks for wire, bar, tube and "
                + "cable drawn in DXF.",
        subcommands = {CheckCommand.class, DemoCommand.class, SectionsCommand.class, MaterialsCommand.class,
            IntegrateCommand.class, ServeCommand.class, CompareCommand.class})
final class LinemassCommand implements Runnable {

    @picocli.CommandLine.Spec
    picocli.CommandLine.Model.CommandSpec spec;

    /** Bare {@code linemass}: the usage on standard error and exit 2, since nothing was done. */
    @Override
    public void run() {
        spec.commandLine().usage(spec.commandLine().getErr());
        throw new picocli.CommandLine.ParameterException(spec.commandLine(),
                "missing command: use check, demo, sections, materials, integrate, serve or compare");
    }
}
