package org.linemass.app.mutate;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;

/**
 * Mutations of the group pairs of an ASCII drawing: pairs swapped, lost, repeated or moved,
 * numbers replaced by extremes, entity types changed, whole records repeated or moved, and array
 * inserts and bulges given hostile values.
 */
final class GroupKinds {

    /** Numbers at the edges of what a double, an int or a DXF count can hold. */
    static final List<String> EXTREMES = List.of("1e308", "-1e308", "1e99", "-1e99", "1e-300", "-1e-300", "0",
            "-0.0", "NaN", "Infinity", "-Infinity", "65535", "65536", "-1", "2147483647", "-2147483648",
            "9223372036854775807", "1e20", "4.9e-324", "1.0000000001", "1e309", "0x10", "1e", "");

    static final List<String> ENTITY_TYPES = List.of("LINE", "ARC", "CIRCLE", "LWPOLYLINE", "POLYLINE", "VERTEX",
            "SEQEND", "INSERT", "SPLINE", "ELLIPSE", "HELIX", "3DFACE", "TEXT", "BLOCK", "ENDBLK", "SECTION",
            "ENDSEC", "TABLE", "ENDTAB", "LAYER", "EOF", "POINT", "MLINE");

    private GroupKinds() {
    }

    static List<Mutation> all() {
        return List.of(
                pairs("group-swap-pair", (p, r) -> {
                    // code line and value line change places (the "swapped group pairs" drawing)
                    int n = 1 + r.nextInt(3);
                    for (int i = 0; i < n; i++) {
                        String[] g = p.get(r.nextInt(p.size()));
                        String t = g[0];
                        g[0] = g[1];
                        g[1] = t;
                    }
                }),
                pairs("group-delete", (p, r) -> {
                    int n = 1 + r.nextInt(3);
                    for (int i = 0; i < n && p.size() > 1; i++) {
                        p.remove(r.nextInt(p.size()));
                    }
                }),
                pairs("group-duplicate", (p, r) -> {
                    int at = r.nextInt(p.size());
                    p.add(at, p.get(at).clone());
                }),
                pairs("group-swap-adjacent", (p, r) -> {
                    if (p.size() > 1) {
                        int at = r.nextInt(p.size() - 1);
                        String[] t = p.get(at);
                        p.set(at, p.get(at + 1));
                        p.set(at + 1, t);
                    }
                }),
                pairs("group-number", (p, r) -> {
                    List<Integer> numeric = indices(p, c -> c >= 10 && c <= 59 || c >= 70 && c <= 99
                            || c >= 140 && c <= 147 || c >= 210 && c <= 239 || c >= 1010 && c <= 1071);
                    int n = 1 + r.nextInt(3);
                    for (int i = 0; i < n && !numeric.isEmpty(); i++) {
                        p.get(ByteKinds.pick(r, numeric))[1] = ByteKinds.pick(r, EXTREMES);
                    }
                }),
                pairs("group-code", (p, r) -> {
                    String[] g = p.get(r.nextInt(p.size()));
                    int[] common = {0, 2, 5, 8, 10, 20, 30, 40, 42, 50, 62, 66, 70, 71, 72, 73, 74, 90, 100, 330, 999,
                        1001};
                    g[0] = Integer.toString(r.nextInt(4) == 0 ? r.nextInt(1072) : common[r.nextInt(common.length)]);
                }),
                pairs("group-entity-type", (p, r) -> {
                    List<Integer> starts = indices(p, c -> c == 0);
                    if (!starts.isEmpty()) {
                        p.get(ByteKinds.pick(r, starts))[1] = ByteKinds.pick(r, ENTITY_TYPES);
                    }
                }),
                pairs("group-long-value", (p, r) -> {
                    int len = r.nextInt(25) == 0 ? 1_100_000 : 100 + r.nextInt(20_000);
                    String v = (r.nextBoolean() ? "9" : "x").repeat(len);
                    int at = r.nextInt(p.size());
                    if (r.nextBoolean()) {
                        p.add(at, new String[] {"999", v});
                    } else {
                        p.get(at)[1] = v;
                    }
                }),
                pairs("group-record-repeat", (p, r) -> {
                    int[] rec = record(p, r);
                    if (rec != null) {
                        List<String[]> copy = new ArrayList<>(p.subList(rec[0], rec[1]));
                        int times = 1 + r.nextInt(r.nextInt(8) == 0 ? 2000 : 4);
                        for (int i = 0; i < times; i++) {
                            p.addAll(rec[1], copy.stream().map(String[]::clone).toList());
                        }
                    }
                }),
                pairs("group-record-move", (p, r) -> {
                    int[] rec = record(p, r);
                    if (rec != null) {
                        List<String[]> moved = new ArrayList<>(p.subList(rec[0], rec[1]));
                        p.subList(rec[0], rec[1]).clear();
                        List<Integer> starts = indices(p, c -> c == 0);
                        int to = starts.isEmpty() ? 0 : ByteKinds.pick(r, starts);
                        p.addAll(to, moved);
                    }
                }),
                pairs("group-bulge", (p, r) -> {
                    List<Integer> poly = indices(p, c -> c == 10);
                    if (!poly.isEmpty()) {
                        int at = ByteKinds.pick(r, poly) + 1 + r.nextInt(2);
                        String v = ByteKinds.pick(r, List.of("-1e99", "1e99", "1e-300", "-1", "1", "1e16", "NaN",
                                "-1e308"));
                        p.add(Math.min(at, p.size()), new String[] {"42", v});
                    }
                }),
                pairs("group-array-insert", (p, r) -> {
                    List<Integer> inserts = new ArrayList<>();
                    for (int i = 0; i < p.size(); i++) {
                        if (Seed.code(p.get(i)) == 0 && p.get(i)[1].strip().equals("INSERT")) {
                            inserts.add(i);
                        }
                    }
                    if (inserts.isEmpty()) {
                        return;
                    }
                    int at = ByteKinds.pick(r, inserts) + 1;
                    List<String> counts = List.of("65535", "1000000", "400", "2", "0", "-3", "32767");
                    List<String> spacing = List.of("-0.0", "0", "1e308", "1e-300", "1", "1e99", "-1e99", "NaN");
                    p.add(at, new String[] {"70", ByteKinds.pick(r, counts)});
                    p.add(at, new String[] {"71", ByteKinds.pick(r, counts)});
                    p.add(at, new String[] {"44", ByteKinds.pick(r, spacing)});
                    p.add(at, new String[] {"45", ByteKinds.pick(r, spacing)});
                }));
    }

    /** A group-level kind; does not apply to binary drawings or ones with an odd line count. */
    static Mutation pairs(String name, java.util.function.BiConsumer<List<String[]>, Random> change) {
        return Mutation.of(name, (s, r) -> {
            List<String[]> p = s.pairs();
            if (p == null || p.isEmpty()) {
                return null;
            }
            change.accept(p, r);
            return s.join(p);
        });
    }

    /** Indices of the pairs whose group code passes {@code test}. */
    static List<Integer> indices(List<String[]> p, java.util.function.IntPredicate test) {
        List<Integer> out = new ArrayList<>();
        for (int i = 0; i < p.size(); i++) {
            if (test.test(Seed.code(p.get(i)))) {
                out.add(i);
            }
        }
        return out;
    }

    /** A random record {from, to}: from a pair with code 0 up to the next one (exclusive), or null. */
    static int[] record(List<String[]> p, Random r) {
        List<Integer> starts = indices(p, c -> c == 0);
        if (starts.size() < 2) {
            return null;
        }
        int k = r.nextInt(starts.size() - 1);
        return new int[] {starts.get(k), starts.get(k + 1)};
    }
}
