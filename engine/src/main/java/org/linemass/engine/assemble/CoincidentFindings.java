package org.linemass.engine.assemble;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.TreeMap;
import org.linemass.engine.integrate.MomentIntegrator;
import org.linemass.engine.moments.Moments;
import org.linemass.engine.moments.MomentsAccumulator;
import org.linemass.engine.piece.SectionLookup;
import org.linemass.engine.pieces.checks.Findings;
import org.linemass.engine.resolve.ResolvedDrawing.Coincident;
import org.linemass.engine.result.Finding;
import org.linemass.engine.result.FindingKind;
import org.linemass.engine.result.Severity;
import org.linemass.engine.section.Section;
import org.linemass.geometry.Segment;
import org.linemass.geometry.Vec3;

/**
 * Turns the exact coincident copies the resolver collapsed into what the totals and the reports
 * need: per layer, the length moments of every copy beyond the first (to be taken out of the
 * layer's raw moments, as the piece stage does for material drawn twice), and one {@code duplicate}
 * error per collapsed segment giving the number of copies, the length one copy has and the mass
 * that would have been counted again. At most {@link #LISTED} findings are listed one by one; the
 * rest are summed in one finding per layer. Stateless.
 */
public final class CoincidentFindings {

    /** Most collapsed segments listed one by one (more than a person reads; the rest are summed). */
    static final int LISTED = 10_000;

    /**
     * @param removedByLayer per-layer length moments (unit density, metres) of the copies left out
     * @param findings the duplicate findings, in the order of the collapsed segments
     */
    public record Output(Map<String, Moments> removedByLayer, List<Finding> findings) {

        public Output {
            removedByLayer = Map.copyOf(removedByLayer);
            findings = List.copyOf(findings);
        }
    }

    private CoincidentFindings() {
    }

    /**
     * @param coincident the collapsed segments (world metres)
     * @param sections the section of each layer, for the mass in the messages
     * @param integrationRelative the relative accuracy of the moments
     */
    public static Output of(List<Coincident> coincident, SectionLookup sections, double integrationRelative) {
        Map<String, MomentsAccumulator> removed = new TreeMap<>();
        List<Finding> findings = new ArrayList<>();
        Map<String, double[]> unlisted = new TreeMap<>();
        for (Coincident c : coincident) {
            Segment s = c.kept();
            String layer = s.source().layer();
            Moments one = MomentIntegrator.lengthMoments(s, integrationRelative);
            long extra = c.copies() - 1;
            removed.computeIfAbsent(layer, k -> new MomentsAccumulator()).add(one.scaledDensity(extra));
            double lengthM = one.mass();
            Double extraKg = sections.forLayer(layer).map(Section::kgPerM).map(k -> k * lengthM * extra).orElse(null);
            if (findings.size() >= LISTED) {
                double[] u = unlisted.computeIfAbsent(layer, k -> new double[3]);
                u[0]++;
                u[1] += lengthM * extra;
                u[2] += extraKg == null ? 0 : extraKg;
                continue;
            }
            String message = String.format(Locale.ROOT, "%s is placed %d times in the same place, to within rounding (block copies"
                    + " drawn on top of each other): the %d copies beyond the first, %s each, would be counted again"
                    + "%s; it is counted once.", s.source().describe(), c.copies(), extra, Findings.mm(lengthM),
                    extraKg == null ? "" : " (" + Findings.kg(extraKg) + ")");
            Vec3 mid = s.point(0.5 * (s.tStart() + s.tEnd()));
            findings.add(Findings.of(FindingKind.DUPLICATE, Severity.ERROR, mid, lengthM, layer,
                    List.of(s.source()), extraKg, message));
        }
        unlisted.forEach((layer, u) -> findings.add(new Finding(FindingKind.DUPLICATE, Severity.ERROR, null, u[1], layer,
                List.of(), u[2] > 0 ? u[2] : null, String.format(Locale.ROOT, "%d more segments on layer %s are placed"
                        + " several times in the same place (not listed one by one, more than %d in the"
                        + " drawing); together %.3f m of copies beyond the first, counted once.", (long) u[0], layer,
                        LISTED, u[1]))));
        Map<String, Moments> out = new TreeMap<>();
        removed.forEach((k, v) -> out.put(k, v.result()));
        return new Output(out, findings);
    }
}
