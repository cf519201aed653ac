package org.linemass.app;

import java.util.List;
import java.util.concurrent.Callable;
import org.linemass.engine.section.Section;
import org.linemass.reports.UnitSystem;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;

/** {@code linemass sections}: the built-in section table with the source of every row. */
@Command(name = "sections", mixinStandardHelpOptions = true,
        description = "List the built-in cross-sections (id, mass per length, diameter, material) and where each "
                + "row's numbers come from.")
final class SectionsCommand implements Callable<Integer> {

    @Mixin
    CommonOptions common;

    private final AppContext ctx;

    SectionsCommand(AppContext ctx) {
        this.ctx = ctx;
    }

    @Override
    public Integer call() {
        List<Section> rows = ctx.sections().builtIn().rows();
        if (rows.isEmpty()) {
            ctx.out().print("The built-in section table is empty in this build.\n");
            ctx.out().flush();
            return ExitCodes.OK;
        }
        UnitSystem u = common.units();
        double perLong = u.isImperial() ? 0.3048 / 0.45359237 : 1.0;
        String massPer = u.massUnit() + "/" + u.longUnit();
        ctx.out().print(SectionList.render(rows, u, perLong, massPer));
        ctx.out().flush();
        return ExitCodes.OK;
    }
}
