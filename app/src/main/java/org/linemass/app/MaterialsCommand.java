package org.linemass.app;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Callable;
import org.linemass.engine.section.Material;
import org.linemass.engine.section.Materials;
import org.linemass.reports.UnitSystem;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;

/**
 * {@code linemass materials}: the built-in materials (the ids a parametric section such as
 * {@code round:12:steel} takes) with their density and its source.
 */
@Command(name = "materials", mixinStandardHelpOptions = true,
        description = "List the built-in materials (id, density, source): the ids a parametric section such as "
                + "round:12:steel or tube:26.9x2.3:stainless-304 takes.")
final class MaterialsCommand implements Callable<Integer> {

    @Mixin
    CommonOptions common;

    private final AppContext ctx;

    MaterialsCommand(AppContext ctx) {
        this.ctx = ctx;
    }

    @Override
    public Integer call() {
        List<Material> rows = Materials.all();
        boolean imperial = common.units().isImperial();
        // 1 lb/ft3 = 0.45359237 kg / 0.3048^3 m3 = 16.018463 kg/m3 (exact definitions of lb and ft)
        double perUnit = imperial ? 0.45359237 / Math.pow(0.3048, 3) : 1.0;
        List<String[]> cells = new ArrayList<>();
        for (Material m : rows) {
            cells.add(new String[] {m.id(),
                String.format(Locale.ROOT, imperial ? "%.2f" : "%.0f", m.densityKgM3() / perUnit), m.name(), m.source()});
        }
        String[] head = {"id", imperial ? "density [lb/ft3]" : "density [kg/m3]", "name", "source"};
        ctx.out().print(PlainTable.render(head, new boolean[] {false, true, false, false}, cells));
        ctx.out().flush();
        return ExitCodes.OK;
    }
}
