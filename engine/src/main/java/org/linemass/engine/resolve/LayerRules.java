package org.linemass.engine.resolve;

import java.util.List;
import org.linemass.drawing.Drawing;
import org.linemass.drawing.InsertWalk;
import org.linemass.drawing.Layer;
import org.linemass.engine.section.LayerGlob;

/**
 * Which layer an entity counts on and whether that layer counts at all. Layer-0 inheritance: an
 * entity on layer {@code 0} inside a block takes the effective layer of the insert that places the
 * block, recursively; in model space layer 0 is itself. A layer counts when it matches an include
 * glob (or there are none), matches no exclude glob, and is visible (on and thawed) unless hidden
 * layers are included. An insert whose effective layer is frozen hides its whole content (also
 * entities on other layers), as CAD programs do; an insert on a layer that is merely off hides only
 * the content that inherits that layer. Caches its verdicts: not thread-safe.
 */
final class LayerRules {

    private final Drawing drawing;
    private final List<LayerGlobs> include;
    private final List<LayerGlobs> exclude;
    private final boolean includeHidden;
    private final java.util.Map<String, Boolean> verdicts = new java.util.HashMap<>();

    private record LayerGlobs(LayerGlob glob) {
    }

    LayerRules(Drawing drawing, List<String> include, List<String> exclude, boolean includeHidden) {
        this.drawing = drawing;
        this.include = include.stream().map(g -> new LayerGlobs(LayerGlob.of(g))).toList();
        this.exclude = exclude.stream().map(g -> new LayerGlobs(LayerGlob.of(g))).toList();
        this.includeHidden = includeHidden;
    }

    /** The layer an entity on {@code own} counts on, given the layer inherited from its insert (null in model space). */
    static String effective(String own, String inherited) {
        return InsertWalk.effectiveLayer(own, inherited);
    }

    boolean counts(String layer) {
        return verdicts.computeIfAbsent(layer, this::decide);
    }

    private boolean decide(String layer) {
        Layer l = drawing.layer(layer);
        if (!includeHidden && !l.visible()) {
            return false;
        }
        if (!include.isEmpty() && include.stream().noneMatch(g -> g.glob().matches(layer))) {
            return false;
        }
        return exclude.stream().noneMatch(g -> g.glob().matches(layer));
    }

    /** Whether an insert on (effective) layer {@code layer} is shown at all. */
    boolean insertShown(String layer) {
        return includeHidden || !drawing.layer(layer).frozen();
    }
}
