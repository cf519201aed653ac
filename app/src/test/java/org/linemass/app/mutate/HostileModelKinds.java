package org.linemass.app.mutate;

import com.fasterxml.jackson.databind.JsonNode;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Random;
import org.linemass.drawing.LengthUnit;

/**
 * Mutations that add hostile model content to an ASCII drawing rather than damage its syntax:
 * far stray lines, rational splines with extreme weights (checked against a two-sided length
 * reference), nests of non-uniformly scaled inserts, coincident array inserts, and layer names
 * and layer rules that make a backtracking glob matcher take exponential time.
 */
final class HostileModelKinds {

    /** Layer of the added spline; the reference check reads this layer's length and bound. */
    static final String SPLINE_LAYER = "MUTANT_WEIGHTS";

    /** Relative width of the reference interval asked of {@link BezierReference}. */
    static final double REFERENCE_REL_TOL = 1e-10;

    private HostileModelKinds() {
    }

    static List<Mutation> all() {
        return List.of(farStray(), extremeWeights(), nonUniformNest(), coincidentArray(), pathologicalGlob());
    }

    /** One LINE, or a small cluster of them, 1e6 to 1e12 drawing units from the origin. */
    static Mutation farStray() {
        return GroupKinds.pairs("model-far-stray", (p, r) -> {
            int at = sectionEnd(p, "ENTITIES");
            if (at < 0) {
                return;
            }
            double d = Math.pow(10, 6 + 6 * r.nextDouble());
            double a = r.nextDouble() * 2 * Math.PI;
            double x = d * Math.cos(a);
            double y = d * Math.sin(a);
            String layer = r.nextBoolean() ? "0" : "MUTANT_STRAY";
            List<String[]> add = new ArrayList<>();
            int n = r.nextInt(4) == 0 ? 2 + r.nextInt(4) : 1;
            for (int i = 0; i < n; i++) {
                double len = Math.pow(10, 3 * r.nextDouble());
                add.addAll(line(layer, x + i * len, y, 0, x + (i + 1) * len, y + (r.nextBoolean() ? 0 : len / 3), 0));
            }
            p.addAll(at, add);
        });
    }

    /**
     * A single-span rational Bézier SPLINE (degree 2 or 3, clamped knots 0..1) on its own layer
     * with extreme weights; the run's length for that layer, with its reported bound, must meet
     * the two-sided reference of {@link BezierReference}. Weight ratios above 1e100 are refused
     * by the program with a message, which the usual message checks judge.
     */
    static Mutation extremeWeights() {
        List<Double> extremes = List.of(1e-15, 1e-9, 1e-6, 1e-3, 0.5, 2.0, 1e3, 1e6, 1e9, 1e12, 1e15, 1e20, 1e50,
                1e99, 1e101);
        return new Mutation() {
            @Override
            public String name() {
                return "model-extreme-weights";
            }

            @Override
            public byte[] apply(Seed seed, Random rnd) {
                Mutant m = make(seed, rnd);
                return m == null ? null : m.bytes();
            }

            @Override
            public Mutant make(Seed seed, Random r) {
                List<String[]> p = seed.pairs();
                if (p == null) {
                    return null;
                }
                int at = sectionEnd(p, "ENTITIES");
                if (at < 0) {
                    return null;
                }
                int degree = 2 + r.nextInt(2);
                double size = Math.pow(10, -1 + 4 * r.nextDouble());
                double ox = (r.nextDouble() - 0.5) * 2000;
                double oy = (r.nextDouble() - 0.5) * 2000;
                double[][] pts = new double[degree + 1][];
                double[] w = new double[degree + 1];
                for (int i = 0; i <= degree; i++) {
                    pts[i] = new double[] {ox + size * i, oy + size * (r.nextDouble() * 2 - 1), r.nextInt(3) == 0
                        ? size * r.nextDouble() : 0};
                    w[i] = 1;
                }
                int k = r.nextInt(3);
                if (k == 0) {
                    w[1 + r.nextInt(degree - 1)] = ByteKinds.pick(r, extremes); // an inner weight
                } else if (k == 1) {
                    w[r.nextBoolean() ? 0 : degree] = ByteKinds.pick(r, extremes); // an end weight
                } else {
                    for (int i = 0; i <= degree; i++) {
                        w[i] = ByteKinds.pick(r, extremes); // every weight
                    }
                }
                List<String[]> s = new ArrayList<>();
                s.add(new String[] {"0", "SPLINE"});
                s.add(new String[] {"8", SPLINE_LAYER});
                s.add(new String[] {"70", (pts[0][2] == 0 && pts[degree][2] == 0 && allFlat(pts)) ? "12" : "4"});
                s.add(new String[] {"71", Integer.toString(degree)});
                s.add(new String[] {"72", Integer.toString(2 * degree + 2)});
                s.add(new String[] {"73", Integer.toString(degree + 1)});
                s.add(new String[] {"74", "0"});
                for (int i = 0; i < 2 * degree + 2; i++) {
                    s.add(new String[] {"40", i <= degree ? "0.0" : "1.0"});
                }
                for (int i = 0; i <= degree; i++) {
                    s.add(new String[] {"10", num(pts[i][0])});
                    s.add(new String[] {"20", num(pts[i][1])});
                    s.add(new String[] {"30", num(pts[i][2])});
                }
                for (int i = 0; i <= degree; i++) {
                    s.add(new String[] {"41", num(w[i])});
                }
                p.addAll(at, s);
                // the reference from the numbers as written (they are exact decimal round trips)
                double[][] written = new double[degree + 1][];
                double[] ww = new double[degree + 1];
                for (int i = 0; i <= degree; i++) {
                    written[i] = new double[] {Double.parseDouble(num(pts[i][0])), Double.parseDouble(num(pts[i][1])),
                        Double.parseDouble(num(pts[i][2]))};
                    ww[i] = Double.parseDouble(num(w[i]));
                }
                BezierReference.Interval ref = BezierReference.length(written, ww, REFERENCE_REL_TOL, 1 << 20);
                String what = String.format(Locale.ROOT, "degree %d, weights %s", degree, java.util.Arrays.toString(ww));
                return new Mutant(seed.join(p), List.of(), json -> splineCheck(json, ref, written, what));
            }
        };
    }

