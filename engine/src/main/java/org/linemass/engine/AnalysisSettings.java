package org.linemass.engine;

import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.linemass.engine.section.LayerAssignment;
import org.linemass.engine.section.SectionTable;

/**
 * What the user chose for one analysis. Empty optionals mean "use the default derived from the
 * drawing" (see {@link Tolerances#defaultsFor}).
 *
 * @param joinM join tolerance in metres
 * @param gapLimitM gap limit in metres
 * @param groupM identical-piece tolerance in metres
 * @param integrationRelative relative error target of every integral
 * @param mirrorGrouping whether mirror images count as identical pieces
 * @param includeLayers layer globs to count (empty: all)
 * @param excludeLayers layer globs not to count
 * @param includeHiddenLayers whether off and frozen layers count
 * @param sections the section table (built-in rows plus the user's)
 * @param assignments layer-to-section rules; the last matching rule wins
 * @param densityExpressions layer glob to a linear-density expression in x, y, z, s (kg/m); overrides the section's constant
 * @param maxExpandedSegments most world segments expanded for joining and checks; beyond it those stages are skipped and reports say so
 */
public record AnalysisSettings(Optional<Double> joinM, Optional<Double> gapLimitM, Optional<Double> groupM,
        double integrationRelative, boolean mirrorGrouping, List<String> includeLayers,
        List<String> excludeLayers, boolean includeHiddenLayers, SectionTable sections,
        List<LayerAssignment> assignments, Map<String, String> densityExpressions, long maxExpandedSegments) {

    public static final long DEFAULT_MAX_EXPANDED_SEGMENTS = 2_000_000L;

    public AnalysisSettings {
        includeLayers = List.copyOf(includeLayers);
        excludeLayers = List.copyOf(excludeLayers);
        assignments = List.copyOf(assignments);
        densityExpressions = Map.copyOf(densityExpressions);
    }

    /** Defaults with the given section table and no assignments. */
    public static AnalysisSettings defaults(SectionTable sections) {
        return new AnalysisSettings(Optional.empty(), Optional.empty(), Optional.empty(),
                Tolerances.DEFAULT_INTEGRATION_RELATIVE, false, List.of(), List.of(), false, sections, List.of(),
                Map.of(), DEFAULT_MAX_EXPANDED_SEGMENTS);
    }

    /** The same settings without layer filters (every visible layer counts). */
    public AnalysisSettings unfiltered() {
        return new AnalysisSettings(joinM, gapLimitM, groupM, integrationRelative, mirrorGrouping, List.of(),
                List.of(), includeHiddenLayers, sections, assignments, densityExpressions, maxExpandedSegments);
    }

    public AnalysisSettings withAssignments(List<LayerAssignment> a) {
        return new AnalysisSettings(joinM, gapLimitM, groupM, integrationRelative, mirrorGrouping, includeLayers,
                excludeLayers, includeHiddenLayers, sections, a, densityExpressions, maxExpandedSegments);
    }
}
