package org.linemass.reports.revision;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.TreeMap;
import org.linemass.engine.result.PieceResult;
import org.linemass.plan.revision.ChangeKind;
import org.linemass.plan.revision.PieceChange;
import org.linemass.plan.revision.RevisionCost;
import org.linemass.plan.revision.RevisionDiff;
import org.linemass.reports.UnitSystem;
import org.linemass.reports.plan.PlanTable;
import org.linemass.reports.plan.PlanTable.Num;

/**
 * The tables of a revision comparison: every piece that is not unchanged (kind, marks in A and
 * B, layers, sections, lengths, move, what changed, masses and the mass change, and with prices
 * the costs and the cost change); per section and per mark the pieces, masses and costs of both
 * revisions and their change, with a total row. Marks are A's numbering; a piece only in B is
 * listed under its B mark as {@code new Mnn}. A mass or cost that is not known is an empty cell,
 * never 0. {@code cost} may be null (no price table): the cost columns are then left out.
 */
public final class RevisionTables {

    private final UnitSystem u;
    private final RevisionCost cost;

    public RevisionTables(UnitSystem units, RevisionCost cost) {
        this.u = units;
        this.cost = cost;
    }

    public PlanTable pieces(RevisionDiff diff) {
        List<List<Object>> rows = new ArrayList<>();
        for (PieceChange c : diff.changes()) {
            if (c.kind() == ChangeKind.UNCHANGED) {
                continue;
            }
            PieceResult a = c.a();
            PieceResult b = c.b();
            List<Object> r = new ArrayList<>(Arrays.asList(c.kind().label(), a == null ? "" : a.mark(),
                    b == null ? "" : b.mark(), layers(a, b), a == null ? null : a.section(), b == null ? null : b.section(),
                    a == null ? null : shortNum(a.lengthM()), b == null ? null : shortNum(b.lengthM()),
                    a == null || b == null ? null : shortNum(c.moveM()), String.join(", ", c.changed()),
                    a == null ? null : mass(a.massKg()), b == null ? null : mass(b.massKg()), mass(c.massChangeKg())));
            if (cost != null) {
                Double ca = cost.piece(a, false);
                Double cb = cost.piece(b, true);
                r.addAll(Arrays.asList(money(ca), money(cb), ca == null || cb == null ? null : money(cb - ca)));
            }
            rows.add(r);
        }
        List<String> h = new ArrayList<>(List.of("change", "mark A", "mark B", "layer", "section A", "section B",
                "length A [" + u.shortUnit() + "]", "length B [" + u.shortUnit() + "]", "move [" + u.shortUnit() + "]",
                "what changed", "mass A [" + u.massUnit() + "]", "mass B [" + u.massUnit() + "]",
                "mass change [" + u.massUnit() + "]"));
        addCostHeader(h);
        return new PlanTable("changed pieces", h, rows);
    }

    public PlanTable sections(RevisionDiff diff) {
        Map<String, Sum> by = new TreeMap<>();
        for (PieceChange c : diff.changes()) {
            if (c.a() != null) {
                by.computeIfAbsent(name(c.a().section()), k -> new Sum()).add(c.a(), false);
            }
            if (c.b() != null) {
                by.computeIfAbsent(name(c.b().section()), k -> new Sum()).add(c.b(), true);
            }
        }
        List<List<Object>> rows = new ArrayList<>();
        Sum total = new Sum();
        for (Map.Entry<String, Sum> e : by.entrySet()) {
            Sum s = e.getValue();
            total.merge(s);
            List<Object> r = s.row(e.getKey());
            if (cost != null) {
                String section = e.getKey().equals(NONE) ? null : e.getKey();
                Double ca = cost.section(section, false);
                Double cb = cost.section(section, true);
                r.addAll(Arrays.asList(money(ca), money(cb), ca == null || cb == null ? null : money(cb - ca)));
            }
            rows.add(r);
        }
        List<Object> t = total.row("TOTAL");
        if (cost != null) {
            t.addAll(Arrays.asList(money(cost.total(false)), money(cost.total(true)),
                    money(cost.total(true) - cost.total(false))));
        }
        rows.add(t);
        List<String> h = new ArrayList<>(List.of("section", "pieces A", "pieces B", "mass A [" + u.massUnit() + "]",
                "mass B [" + u.massUnit() + "]", "mass change [" + u.massUnit() + "]"));
        addCostHeader(h);
        return new PlanTable("sections", h, rows);
    }