    private static boolean allFlat(double[][] pts) {
        for (double[] q : pts) {
            if (q[2] != 0) {
                return false;
            }
        }
        return true;
    }

    /**
     * Wrong bound: the reported length of the spline's layer lies farther from the reference
     * interval [lower, upper] than its reported error bound, plus a slack for the reference's own
     * rounding (4 ulps of the largest coordinate per part, and 1e-12 of the length). Null when the
     * layer or its units are not in the report.
     */
    static List<String> splineCheck(JsonNode json, BezierReference.Interval ref, double[][] pts, String what) {
        JsonNode units = json.path("drawing").path("units");
        Double metres = null;
        for (LengthUnit u : LengthUnit.values()) {
            if (u.symbol().equals(units.asText()) && u != LengthUnit.UNITLESS) {
                metres = u.metres();
            }
        }
        JsonNode layer = null;
        for (JsonNode l : json.path("layers")) {
            if (l.path("name").asText().equals(SPLINE_LAYER)) {
                layer = l;
            }
        }
        if (metres == null || layer == null || !layer.path("length_m").isNumber()
                || !layer.path("error_bound_m").isNumber()) {
            return null;
        }
        double len = layer.path("length_m").asDouble();
        double bound = layer.path("error_bound_m").asDouble();
        double maxCoord = 0;
        for (double[] q : pts) {
            for (double c : q) {
                maxCoord = Math.max(maxCoord, Math.abs(c));
            }
        }
        double slack = (4 * Math.ulp(maxCoord) * ref.parts() + 1e-12 * ref.upper()) * metres;
        double lo = ref.lower() * metres;
        double hi = ref.upper() * metres;
        if (len - bound > hi + slack || len + bound < lo - slack) {
            return List.of(String.format(Locale.ROOT, "wrong-bound: spline (%s) reported %.17g m with bound %.3g m, "
                    + "reference between %.17g and %.17g m", what, len, bound, lo, hi));
        }
        return List.of();
    }

