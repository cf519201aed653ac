package org.linemass.engine.assemble;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.TreeMap;
import org.linemass.drawing.Drawing;
import org.linemass.engine.error.AnalysisException;
import org.linemass.engine.moments.Moments;
import org.linemass.engine.moments.MomentsAccumulator;
import org.linemass.engine.result.Finding;
import org.linemass.engine.result.FindingKind;
import org.linemass.engine.result.LayerResult;
import org.linemass.engine.result.SectionUse;
import org.linemass.engine.result.Severity;
import org.linemass.engine.result.Totals;
import org.linemass.engine.section.Section;
import org.linemass.errors.InternalException;
import org.linemass.geometry.Vec3;

/**
 * Per-layer results and drawing totals. A layer's length moments are the drawn moments minus those
 * of the sub-curves the piece stage removed as drawn twice ({@link Moments#minus}); its mass moments
 * come from its density field (summed over its pieces) or from its section (constant kg/m times the
 * length moments); without either, mass, centroid and inertia are null and a {@code no_section}
 * warning is raised. Totals combine every counted layer's length and every layer with a mass
 * (compensated summation). Single use.
 */
public final class LayerAssembler {

    /** Layers, totals, sections used, and the findings and reasons raised on the way. */
    public record Output(List<LayerResult> layers, Totals totals, List<SectionUse> sections, List<Finding> findings,
            List<String> incompleteReasons) {
    }

    private LayerAssembler() {
    }

    /**
     * @param drawn raw per-layer length moments (world metres)
     * @param removed per-layer length moments of removed duplicates (may lack layers)
     * @param pieces per-layer piece counts (empty when pieces were not formed)
     * @param fieldMass per-layer mass moments of density-field layers, summed over pieces
     * @param piecesFormed whether pieces exist (field layers need them)
     */
    public static Output assemble(Drawing drawing, Map<String, Moments> drawn, Map<String, Moments> removed,
            Map<String, Integer> pieces, Map<String, Moments> fieldMass, boolean piecesFormed, MaterialPlan plan)
            throws AnalysisException {
        List<LayerResult> layers = new ArrayList<>();
        List<Finding> findings = new ArrayList<>();
        List<String> reasons = new ArrayList<>();
        Map<String, Section> used = new TreeMap<>();
        MomentsAccumulator totalLength = new MomentsAccumulator();
        MomentsAccumulator totalMass = new MomentsAccumulator();
        double drawnTotal = 0;
        boolean massComplete = true;
        boolean anyMass = false;
        for (Map.Entry<String, Moments> e : new TreeMap<>(drawn).entrySet()) {
            String name = e.getKey();
            Moments raw = e.getValue();
            Moments length;
            try {
                length = removed.containsKey(name) ? raw.minus(removed.get(name)) : raw;
            } catch (IllegalArgumentException bug) {
                throw new InternalException("the piece stage removed more length from layer " + name
                        + " than was drawn (" + bug.getMessage() + ")", bug);
            }
            LayerMaterial mat = plan.forLayer(name);
            Moments mass = null;
            if (mat.field().isPresent()) {
                if (piecesFormed) {
                    mass = fieldMass.getOrDefault(name, Moments.ZERO);
                } else {
                    reasons.add("layer " + name + " has a density expression but its pieces were not formed; its mass "
                            + "is not known");
                }
            } else if (mat.section().isPresent()) {
                mass = length.scaledDensity(mat.section().get().kgPerM());
            }
            mat.section().ifPresent(s -> used.put(s.id(), s));
            String overflow = Overflow.describe(name, raw, length, mass, mat.section().orElse(null));
            if (overflow != null) {
                findings.add(new Finding(FindingKind.OVERFLOW, Severity.ERROR, null, null, name, List.of(), null,
                        overflow));
                reasons.add("layer " + name + " was left out of the totals: its moments exceed the range of numbers"
                        + " (see the overflow finding)");
                massComplete = false;
                Vec3 c = length.centroid().isFinite() ? length.centroid() : null;
                layers.add(new LayerResult(name, length.mass(), raw.mass(), c, null,
                        mat.section().map(Section::id).orElse(null), null, null, null,
                        pieces.getOrDefault(name, 0), length.errorBound(), drawing.layer(name).visible()));
                continue;
            }
            boolean hasGeometry = raw.mass() > 0;
            if (mass == null && hasGeometry) {
                massComplete = false;
                if (!mat.hasMass()) {
                    findings.add(new Finding(FindingKind.NO_SECTION, Severity.WARNING, length.centroid(), null, name,
                            List.of(), null, String.format(Locale.ROOT,
                                    "layer %s has %.3f m of wire but no section, so its mass is not known", name,
                                    length.mass())));
                }
            }
            if (mass != null) {
                anyMass = true;
                totalMass.add(mass);
            }
            totalLength.add(length);
            drawnTotal += raw.mass();
            layers.add(new LayerResult(name, length.mass(), raw.mass(), length.centroid(), length.inertia(),
                    mat.section().map(Section::id).orElse(null), mass == null ? null : mass.mass(),
                    mass == null ? null : mass.centroid(), mass == null ? null : mass.inertia(),
                    pieces.getOrDefault(name, 0), length.errorBound(), drawing.layer(name).visible()));
        }
        Moments tl = totalLength.result();
        Moments tm = anyMass ? totalMass.result() : null;
        if (!Overflow.finite(tl) || (tm != null && !Overflow.finite(tm))) {
            findings.add(new Finding(FindingKind.OVERFLOW, Severity.ERROR, null, null, null, List.of(), null,
                    "the drawing's totals exceed the range of numbers although each layer's do not (the layers lie"
                            + " too far apart); check the drawing's units and coordinates. The totals are left out."));
            reasons.add("the drawing's totals exceed the range of numbers (see the overflow finding)");
            tl = Moments.ZERO;
            tm = null;
            massComplete = false;
        }
        Totals totals = new Totals(tl.mass(), drawnTotal, tl.centroid(), tl.inertia(), tm == null ? null : tm.mass(),
                tm == null ? null : tm.centroid(), tm == null ? null : tm.inertia(), massComplete, tl.errorBound());
        List<SectionUse> sections = new ArrayList<>();
        used.values().forEach(s -> sections.add(new SectionUse(s.id(), s.description(), s.material(), s.kgPerM(),
                s.diameterM(), s.source())));
        return new Output(layers, totals, sections, findings, reasons);
    }
}
