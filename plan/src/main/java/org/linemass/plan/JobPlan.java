package org.linemass.plan;

import java.util.List;

/**
 * The plan of a job (one drawing or many): one {@link SectionPlan} per planned section in name
 * order, and the pieces left out. Planned pieces (cut or uncut) plus unplanned pieces equal the
 * bill's quantity.
 */
public record JobPlan(List<SectionPlan> sections, List<Unplanned> unplanned) {

    public JobPlan {
        sections = List.copyOf(sections);
        unplanned = List.copyOf(unplanned);
    }

    public double massBoughtKg() {
        return sections.stream().mapToDouble(SectionPlan::massBoughtKg).sum();
    }

    public double massUsedKg() {
        return sections.stream().mapToDouble(SectionPlan::massUsedKg).sum();
    }
}