    /**
     * Blocks nested with a non-uniform scale (x 1.5, y 0.8 or random) at each level, as one array
     * insert or as separate inserts; the innermost holds one LINE. Either small (two or three
     * levels of 2 to 10 copies: expanded and checked like any drawing) or huge (five or six levels of
     * 50 to 100 copies, 10^8 copies and more: beyond the expansion limit, so the totals come from
     * instancing alone). Nests in between expand to a hundred thousand segments or so and measure
     * only how fast the machine checks an ordinary large drawing, so they are left out.
     */
    static Mutation nonUniformNest() {
        return GroupKinds.pairs("model-nonuniform-nest", (p, r) -> {
            boolean huge = r.nextBoolean();
            int depth = huge ? 6 + r.nextInt(2) : 3 + r.nextInt(2); // levels of inserts + the innermost block
            String prefix = "MUTANT_NEST_" + Integer.toHexString(r.nextInt(1 << 16)) + "_";
            List<String[]> blocks = new ArrayList<>();
            for (int level = depth; level >= 1; level--) {
                List<String[]> content = new ArrayList<>();
                if (level == depth) {
                    content.addAll(line("0", 0, 0, 0, 10, 3, 0));
                } else {
                    int copies = huge ? 50 + r.nextInt(51) : 2 + r.nextInt(9);
                    double sx = r.nextBoolean() ? 1.5 : 0.2 + 2 * r.nextDouble();
                    double sy = r.nextBoolean() ? 0.8 : 0.2 + 2 * r.nextDouble();
                    if (r.nextBoolean()) {
                        content.addAll(insert(prefix + (level + 1), 0, 0, sx, sy, r.nextInt(90), copies, 1, 12, 0));
                    } else {
                        for (int i = 0; i < copies; i++) {
                            content.addAll(insert(prefix + (level + 1), 12.0 * i, 0, sx, sy, 0, 1, 1, 0, 0));
                        }
                    }
                }
                blocks.addAll(block(prefix + level, content));
            }
            if (!addBlocks(p, blocks)) {
                return;
            }
            int at = sectionEnd(p, "ENTITIES");
            if (at >= 0) {
                p.addAll(at, insert(prefix + 1, 0, 0, 1.5, 0.8, 0, 1, 1, 0, 0));
            }
        });
    }

    /** A MINSERT with big counts and spacing 0, -0.0 or 1e-300: every copy in one place. */
    static Mutation coincidentArray() {
        return GroupKinds.pairs("model-coincident-array", (p, r) -> {
            String name = "MUTANT_ARRAY_" + Integer.toHexString(r.nextInt(1 << 16));
            List<String[]> content = new ArrayList<>(line("0", 0, 0, 0, 100, 0, 0));
            if (r.nextBoolean()) {
                content.addAll(line("0", 100, 0, 0, 100, 50, 0));
            }
            if (!addBlocks(p, block(name, content))) {
                return;
            }
            int at = sectionEnd(p, "ENTITIES");
            if (at < 0) {
                return;
            }
            int[][] counts = {{1_000_000, 1}, {1, 1_000_000}, {1000, 1000}, {65535, 65535}, {32767, 2}, {2, 2}};
            int[] c = counts[r.nextInt(counts.length)];
            String[] spacing = {"0", "-0.0", "1e-300"};
            List<String[]> ins = new ArrayList<>(insert(name, 0, 0, 1, 1, 0, c[0], c[1], 0, 0));
            for (String[] g : ins) {
                if (g[0].equals("44") || g[0].equals("45")) {
                    g[1] = spacing[r.nextInt(spacing.length)];
                }
            }
            p.addAll(at, ins);
        });
    }

    /**
     * Layer names made long (100 characters to 1 MB of 'A') and a layer rule
     * {@code -a *A*A*...*A*B=round:8:steel} that a backtracking matcher needs exponential time for.
     */
    static Mutation pathologicalGlob() {
        return new Mutation() {
            @Override
            public String name() {
                return "model-pathological-glob";
            }

            @Override
            public byte[] apply(Seed seed, Random rnd) {
                Mutant m = make(seed, rnd);
                return m == null ? null : m.bytes();
            }

            @Override
            public Mutant make(Seed seed, Random r) {
                List<String[]> p = seed.pairs();
                if (p == null) {
                    return null;
                }
                List<Integer> layers = GroupKinds.indices(p, c -> c == 8);
                if (layers.isEmpty()) {
                    return null;
                }
                int len = r.nextInt(20) == 0 ? 1_000_000 : r.nextInt(4) == 0 ? 100_000 : 100 + r.nextInt(2000);
                String name = "A".repeat(len) + (r.nextBoolean() ? "" : "C");
                // the longest names on one entity only: the glob matcher is what is tried, not the size of
                // every report that repeats the name
                int n = len >= 100_000 ? 1 : 1 + r.nextInt(Math.min(layers.size(), 20));
                for (int i = 0; i < n; i++) {
                    p.get(ByteKinds.pick(r, layers))[1] = name;
                }
                String glob = "*A".repeat(r.nextBoolean() ? 2 + r.nextInt(4) : 5 + r.nextInt(60)) + "*B";
                return new Mutant(seed.join(p), List.of("-a", glob + "=round:8:steel"), null);
            }
        };
    }

