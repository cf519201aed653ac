package org.linemass.engine.assemble;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeSet;
import org.linemass.drawing.Drawing;
import org.linemass.engine.error.AnalysisException;
import org.linemass.engine.settings.AnalysisSettings;
import org.linemass.engine.result.Finding;
import org.linemass.engine.result.FindingKind;
import org.linemass.engine.result.Severity;
import org.linemass.engine.section.LayerAssignment;
import org.linemass.engine.section.LayerGlob;

/**
 * The user's layer rules held against the drawing: every {@code --only-layer}, {@code --skip-layer},
 * section assignment and density rule that matches no layer of the drawing is an
 * {@code unmatched_rule} warning naming the rule and listing the layers there are (a rule with a
 * typo otherwise silently weighs the wrong thing). When layer filters leave nothing with wire to
 * weigh, that is an input problem, not an empty result. Stateless.
 */
public final class RuleFindings {

    /** Layers listed in a message at most; the rest are counted. */
    private static final int LISTED = 20;

    /** The glob the command line itself adds so a marked-up copy's own layer is never counted. */
    private static final String AUTOMATIC_PREFIX = "LINEMASS_FINDINGS";

    private RuleFindings() {
    }

    /**
     * @param wireLayers the layers that carry counted wire after filtering
     */
    public static List<Finding> of(Drawing drawing, AnalysisSettings settings, Set<String> wireLayers) {
        Set<String> layers = new TreeSet<>(drawing.layers().keySet());
        layers.addAll(wireLayers);
        List<Finding> out = new ArrayList<>();
        for (String g : settings.includeLayers()) {
            unmatched(out, "--only-layer '" + g + "'", g, layers);
        }
        for (String g : settings.excludeLayers()) {
            if (!g.toUpperCase(java.util.Locale.ROOT).startsWith(AUTOMATIC_PREFIX)) {
                unmatched(out, "--skip-layer '" + g + "'", g, layers);
            }
        }
        for (LayerAssignment a : settings.assignments()) {
            unmatched(out, a.origin() + " (section " + a.sectionId() + ")", a.layerGlob(), layers);
        }
        for (Map.Entry<String, String> d : settings.densityExpressions().entrySet()) {
            unmatched(out, "--density '" + d.getKey() + "=" + d.getValue() + "'", d.getKey(), layers);
        }
        return out;
    }

    /**
     * Fails when the layer filters left no wire although the drawing has some.
     *
     * @param wireLayers the layers with counted wire after filtering
     * @param anyWire whether the drawing has wire on any layer before filtering
     */
    public static void requireSomethingLeft(Drawing drawing, AnalysisSettings settings, Set<String> wireLayers,
            boolean anyWire) throws AnalysisException {
        boolean filtered = !settings.includeLayers().isEmpty() || settings.excludeLayers().stream()
                .anyMatch(g -> !g.toUpperCase(java.util.Locale.ROOT).startsWith(AUTOMATIC_PREFIX));
        if (filtered && anyWire && wireLayers.isEmpty()) {
            List<String> rules = new ArrayList<>();
            settings.includeLayers().forEach(g -> rules.add("--only-layer '" + g + "'"));
            settings.excludeLayers().stream().filter(g -> !g.toUpperCase(java.util.Locale.ROOT)
                    .startsWith(AUTOMATIC_PREFIX)).forEach(g -> rules.add("--skip-layer '" + g + "'"));
            throw new AnalysisException(drawing.file() + ": nothing is left to weigh after " + String.join(", ", rules)
                    + "; the drawing's layers are " + list(new TreeSet<>(drawing.layers().keySet())));
        }
    }

    private static void unmatched(List<Finding> out, String rule, String glob, Set<String> layers) {
        LayerGlob g = LayerGlob.of(glob);
        if (layers.stream().noneMatch(g::matches)) {
            out.add(new Finding(FindingKind.UNMATCHED_RULE, Severity.WARNING, null, null, null, List.of(), null,
                    rule + " matches no layer of this drawing; its layers are " + list(layers)));
        }
    }

    private static String list(Set<String> layers) {
        if (layers.isEmpty()) {
            return "none";
        }
        List<String> shown = layers.stream().limit(LISTED).map(l -> "'" + l + "'").toList();
        int more = layers.size() - shown.size();
        return String.join(", ", shown) + (more > 0 ? " and " + more + " more" : "");
    }
}
