package org.linemass.plan.revision;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.linemass.engine.result.DrawingResult;
import org.linemass.engine.result.MarkResult;
import org.linemass.engine.result.PieceResult;

/**
 * Gives revision B the marks of revision A where its pieces did not change: a mark of B all of
 * whose pieces are unchanged or moved pieces of one mark of A takes that mark (each mark of A goes
 * to one mark of B at most, the one with most such pieces, ties to the earlier B mark); every other
 * mark of B gets a new number after A's highest ({@code M} and at least two digits, as the engine
 * writes them). The bill is then ordered by mark. Everything else of B is kept as it is. Stateless.
 */
public final class MarkCarrier {

    private static final Pattern NUMBERED = Pattern.compile("M(\\d+)");

    private MarkCarrier() {
    }

    /** Revision {@code b} with the marks of {@code a} carried over by {@code diff} (a comparison of a with b). */
    public static DrawingResult carry(DrawingResult a, DrawingResult b, RevisionDiff diff) {
        // for each B mark: the A marks of its unchanged or moved pieces, counted
        Map<String, Map<String, Integer>> votes = new HashMap<>();
        Map<String, Integer> sizeB = new HashMap<>();
        for (PieceResult p : b.pieces()) {
            if (p.mark() != null) {
                sizeB.merge(p.mark(), 1, Integer::sum);
            }
        }
        for (PieceChange c : diff.changes()) {
            if ((c.kind() == ChangeKind.UNCHANGED || c.kind() == ChangeKind.MOVED) && c.b().mark() != null
                    && c.a().mark() != null) {
                votes.computeIfAbsent(c.b().mark(), k -> new HashMap<>()).merge(c.a().mark(), 1, Integer::sum);
            }
        }
        Map<String, String> rename = new HashMap<>();
        Set<String> taken = new HashSet<>();
        List<MarkResult> groups = new ArrayList<>(b.groups());
        // B marks whose every piece came from one A mark, most pieces first
        List<MarkResult> whole = groups.stream().filter(g -> {
            Map<String, Integer> v = votes.get(g.mark());
            return v != null && v.size() == 1 && v.values().iterator().next().equals(sizeB.get(g.mark()));
        }).sorted(Comparator.comparingInt(MarkResult::quantity).reversed()).toList();
        for (MarkResult g : whole) {
            String from = votes.get(g.mark()).keySet().iterator().next();
            if (taken.add(from)) {
                rename.put(g.mark(), from);
            }
        }
        int next = 0;
        int width = 2;
        for (MarkResult m : a.groups()) {
            Matcher x = NUMBERED.matcher(m.mark());
            if (x.matches()) {
                next = Math.max(next, Integer.parseInt(x.group(1)));
                width = Math.max(width, x.group(1).length());
            }
        }
        for (MarkResult g : groups) {
            if (!rename.containsKey(g.mark())) {
                String name;
                do {
                    name = String.format(java.util.Locale.ROOT, "M%0" + width + "d", ++next);
                } while (taken.contains(name));
                taken.add(name);
                rename.put(g.mark(), name);
            }
        }
        List<PieceResult> pieces = new ArrayList<>();
        for (PieceResult p : b.pieces()) {
            String m = p.mark() == null ? null : rename.getOrDefault(p.mark(), p.mark());
            pieces.add(new PieceResult(p.id(), p.layer(), p.section(), p.lengthM(), p.massKg(), p.centroidM(),
                    p.lengthInertiaM3(), p.inertiaKgM2(), p.startM(), p.endM(), p.closed(), p.segments(), m, p.bends(),
                    p.sources(), p.errorBoundM(), p.form()));
        }
        List<MarkResult> renamed = new ArrayList<>();
        for (MarkResult g : groups) {
            renamed.add(new MarkResult(rename.get(g.mark()), g.quantity(), g.layer(), g.section(), g.material(),
                    g.lengthEachM(), g.massEachKg(), g.lengthTotalM(), g.massTotalKg(), g.bendsEach(), g.pieceIds()));
        }
        renamed.sort(Comparator.comparing(MarkResult::mark));
        return new DrawingResult(b.drawing(), b.entities(), b.layers(), pieces, renamed, b.findings(), b.totals(),
                b.sections(), b.incompleteReasons(), b.pieceSegments());
    }
}
