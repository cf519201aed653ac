package org.linemass.engine.settings;

import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.linemass.engine.section.LayerAssignment;
import org.linemass.engine.section.LayerJoin;
import org.linemass.engine.section.SectionTable;
import org.linemass.engine.shape.BendStandard;
import org.linemass.tolerance.Tolerances;

/**
 * What the user chose for one analysis: the one settings object, built once from the options and
 * passed whole. Empty optionals mean "use the default derived from the drawing" (see
 * {@link Tolerances#defaults}); {@link #tolerances} turns the settings
 * into the one {@link Tolerances} object the stages share.
 *
 * <p>The constructor checks what the user gave: every tolerance positive and finite, and the gap
 * limit not below the join tolerance when both are given (the rule itself lives in
 * {@link Tolerances#requireGapCoversJoin}); it throws {@link IllegalArgumentException} with the
 * offending values otherwise.
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
 * @param layerJoins layers whose pieces join one another end to end (empty: ends join on one layer only)
 * @param bendStandard whose minimum bend radii the schedule checks bars against
 * @param listedNotes most T-junction and crossing notes listed one by one (the rest are counted)
 * @param threads threads the piece stage may use (1 or more); the result is the same for any number
 */
public record AnalysisSettings(Optional<Double> joinM, Optional<Double> gapLimitM, Optional<Double> groupM,
        double integrationRelative, boolean mirrorGrouping, List<String> includeLayers,
        List<String> excludeLayers, boolean includeHiddenLayers, SectionTable sections,
        List<LayerAssignment> assignments, Map<String, String> densityExpressions, long maxExpandedSegments,
        List<LayerJoin> layerJoins, BendStandard bendStandard, int listedNotes, int threads) {

    /**
     * T-junction and crossing notes listed by default: a sample big enough to find them in a drawing,
     * small enough that a welded mesh's million welds do not make the report many times the drawing.
     */
    public static final int DEFAULT_LISTED_NOTES = 1000;

    public static final long DEFAULT_MAX_EXPANDED_SEGMENTS = 2_000_000L;

    public AnalysisSettings {
        joinM.ifPresent(m -> Tolerances.requirePositive("join tolerance", m));
        gapLimitM.ifPresent(m -> Tolerances.requirePositive("gap limit", m));
        groupM.ifPresent(m -> Tolerances.requirePositive("group tolerance", m));
        Tolerances.requirePositive("integration tolerance", integrationRelative);
        if (joinM.isPresent() && gapLimitM.isPresent()) {
            Tolerances.requireGapCoversJoin(gapLimitM.get(), joinM.get());
        }
        includeLayers = List.copyOf(includeLayers);
        excludeLayers = List.copyOf(excludeLayers);
        assignments = List.copyOf(assignments);
        densityExpressions = Map.copyOf(densityExpressions);
        layerJoins = List.copyOf(layerJoins);
        if (bendStandard == null) {
            throw new IllegalArgumentException("bend standard must be given (BendStandard.AUTO by default)");
        }
        if (listedNotes < 0) {
            throw new IllegalArgumentException("listed notes must not be negative, got " + listedNotes);
        }
        if (threads < 1) {
            throw new IllegalArgumentException("threads must be 1 or more, got " + threads);
        }
    }

    /** The settings listing {@link #DEFAULT_LISTED_NOTES} notes, on every core the machine has. */
    public AnalysisSettings(Optional<Double> joinM, Optional<Double> gapLimitM, Optional<Double> groupM,
            double integrationRelative, boolean mirrorGrouping, List<String> includeLayers,
            List<String> excludeLayers, boolean includeHiddenLayers, SectionTable sections,
            List<LayerAssignment> assignments, Map<String, String> densityExpressions, long maxExpandedSegments,
            List<LayerJoin> layerJoins, BendStandard bendStandard) {
        this(joinM, gapLimitM, groupM, integrationRelative, mirrorGrouping, includeLayers, excludeLayers,
                includeHiddenLayers, sections, assignments, densityExpressions, maxExpandedSegments, layerJoins,
                bendStandard, DEFAULT_LISTED_NOTES, Runtime.getRuntime().availableProcessors());
    }

    /** The settings with the bend standard that follows the bar size ({@link BendStandard#AUTO}). */
    public AnalysisSettings(Optional<Double> joinM, Optional<Double> gapLimitM, Optional<Double> groupM,
            double integrationRelative, boolean mirrorGrouping, List<String> includeLayers,
            List<String> excludeLayers, boolean includeHiddenLayers, SectionTable sections,
            List<LayerAssignment> assignments, Map<String, String> densityExpressions, long maxExpandedSegments,
            List<LayerJoin> layerJoins) {
        this(joinM, gapLimitM, groupM, integrationRelative, mirrorGrouping, includeLayers, excludeLayers,
                includeHiddenLayers, sections, assignments, densityExpressions, maxExpandedSegments, layerJoins,
                BendStandard.AUTO);
    }

    /** The settings without layer joins (ends join on one layer only, as before joins existed). */
    public AnalysisSettings(Optional<Double> joinM, Optional<Double> gapLimitM, Optional<Double> groupM,
            double integrationRelative, boolean mirrorGrouping, List<String> includeLayers,
            List<String> excludeLayers, boolean includeHiddenLayers, SectionTable sections,
            List<LayerAssignment> assignments, Map<String, String> densityExpressions, long maxExpandedSegments) {
        this(joinM, gapLimitM, groupM, integrationRelative, mirrorGrouping, includeLayers, excludeLayers,
                includeHiddenLayers, sections, assignments, densityExpressions, maxExpandedSegments, List.of());
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
                List.of(), includeHiddenLayers, sections, assignments, densityExpressions, maxExpandedSegments,
                layerJoins, bendStandard, listedNotes, threads);
    }

    /**
     * The tolerances of an analysis: the defaults ({@link Tolerances#defaults}) overridden by the
     * user's join, gap and group tolerances and integration target. The same for every drawing: none
     * depends on the drawing's extent. Built once per analysis.
     *
     * @throws IllegalArgumentException when a user's tolerance conflicts with a default (a gap limit
     *     below the default join tolerance)
     */
    public Tolerances tolerances() {
        Tolerances t = Tolerances.defaults().withIntegrationRelative(integrationRelative);
        if (joinM.isPresent()) {
            t = t.withJoin(joinM.get());
        }
        if (gapLimitM.isPresent()) {
            t = t.withGapLimit(gapLimitM.get());
        }
        if (groupM.isPresent()) {
            t = t.withGroup(groupM.get());
        }
        return t;
    }

    public AnalysisSettings withAssignments(List<LayerAssignment> a) {
        return new AnalysisSettings(joinM, gapLimitM, groupM, integrationRelative, mirrorGrouping, includeLayers,
                excludeLayers, includeHiddenLayers, sections, a, densityExpressions, maxExpandedSegments, layerJoins,
                bendStandard, listedNotes, threads);
    }

    /** The same settings with {@code joins} as the layer joins. */
    public AnalysisSettings withLayerJoins(List<LayerJoin> joins) {
        return new AnalysisSettings(joinM, gapLimitM, groupM, integrationRelative, mirrorGrouping, includeLayers,
                excludeLayers, includeHiddenLayers, sections, assignments, densityExpressions, maxExpandedSegments,
                joins, bendStandard, listedNotes, threads);
    }

    /** The same settings with {@code standard} for the schedule's radius check. */
    public AnalysisSettings withBendStandard(BendStandard standard) {
        return new AnalysisSettings(joinM, gapLimitM, groupM, integrationRelative, mirrorGrouping, includeLayers,
                excludeLayers, includeHiddenLayers, sections, assignments, densityExpressions, maxExpandedSegments,
                layerJoins, standard, listedNotes, threads);
    }

    /** The same settings listing at most {@code notes} T-junction and crossing notes one by one. */
    public AnalysisSettings withListedNotes(int notes) {
        return new AnalysisSettings(joinM, gapLimitM, groupM, integrationRelative, mirrorGrouping, includeLayers,
                excludeLayers, includeHiddenLayers, sections, assignments, densityExpressions, maxExpandedSegments,
                layerJoins, bendStandard, notes, threads);
    }

    /** The same settings with the piece stage on {@code n} threads (the result does not change). */
    public AnalysisSettings withThreads(int n) {
        return new AnalysisSettings(joinM, gapLimitM, groupM, integrationRelative, mirrorGrouping, includeLayers,
                excludeLayers, includeHiddenLayers, sections, assignments, densityExpressions, maxExpandedSegments,
                layerJoins, bendStandard, listedNotes, n);
    }
}