    // ---- building pairs

    /** Index of the 0/ENDSEC that ends section {@code name}, or -1. */
    static int sectionEnd(List<String[]> p, String name) {
        for (int i = 0; i + 1 < p.size(); i++) {
            if (Seed.code(p.get(i)) == 0 && p.get(i)[1].strip().equals("SECTION") && Seed.code(p.get(i + 1)) == 2
                    && p.get(i + 1)[1].strip().equals(name)) {
                for (int j = i + 2; j < p.size(); j++) {
                    if (Seed.code(p.get(j)) == 0 && p.get(j)[1].strip().equals("ENDSEC")) {
                        return j;
                    }
                }
                return -1;
            }
        }
        return -1;
    }

    /** Adds blocks at the end of the BLOCKS section, or in a new one before ENTITIES; false when neither exists. */
    static boolean addBlocks(List<String[]> p, List<String[]> blocks) {
        int end = sectionEnd(p, "BLOCKS");
        if (end >= 0) {
            p.addAll(end, blocks);
            return true;
        }
        for (int i = 0; i + 1 < p.size(); i++) {
            if (Seed.code(p.get(i)) == 0 && p.get(i)[1].strip().equals("SECTION") && Seed.code(p.get(i + 1)) == 2
                    && p.get(i + 1)[1].strip().equals("ENTITIES")) {
                List<String[]> sec = new ArrayList<>();
                sec.add(new String[] {"0", "SECTION"});
                sec.add(new String[] {"2", "BLOCKS"});
                sec.addAll(blocks);
                sec.add(new String[] {"0", "ENDSEC"});
                p.addAll(i, sec);
                return true;
            }
        }
        return false;
    }

    static List<String[]> block(String name, List<String[]> content) {
        List<String[]> b = new ArrayList<>();
        b.add(new String[] {"0", "BLOCK"});
        b.add(new String[] {"8", "0"});
        b.add(new String[] {"2", name});
        b.add(new String[] {"70", "0"});
        b.add(new String[] {"10", "0.0"});
        b.add(new String[] {"20", "0.0"});
        b.add(new String[] {"30", "0.0"});
        b.add(new String[] {"3", name});
        b.addAll(content);
        b.add(new String[] {"0", "ENDBLK"});
        b.add(new String[] {"8", "0"});
        return b;
    }

    static List<String[]> line(String layer, double x1, double y1, double z1, double x2, double y2, double z2) {
        return List.of(new String[] {"0", "LINE"}, new String[] {"8", layer}, new String[] {"10", num(x1)},
                new String[] {"20", num(y1)}, new String[] {"30", num(z1)}, new String[] {"11", num(x2)},
                new String[] {"21", num(y2)}, new String[] {"31", num(z2)});
    }

    static List<String[]> insert(String block, double x, double y, double sx, double sy, double angle, int cols,
            int rows, double colSpacing, double rowSpacing) {
        List<String[]> g = new ArrayList<>();
        g.add(new String[] {"0", "INSERT"});
        g.add(new String[] {"8", "0"});
        g.add(new String[] {"2", block});
        g.add(new String[] {"10", num(x)});
        g.add(new String[] {"20", num(y)});
        g.add(new String[] {"30", "0.0"});
        g.add(new String[] {"41", num(sx)});
        g.add(new String[] {"42", num(sy)});
        g.add(new String[] {"43", "1.0"});
        g.add(new String[] {"50", num(angle)});
        if (cols != 1 || rows != 1) {
            g.add(new String[] {"70", Integer.toString(cols)});
            g.add(new String[] {"71", Integer.toString(rows)});
            g.add(new String[] {"44", num(colSpacing)});
            g.add(new String[] {"45", num(rowSpacing)});
        }
        return g;
    }

    /** A double as DXF text that reads back to the same double. */
    static String num(double v) {
        return Double.toString(v);
    }
}
