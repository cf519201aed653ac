package org.linemass.engine.pieces.dedup;

import java.util.ArrayList;
import java.util.List;
import org.linemass.engine.pieces.checks.Findings;
import org.linemass.engine.pieces.checks.SectionCache;
import org.linemass.engine.result.FindingKind;
import org.linemass.engine.result.Severity;
import org.linemass.geometry.Segment;
import org.linemass.geometry.Straight;
import org.linemass.geometry.Vec3;

/**
 * Resolves one cluster of collinear straights on one layer: projects them onto a common carrier
 * (the direction of the longest member, sign fixed so the result does not depend on how members
 * are oriented), sweeps the intervals, keeps what is covered once and reports the rest. A
 * partly covered straight is trimmed so that its kept part starts exactly at the end of the
 * straight that covered it, so the two join without a gap.
 */
final class StraightOverlaps {

    private StraightOverlaps() {
    }

    /**
     * Sets {@code kept.get(k)} to the parts of member k that stay (untouched members keep null,
     * meaning "the original"), adds removed sub-curves and findings.
     */
    static void resolve(List<Straight> members, double tol, SectionCache sections, List<List<Segment>> kept,
            List<Segment> removed, List<org.linemass.engine.result.Finding> findings) {
        Straight ref = members.get(0);
        for (Straight s : members) {
            if (s.length() > ref.length() || (s.length() == ref.length() && Ranks.of(s.source())
                    .compareTo(Ranks.of(ref.source())) < 0)) {
                ref = s;
            }
        }
        Vec3 dir = canonical(ref.b().minus(ref.a()).unit());
        Vec3 origin = ref.a();
        List<IntervalSweep.Item> items = new ArrayList<>();
        Vec3[] atLo = new Vec3[members.size()];
        Vec3[] atHi = new Vec3[members.size()];
        for (int k = 0; k < members.size(); k++) {
            Straight s = members.get(k);
            double sa = s.a().minus(origin).dot(dir);
            double sb = s.b().minus(origin).dot(dir);
            boolean forward = sa <= sb;
            atLo[k] = forward ? s.a() : s.b();
            atHi[k] = forward ? s.b() : s.a();
            items.add(new IntervalSweep.Item(k, Math.min(sa, sb), Math.max(sa, sb), Ranks.of(s.source())));
        }
        for (IntervalSweep.Cut cut : IntervalSweep.sweep(items, tol)) {
            int k = cut.item();
            int o = cut.owner();
            Straight s = members.get(k);
            Straight owner = members.get(o);
            IntervalSweep.Item mine = items.get(k);
            IntervalSweep.Item theirs = items.get(o);
            String layer = s.source().layer();
            double overlap;
            Vec3 middle;
            String kind;
            if (cut.whole()) {
                kept.set(k, List.of());
                removed.add(s);
                overlap = s.length();
                middle = s.point(0.5);
                boolean same = Math.abs(mine.lo() - theirs.lo()) <= tol && Math.abs(mine.hi() - theirs.hi()) <= tol;
                kind = same ? FindingKind.DUPLICATE : FindingKind.OVERLAP;
            } else {
                Vec3 p = atHi[o];
                boolean forward = atLo[k].equals(s.a());
                kept.set(k, List.of(forward ? new Straight(p, s.b(), s.source()) : new Straight(s.a(), p, s.source())));
                Straight gone = new Straight(atLo[k], p, s.source());
                removed.add(forward ? gone : gone.reversed());
                overlap = gone.length();
                middle = gone.point(0.5);
                kind = FindingKind.OVERLAP;
            }
            Double mass = sections.massOf(layer, overlap);
            String message = (FindingKind.DUPLICATE.equals(kind)
                    ? s.source().describe() + " is drawn again over " + owner.source().describe()
                    : s.source().describe() + " overlaps " + owner.source().describe() + " along the same line")
                    + ": " + Findings.mm(overlap) + " would be counted twice"
                    + (mass == null ? "" : " (" + Findings.kg(mass) + ")") + "; it is counted once.";
            findings.add(Findings.of(kind, Severity.ERROR, middle, overlap, layer,
                    List.of(s.source(), owner.source()), mass, message));
        }
    }

    /** The unit vector or its negation, whichever has its largest-magnitude component positive. */
    static Vec3 canonical(Vec3 d) {
        double ax = Math.abs(d.x());
        double ay = Math.abs(d.y());
        double az = Math.abs(d.z());
        double lead = ax >= ay && ax >= az ? d.x() : (ay >= az ? d.y() : d.z());
        return lead < 0 ? d.negate() : d;
    }
}
