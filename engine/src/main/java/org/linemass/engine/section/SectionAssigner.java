package org.linemass.engine.section;

import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.linemass.engine.error.AnalysisException;

/**
 * Decides the section of each layer: the last assignment whose glob matches the layer wins; its id
 * is looked up in the section table (built-in plus user rows) and, failing that, parsed as a
 * parametric id ({@link ParametricSection}). Unknown or malformed ids are an
 * {@link AnalysisException} naming the rule's origin. Caches per layer: not thread-safe.
 */
public final class SectionAssigner {

    private final SectionTable table;
    private final List<LayerAssignment> rules;
    private final List<LayerGlob> globs;
    private final Map<String, Optional<Section>> cache = new HashMap<>();

    public SectionAssigner(SectionTable table, List<LayerAssignment> rules) {
        this.table = table;
        this.rules = List.copyOf(rules);
        this.globs = rules.stream().map(r -> LayerGlob.of(r.layerGlob())).toList();
    }

    /** Checks every rule's section id up front so that errors surface before any work. */
    public void validate() throws AnalysisException {
        for (LayerAssignment r : rules) {
            resolve(r);
        }
    }

    /** The section of a layer, empty when no rule matches. */
    public Optional<Section> forLayer(String layer) throws AnalysisException {
        Optional<Section> s = cache.get(layer);
        if (s == null) {
            s = Optional.empty();
            for (int i = rules.size() - 1; i >= 0; i--) {
                if (globs.get(i).matches(layer)) {
                    s = Optional.of(resolve(rules.get(i)));
                    break;
                }
            }
            cache.put(layer, s);
        }
        return s;
    }

    /** Looks up a section id in the table, then as a parametric id. */
    public static Optional<Section> lookup(SectionTable table, String id) {
        Optional<Section> s = table.find(id);
        return s.isPresent() ? s : ParametricSection.parse(id);
    }

    private Section resolve(LayerAssignment r) throws AnalysisException {
        try {
            return lookup(table, r.sectionId()).orElseThrow(() -> new AnalysisException(r.origin()
                    + ": unknown section " + r.sectionId() + " for layer " + r.layerGlob()));
        } catch (IllegalArgumentException e) {
            throw new AnalysisException(r.origin() + ": " + e.getMessage());
        }
    }
}