    public PlanTable marks(RevisionDiff diff) {
        Map<String, Sum> by = new TreeMap<>();
        Map<String, String> section = new TreeMap<>();
        for (PieceChange c : diff.changes()) {
            String mark = c.a() != null ? c.a().mark() : "new " + c.b().mark();
            section.putIfAbsent(mark, name(c.section()));
            Sum s = by.computeIfAbsent(mark, k -> new Sum());
            if (c.a() != null) {
                s.add(c.a(), false);
            }
            if (c.b() != null) {
                s.add(c.b(), true);
            }
        }
        List<List<Object>> rows = new ArrayList<>();
        for (Map.Entry<String, Sum> e : by.entrySet()) {
            List<Object> r = e.getValue().row(e.getKey());
            r.add(1, section.get(e.getKey()));
            if (cost != null) {
                Sum s = e.getValue();
                r.addAll(Arrays.asList(money(s.costA), money(s.costB),
                        s.costA == null || s.costB == null ? null : money(s.costB - s.costA)));
            }
            rows.add(r);
        }
        List<String> h = new ArrayList<>(List.of("mark (A)", "section", "pieces A", "pieces B",
                "mass A [" + u.massUnit() + "]", "mass B [" + u.massUnit() + "]", "mass change [" + u.massUnit() + "]"));
        addCostHeader(h);
        return new PlanTable("marks", h, rows);
    }

    /**
     * Marks renumbered between the revisions: pairs of an unchanged or moved piece whose mark in B is
     * not its mark in A, with how many pieces each pair covers.
     */
    public PlanTable renumbered(RevisionDiff diff) {
        Map<String, Map<String, Long>> pairs = new TreeMap<>();
        for (PieceChange c : diff.changes()) {
            if ((c.kind() == ChangeKind.UNCHANGED || c.kind() == ChangeKind.MOVED)
                    && !Objects.equals(c.a().mark(), c.b().mark())) {
                pairs.computeIfAbsent(c.a().mark(), k -> new TreeMap<>()).merge(c.b().mark(), 1L, Long::sum);
            }
        }
        List<List<Object>> rows = new ArrayList<>();
        pairs.forEach((markA, bs) -> bs.forEach((markB, n) -> rows.add(new ArrayList<>(Arrays.asList(markA, markB, n)))));
        return new PlanTable("renumbered marks", List.of("mark A", "mark B", "pieces"), rows);
    }

    private static final String NONE = "(no section)";

    private static String name(String section) {
        return section == null ? NONE : section;
    }

    private void addCostHeader(List<String> h) {
        if (cost != null) {
            String cur = cost.currency().isEmpty() ? "" : " [" + cost.currency() + "]";
            h.addAll(List.of("cost A" + cur, "cost B" + cur, "cost change" + cur));
        }
    }

    private static String layers(PieceResult a, PieceResult b) {
        if (a == null || b == null || Objects.equals(a.layer(), b.layer())) {
            return a != null ? a.layer() : b.layer();
        }
        return a.layer() + " -> " + b.layer();
    }

    private Num shortNum(double m) {
        return new Num(u.inShortUnit(m), u.shortDecimals());
    }

    private Num mass(Double kg) {
        return kg == null || !Double.isFinite(kg) ? null : new Num(u.inMassUnit(kg), u.massDecimals());
    }

    private static Num money(Double v) {
        return v == null ? null : new Num(v, 2);
    }

    /** Pieces, masses and costs of one group in both revisions; a null mass or cost stays unknown. */
    private final class Sum {
        long piecesA;
        long piecesB;
        Double massA = 0.0;
        Double massB = 0.0;
        Double costA = 0.0;
        Double costB = 0.0;

        void add(PieceResult p, boolean inB) {
            Double c = cost == null ? null : cost.piece(p, inB);
            if (inB) {
                piecesB++;
                massB = plus(massB, p.massKg());
                costB = plus(costB, c);
            } else {
                piecesA++;
                massA = plus(massA, p.massKg());
                costA = plus(costA, c);
            }
        }

        void merge(Sum o) {
            piecesA += o.piecesA;
            piecesB += o.piecesB;
            massA = plus(massA, o.massA);
            massB = plus(massB, o.massB);
        }

        List<Object> row(String name) {
            return new ArrayList<>(Arrays.asList(name, piecesA, piecesB, mass(massA), mass(massB),
                    massA == null || massB == null ? null : mass(massB - massA)));
        }

        private Double plus(Double x, Double y) {
            return x == null || y == null ? null : x + y;
        }
    }
}
