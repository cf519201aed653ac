package org.linemass.engine.assemble;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.linemass.engine.error.AnalysisException;
import org.linemass.engine.settings.AnalysisSettings;
import org.linemass.engine.field.FieldExpression;
import org.linemass.engine.section.LayerGlob;
import org.linemass.engine.section.Section;
import org.linemass.engine.section.SectionAssigner;

/**
 * Decides each layer's {@link LayerMaterial} from the settings: the section by the assignments
 * (last matching rule wins, ids checked up front), the density expression by the density globs.
 * When several density globs match one layer the most specific wins: a glob without wildcards, then
 * the longest glob, then the alphabetically first. Every expression is parsed up front so that a
 * bad one fails before any work. Caches per layer: not thread-safe.
 */
public final class MaterialPlan {

    private final SectionAssigner sections;
    private final List<Map.Entry<String, String>> densityRules;
    private final Map<String, FieldExpression> parsed = new HashMap<>();
    private final Map<String, LayerMaterial> cache = new HashMap<>();

    private MaterialPlan(SectionAssigner sections, List<Map.Entry<String, String>> densityRules) {
        this.sections = sections;
        this.densityRules = densityRules;
    }

    public static MaterialPlan of(AnalysisSettings settings) throws AnalysisException {
        SectionAssigner a = new SectionAssigner(settings.sections(), settings.assignments());
        a.validate();
        List<Map.Entry<String, String>> rules = new ArrayList<>(settings.densityExpressions().entrySet());
        rules.sort((x, y) -> {
            int c = Boolean.compare(wild(x.getKey()), wild(y.getKey()));
            if (c != 0) {
                return c;
            }
            c = Integer.compare(y.getKey().length(), x.getKey().length());
            return c != 0 ? c : x.getKey().compareTo(y.getKey());
        });
        MaterialPlan plan = new MaterialPlan(a, rules);
        for (Map.Entry<String, String> r : rules) {
            LayerGlob.of(r.getKey());
            plan.parsed.put(r.getKey(), FieldExpression.parse(r.getValue(), r.getKey(), true));
        }
        return plan;
    }

    private static boolean wild(String glob) {
        return glob.indexOf('*') >= 0 || glob.indexOf('?') >= 0;
    }

    public LayerMaterial forLayer(String layer) throws AnalysisException {
        LayerMaterial m = cache.get(layer);
        if (m == null) {
            Optional<Section> s = sections.forLayer(layer);
            Optional<FieldExpression> f = Optional.empty();
            for (Map.Entry<String, String> r : densityRules) {
                if (LayerGlob.of(r.getKey()).matches(layer)) {
                    f = Optional.of(FieldExpression.parse(r.getValue(), layer, true));
                    break;
                }
            }
            m = new LayerMaterial(layer, s, f);
            cache.put(layer, m);
        }
        return m;
    }
}
