package org.linemass.engine.resolve;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import org.linemass.drawing.Drawing;
import org.linemass.engine.settings.AnalysisSettings;
import org.linemass.engine.moments.Moments;
import org.linemass.engine.moments.MomentsAccumulator;
import org.linemass.geometry.Affine;
import org.linemass.geometry.Box3;
import org.linemass.geometry.Segment;

/**
 * Resolves a drawing to world metres (see the package description). Units: the drawing's
 * {@link org.linemass.drawing.LengthUnit#metres()} (for an unresolved UNITLESS drawing that is 1, i.e.
 * drawing units are taken as metres; the importer normally supplies a guessed unit with
 * {@code UnitSource.ASSUMED}). The expanded segment list is built only when the counted layers
 * expand to at most {@link AnalysisSettings#maxExpandedSegments()} segments; otherwise it is empty and
 * a reason says so. Stateless entry point.
 */
public final class Resolver {

    private Resolver() {
    }

    public static ResolvedDrawing resolve(Drawing drawing, AnalysisSettings settings) {
        double unit = drawing.unit().metres();
        Affine world = Affine.uniformScale(unit);
        LayerRules rules = new LayerRules(drawing, settings.includeLayers(), settings.excludeLayers(),
                settings.includeHiddenLayers());
        BlockInstancer instancer = new BlockInstancer(drawing, rules, settings.integrationRelative(),
                settings.maxExpandedSegments());
        LayerTotals layers = instancer.modelSpace(world, unit);
        List<String> reasons = new ArrayList<>(instancer.reasons());
        long expanded = layers.totalSegments();
        Optional<List<Segment>> segments;
        double extent;
        List<CoincidentCopies.Group> coincident = List.of();
        if (expanded <= settings.maxExpandedSegments()) {
            CoincidentCopies placed = WorldExpander.expand(drawing, new LayerRules(drawing,
                    settings.includeLayers(), settings.excludeLayers(), settings.includeHiddenLayers()), world,
                    settings.maxExpandedSegments(), instancer::placesSegments);
            List<Segment> list = placed.segments();
            coincident = placed.groups();
            segments = Optional.of(list);
            Box3 box = Box3.EMPTY;
            for (Segment s : list) {
                box = box.union(s.bounds());
            }
            extent = box.diagonal();
        } else {
            segments = Optional.empty();
            reasons.add(String.format(Locale.ROOT,
                    "the counted layers expand to %s segments, more than the limit of %d: pieces, groups and "
                            + "drawing checks were skipped",
                    expanded == Long.MAX_VALUE ? "more than " + Long.MAX_VALUE : Long.toString(expanded),
                    settings.maxExpandedSegments()));
            extent = estimatedExtent(layers);
        }
        return new ResolvedDrawing(unit, layers, EntityCounter.count(drawing), segments, expanded, extent, reasons,
                coincident.stream().map(g -> new ResolvedDrawing.Coincident(g.kept(), g.copies())).toList());
    }

    /** Length of a straight rod with the same radius of gyration: sqrt(12 trace(C) / m). */
    private static double estimatedExtent(LayerTotals layers) {
        MomentsAccumulator acc = new MomentsAccumulator();
        layers.moments().values().forEach(acc::add);
        Moments m = acc.result();
        return m.mass() > 0 ? Math.sqrt(12 * m.covariance().trace() / m.mass()) : 0;
    }
}
