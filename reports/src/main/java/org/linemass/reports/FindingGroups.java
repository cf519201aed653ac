package org.linemass.reports;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.TreeSet;
import org.linemass.engine.result.Bend;
import org.linemass.engine.result.DrawingResult;
import org.linemass.engine.result.Finding;
import org.linemass.engine.result.FindingKind;
import org.linemass.engine.result.PieceResult;
import org.linemass.engine.result.Severity;
import org.linemass.engine.result.SourceRef;

/**
 * Findings that say the same thing at different places, grouped so a report can show one row
 * ("76 tight bends on M01, M02: Bend of 90.0 deg has an inside radius of 12.000 mm, below the
 * minimum 16.000 mm ...") with the individual findings one step away. Two findings are alike when
 * they have the same kind, the same severity and the same message once the references to their
 * own entities ("LINE at line 877, handle 47, via block B") are replaced by the entity type: the
 * rest of a message (sizes, radii, sections, counts) must agree to the character, so findings
 * that differ in any printed number stay apart.
 *
 * <p>Groups come errors first, then warnings, then notes, each in the order of its first finding;
 * a finding unlike any other is a group of one. Finding numbers are 1-based positions in
 * {@link DrawingResult#findings()}, the numbers every report shows. The marks of a group are those
 * of the pieces the findings lie on: a piece with a bend exactly at the finding's place, else the
 * pieces drawn from the finding's first entity.
 */
public final class FindingGroups {

    /** At most this many marks or layers are named in a headline; more are counted. */
    static final int NAMED = 4;

    /**
     * One group: {@code message} is the shared message with entity references reduced to their
     * type; {@code numbers} are the finding numbers, ascending; {@code sizeM} is the common size or
     * null when the sizes differ or there are none.
     */
    public record Group(String kind, Severity severity, String message, List<Integer> numbers, List<String> layers,
            List<String> marks, Double sizeM) {

        public Group {
            numbers = List.copyOf(numbers);
            layers = List.copyOf(layers);
            marks = List.copyOf(marks);
        }

        public int count() {
            return numbers.size();
        }

        /** "76 tight bends on M01, M02" (or "... on layer X" when no piece carries them). */
        public String headline() {
            String where;
            if (!marks.isEmpty()) {
                where = " on " + named(marks, "mark");
            } else if (!layers.isEmpty()) {
                where = " on " + (layers.size() == 1 ? "layer " : "layers ") + named(layers, "layer");
            } else {
                where = "";
            }
            return count() + " " + plural(kind, count()) + where;
        }

        /**
         * The finding numbers as runs of three or more, "25-40, 45-48, 53, 54"; after {@value #RUNS_NAMED} runs the rest
         * are counted ("... and 30 more").
         */
        public String numberText() {
            StringBuilder b = new StringBuilder();
            int runs = 0;
            int k = 0;
            while (k < numbers.size()) {
                int end = k;
                while (end + 1 < numbers.size() && numbers.get(end + 1) == numbers.get(end) + 1) {
                    end++;
                }
                if (end == k + 1) {
                    end = k; // two in a row read better as "4, 5"
                }
                if (runs == RUNS_NAMED) {
                    b.append(" and ").append(numbers.size() - k).append(" more");
                    break;
                }
                b.append(runs == 0 ? "" : ", ").append(numbers.get(k));
                if (end > k) {
                    b.append('-').append(numbers.get(end));
                }
                runs++;
                k = end + 1;
            }
            return b.toString();
        }
    }

    /** Runs of finding numbers written out before the rest are counted. */
    static final int RUNS_NAMED = 6;

    private FindingGroups() {
    }

    /** The groups of {@code r}'s findings (every finding in exactly one group). */
    public static List<Group> of(DrawingResult r) {
        return of(r, r.findings());
    }

