package org.linemass.app;

import java.util.ArrayList;
import java.util.List;
import org.linemass.engine.section.Section;
import org.linemass.reports.UnitSystem;

/** Formats section rows as an aligned table, one line per section, its source last. */
final class SectionList {

    private SectionList() {
    }

    static String render(List<Section> rows, UnitSystem u, double perLong, String massPer) {
        String[] head = {"id", "mass per length [" + massPer + "]", "diameter [" + u.shortUnit() + "]", "material",
            "description", "source"};
        List<String[]> cells = new ArrayList<>();
        for (Section s : rows) {
            cells.add(new String[] {s.id(), UnitSystem.fixed(s.kgPerM() * perLong, 4), u.shortLength(s.diameterM()),
                s.material(), s.description(), s.source()});
        }
        return PlainTable.render(head, new boolean[] {false, true, true, false, false, false}, cells);
    }
}
