package org.linemass.engine.section;

import java.util.List;

/**
 * "Pieces on layers matching any of {@code layerGlobs} join one another end to end", as a detailer
 * draws a bar and its hooks, or a tube and its bends, on different layers. A piece joined across
 * layers is reported on one layer and takes that layer's section: {@code leadLayer} when it is one of
 * the layers the piece spans, otherwise the layer with the longest run in the piece (ties: the name
 * first in alphabetical order). {@code origin} says where the rule came from (the command line, a file
 * and row) for messages. Globs as {@link LayerGlob}; a layer matching two rules joins by the first.
 */
public record LayerJoin(List<String> layerGlobs, String leadLayer, String origin) {

    public LayerJoin {
        layerGlobs = List.copyOf(layerGlobs);
        if (layerGlobs.size() < 1) {
            throw new IllegalArgumentException("a layer join needs at least one layer pattern (" + origin + ")");
        }
        layerGlobs.forEach(LayerGlob::of);
        if (leadLayer != null && leadLayer.isEmpty()) {
            leadLayer = null;
        }
    }

    /**
     * Parses {@code GLOB+GLOB...[=LAYER]}: the layer patterns that join, and optionally the layer whose
     * section a joined piece takes.
     *
     * @throws IllegalArgumentException naming {@code origin} for an empty pattern
     */
    public static LayerJoin parse(String text, String origin) {
        String globs = text;
        String lead = null;
        int eq = text.lastIndexOf('=');
        if (eq >= 0) {
            globs = text.substring(0, eq);
            lead = text.substring(eq + 1).trim();
            if (lead.isEmpty()) {
                throw new IllegalArgumentException(origin + ": no layer after '=' in '" + text + "'");
            }
        }
        List<String> list = java.util.Arrays.stream(globs.split("\\+", -1)).map(String::trim).toList();
        if (list.stream().anyMatch(String::isEmpty)) {
            throw new IllegalArgumentException(origin + ": empty layer pattern in '" + text + "' (write A+B or A+B=A)");
        }
        return new LayerJoin(list, lead, origin);
    }

    /** Whether {@code layer} is one of the joined layers. */
    public boolean matches(String layer) {
        for (String g : layerGlobs) {
            if (LayerGlob.of(g).matches(layer)) {
                return true;
            }
        }
        return false;
    }
}