    /** As {@link #of(DrawingResult)} for {@code findings} numbered 1.. in their order (a filtered list). */
    static List<Group> of(DrawingResult r, List<Finding> findings) {
        Marks marks = new Marks(r.pieces());
        Map<String, List<Integer>> byKey = new LinkedHashMap<>();
        Map<String, String> text = new HashMap<>();
        for (int i = 0; i < findings.size(); i++) {
            Finding f = findings.get(i);
            String m = normalised(f);
            String key = f.severity().ordinal() + "\u0000" + f.kind() + "\u0000" + m;
            byKey.computeIfAbsent(key, k -> new ArrayList<>()).add(i + 1);
            text.putIfAbsent(key, m);
        }
        List<Group> out = new ArrayList<>();
        for (Severity level : new Severity[] {Severity.ERROR, Severity.WARNING, Severity.INFO}) {
            for (Map.Entry<String, List<Integer>> e : byKey.entrySet()) {
                Finding first = findings.get(e.getValue().get(0) - 1);
                if (first.severity() != level) {
                    continue;
                }
                TreeSet<String> layers = new TreeSet<>();
                TreeSet<String> onMarks = new TreeSet<>();
                boolean sameSize = true;
                for (int n : e.getValue()) {
                    Finding f = findings.get(n - 1);
                    if (f.layer() != null && !f.layer().isEmpty()) {
                        layers.add(f.layer());
                    }
                    onMarks.addAll(marks.of(f));
                    sameSize &= Objects.equals(f.sizeM(), first.sizeM());
                }
                out.add(new Group(first.kind(), level, text.get(e.getKey()), e.getValue(), List.copyOf(layers),
                        List.copyOf(onMarks), sameSize ? first.sizeM() : null));
            }
        }
        return out;
    }

    /** The message with each of the finding's own entity references replaced by the entity type. */
    static String normalised(Finding f) {
        String m = f.message();
        // longest first, so "LINE at line 12, handle 4, via block B" goes before "LINE at line 12, handle 4"
        List<SourceRef> refs = new ArrayList<>(f.entities());
        refs.sort((a, b) -> describe(b).length() - describe(a).length());
        for (SourceRef s : refs) {
            m = m.replace(describe(s), s.entityType());
        }
        return m;
    }

    /** The entity reference as the engine writes it in messages ({@code Provenance.describe}). */
    static String describe(SourceRef s) {
        StringBuilder sb = new StringBuilder();
        sb.append(s.entityType()).append(" at line ").append(s.line());
        if (s.handle() != null && !s.handle().isEmpty()) {
            sb.append(", handle ").append(s.handle());
        }
        if (!s.blockPath().isEmpty()) {
            sb.append(", via block ").append(String.join(" > ", s.blockPath()));
        }
        return sb.toString();
    }

    /** "tight bends", "T-junctions": the kind as a plural noun (singular for one). */
    static String plural(String kind, int n) {
        String noun = kind.equals(FindingKind.T_JUNCTION) ? "T-junction" : kind.replace('_', ' ');
        if (n == 1) {
            return noun;
        }
        return noun.endsWith("s") || noun.endsWith("x") ? noun + "es" : noun + "s";
    }

    private static String named(List<String> names, String noun) {
        if (names.size() > NAMED) {
            return names.size() + " " + noun + "s";
        }
        return String.join(", ", names);
    }

    /** The marks of the pieces a finding lies on. */
    private static final class Marks {
        private final Map<SourceRef, TreeSet<String>> bySource = new HashMap<>();
        private final Map<org.linemass.geometry.Vec3, TreeSet<String>> byBend = new HashMap<>();

        Marks(List<PieceResult> pieces) {
            for (PieceResult p : pieces) {
                if (p.mark() == null || p.mark().isEmpty()) {
                    continue;
                }
                for (SourceRef s : p.sources()) {
                    bySource.computeIfAbsent(s, k -> new TreeSet<>()).add(p.mark());
                }
                for (Bend b : p.bends()) {
                    if (b.atM() != null) {
                        byBend.computeIfAbsent(b.atM(), k -> new TreeSet<>()).add(p.mark());
                    }
                }
            }
        }

        TreeSet<String> of(Finding f) {
            if (f.atM() != null && byBend.containsKey(f.atM())) {
                return byBend.get(f.atM());
            }
            if (!f.entities().isEmpty() && bySource.containsKey(f.entities().get(0))) {
                return bySource.get(f.entities().get(0));
            }
            return new TreeSet<>();
        }
    }
}
