package org.linemass.app.mutate;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Random;
import java.util.TreeMap;
import java.util.regex.Pattern;

/**
 * A mutation campaign: {@code count} mutants of the seed drawings, each made by one kind drawn
 * at random, each run through the whole command in this JVM within {@code boundMillis}; every
 * {@code cliEvery}-th also through the real command line in its own JVM, and every
 * {@code ezdxfEvery}-th marked-up copy also audited by an independent DXF reader. Distinct
 * failures (by class and message shape) are saved with their inputs under {@code work/failures}.
 */
public final class Campaign {

    /** What the campaign is told. */
    public record Config(List<Seed> seeds, int count, long seed, long boundMillis, int cliEvery, int ezdxfEvery,
            Path work, Path jar, java.util.function.Consumer<Campaign> progress) {

        public Config(List<Seed> seeds, int count, long seed, long boundMillis, int cliEvery, int ezdxfEvery,
                Path work, Path jar) {
            this(seeds, count, seed, boundMillis, cliEvery, ezdxfEvery, work, jar, null);
        }
    }

    /** One distinct failure: its class, its shape, the first time it was seen, and how often. */
    public record Failure(String kind, String signature, String detail, String mutation, String seed, Path input,
            int[] seen) {
    }

    /** One line naming a file, a line or byte offset: {@code name:12:}, {@code line 12}, {@code byte 40}. */
    static final Pattern NAMES_LINE = Pattern.compile(":\\d+:|\\bline \\d+|\\bbyte \\d+|:byte \\d+");

    private final Config cfg;
    private final Map<String, Failure> failures = new LinkedHashMap<>();
    private final Map<String, int[]> perKind = new TreeMap<>();
    private final Map<String, Integer> outcomes = new TreeMap<>();
    private volatile int ran;
    private int referenceChecked;
    private int referenceSkipped;
    private int wrongBounds;
    private long slowestMillis;
    private String slowest = "";
    private int cliRuns;
    private int killRuns;
    private final List<Path[]> ezdxfPairs = new ArrayList<>();
    private String ezdxfSummary = "not run";
    private long startNanos;
    private long totalNanos;

    public Campaign(Config cfg) {
        this.cfg = cfg;
    }

    /** Runs the campaign; returns the distinct failures (empty when every mutant passed). */
    public List<Failure> run() throws IOException {
        startNanos = System.nanoTime();
        List<Mutation> kinds = MutationKinds.all(cfg.seeds());
        Random rnd = new Random(cfg.seed());
        Path runDir = cfg.work().resolve("run");
        Path outDir = runDir.resolve("out");
        Files.createDirectories(outDir);
        MutantRun runner = new MutantRun();
        double[] cumulative = weights(cfg.seeds());
        for (int i = 0; i < cfg.count(); i++) {
            Seed seed = pick(cfg.seeds(), cumulative, rnd);
            Mutation kind = null;
            Mutant mutant = null;
            for (int tries = 0; mutant == null && tries < 20; tries++) {
                kind = kinds.get(rnd.nextInt(kinds.size()));
                mutant = kind.make(seed, new Random(rnd.nextLong()));
            }
            if (mutant == null) {
                continue;
            }
            byte[] bytes = mutant.bytes();
            perKind.computeIfAbsent(kind.name(), k -> new int[2])[0]++;
            Path in = runDir.resolve("mutant.dxf");
            Files.write(in, bytes);
            MutantRun.clear(outDir);
            boolean binary = new Seed("", bytes).binary();
            boolean sections = (i & 1) == 1;
            MutantRun.Result r = runner.run(MutantRun.args(in, outDir, binary, sections, false, mutant.args()), outDir,
                    bound(bytes));
            List<String> problems;
            try {
                problems = classify(r, bytes, "mutant.dxf");
            } catch (OutOfMemoryError e) {
                // checking this run's outputs did not fit the campaign's heap: a failure of the run's size
                problems = List.of("output-too-large: checking the outputs ran out of memory (" + e.getMessage() + ")");
            }
            if (r.code() == 3 && !r.overBound()) {
                MutantRun.Result d = runner.run(MutantRun.args(in, outDir, binary, sections, true, mutant.args()), outDir,
                        bound(bytes));
                problems = List.of("stack-trace: " + firstLines(d.err(), 12));
            }
            if (mutant.reference() != null && !r.overBound() && (r.code() == 0 || r.code() == 1)) {
                problems = new ArrayList<>(problems);
                problems.addAll(reference(mutant.reference(), outDir.resolve("r.json")));
            }
            if (r.millis() > slowestMillis) {
                slowestMillis = r.millis();
                slowest = kind.name() + " of " + seed.name();
            }
            for (String p : problems) {
                record(p, kind, seed, bytes, i);
                perKind.get(kind.name())[1]++;
            }
            if (cfg.ezdxfEvery() > 0 && i % cfg.ezdxfEvery() == 0 && r.code() >= 0 && r.code() <= 1
                    && Files.exists(outDir.resolve("marked.dxf"))) {
                Path dir = Files.createDirectories(cfg.work().resolve("ezdxf"));
                Path a = Files.copy(in, dir.resolve(i + ".dxf"), java.nio.file.StandardCopyOption.REPLACE_EXISTING);
                Path b = Files.copy(outDir.resolve("marked.dxf"), dir.resolve(i + "-marked.dxf"),
                        java.nio.file.StandardCopyOption.REPLACE_EXISTING);
                ezdxfPairs.add(new Path[] {a, b});
            }
            if (cfg.jar() != null && cfg.cliEvery() > 0 && i % cfg.cliEvery() == 0) {
                for (String p : new CliSample(cfg.jar(), cfg.work().resolve("cli"), cfg.boundMillis() * 3)
                        .check(bytes, binary, sections, (cliRuns & 1) == 1)) {
                    record(p, kind, seed, bytes, i);
                }
                if ((cliRuns & 1) == 1) {
                    killRuns++;
                }
                cliRuns++;
            }
            ran = i + 1;
            if ((i + 1) % 500 == 0) {
                System.out.printf(Locale.ROOT, "mutate: %d of %d mutants, %d distinct failures, %.0f s%n", i + 1,
                        cfg.count(), failures.size(), (System.nanoTime() - startNanos) / 1e9);
            }
            if ((i + 1) % 100 == 0 && cfg.progress() != null) {
                totalNanos = System.nanoTime() - startNanos;
                cfg.progress().accept(this);
            }
        }
        if (!ezdxfPairs.isEmpty()) {
            ezdxfSummary = EzdxfAudit.run(ezdxfPairs, problem -> record(problem, null, null, null, -1));
        }
        totalNanos = System.nanoTime() - startNanos;
        return List.copyOf(failures.values());
    }

    /**
     * The time bound of one run: the configured bound plus {@value #MILLIS_PER_KIB} ms per KiB of
     * the mutant, since the work grows with the drawing (the largest seed, 2.2 MB, gets about a
     * minute on top of the base bound).
     */
    long bound(byte[] mutant) {
        return cfg.boundMillis() + mutant.length / 1024 * MILLIS_PER_KIB;
    }

    static final long MILLIS_PER_KIB = 20;

    /**
     * Seeds are drawn with weight 1/sqrt(size) (sizes below 4 KiB count as 4 KiB): the many small
     * drawings come up more often than the few large ones, which cost the most time per mutant;
     * each of the 218 drawings still comes up (the largest, 2.2 MB, about 1/23 as often as one of 4 KiB).
     */
    static double[] weights(List<Seed> seeds) {
        double[] c = new double[seeds.size()];
        double sum = 0;
        for (int i = 0; i < c.length; i++) {
            sum += 1 / Math.sqrt(Math.max(4096, seeds.get(i).bytes().length));
            c[i] = sum;
        }
        return c;
    }

    static Seed pick(List<Seed> seeds, double[] cumulative, Random rnd) {
        double x = rnd.nextDouble() * cumulative[cumulative.length - 1];
        int k = java.util.Arrays.binarySearch(cumulative, x);
        k = k >= 0 ? k : -k - 1;
        return seeds.get(Math.min(k, seeds.size() - 1));
    }

    /**
     * The reference check of a mutant that has one, on its JSON report: counted as checked when
     * the report holds what it checks, and as a wrong bound for each problem found.
     */
    List<String> reference(Mutant.Reference ref, Path json) throws IOException {
        if (!Files.exists(json)) {
            return List.of();
        }
        com.fasterxml.jackson.databind.JsonNode tree;
        try {
            tree = new com.fasterxml.jackson.databind.ObjectMapper().readTree(json.toFile());
        } catch (IOException e) {
            return List.of(); // json-invalid is reported by the output checks
        }
        List<String> p = ref.check(tree);
        if (p == null) {
            referenceSkipped++;
            return List.of();
        }
        referenceChecked++;
        wrongBounds += p.size();
        return p;
    }

    /** Problems of one in-process run: stack traces, runs over the bound, bad messages, invalid outputs. */
    List<String> classify(MutantRun.Result r, byte[] input, String fileName) throws IOException {
        if (r.overBound()) {
            outcomes.merge("over bound", 1, Integer::sum);
            return List.of("over-bound: still running after " + bound(input) + " ms");
        }
        switch (r.code()) {
            case 0, 1 -> {
                outcomes.merge(r.code() == 0 ? "read (exit 0)" : "read, findings (exit 1)", 1, Integer::sum);
                return OutputChecks.success(r, input);
            }
            case 2 -> {
                outcomes.merge("refused (exit 2)", 1, Integer::sum);
                List<String> p = new ArrayList<>(message(r.err(), fileName));
                p.addAll(OutputChecks.failure(r));
                return p;
            }
            default -> {
                outcomes.merge("internal error (exit 3)", 1, Integer::sum);
                return List.of("stack-trace: " + firstLines(r.err(), 3));
            }
        }
    }

    /** An exit-2 message is one line, names the file and a line (or byte) in it. */
    static List<String> message(String err, String fileName) {
        String m = err.strip();
        List<String> p = new ArrayList<>();
        if (m.lines().count() != 1) {
            p.add("message-not-one-line: " + firstLines(m, 3));
            return p;
        }
        if (!m.contains(fileName)) {
            p.add("message-without-file: " + m);
        } else if (!NAMES_LINE.matcher(m).find()) {
            p.add("message-without-line: " + m);
        }
        return p;
    }

    private void record(String problem, Mutation kind, Seed seed, byte[] bytes, int index) {
        String cls = problem.substring(0, problem.indexOf(':'));
        String signature = cls + ": " + shape(problem.substring(problem.indexOf(':') + 1));
        Failure f = failures.get(signature);
        if (f != null) {
            f.seen()[0]++;
            return;
        }
        Path saved = null;
        if (bytes != null) {
            try {
                Path dir = Files.createDirectories(cfg.work().resolve("failures"));
                saved = dir.resolve(String.format(Locale.ROOT, "%03d-%s-%s.dxf", failures.size() + 1, cls.replaceAll("[^a-z-]+", "-"),
                        kind.name()));
                Files.write(saved, bytes);
                Files.writeString(dir.resolve(saved.getFileName() + ".txt"), "mutant " + index + " (" + kind.name()
                        + " of " + seed.name() + ")\n" + problem + "\n", StandardCharsets.UTF_8);
            } catch (IOException e) {
                saved = null;
            }
        }
        failures.put(signature, new Failure(cls, signature, problem, kind == null ? "-" : kind.name(),
                seed == null ? "-" : seed.name(), saved, new int[] {1}));
    }

    /** The message with numbers, quoted values and paths blurred, so one fault gives one signature. */
    static String shape(String s) {
        String t = s.replaceAll("'[^']*'", "'…'").replaceAll("\\(handle [^)]*\\)", "(handle …)")
                .replaceAll("[-+]?\\d+(\\.\\d+)?([eE][-+]?\\d+)?", "N").replaceAll("\\S*mutant\\.dxf", "FILE");
        return t.length() > 200 ? t.substring(0, 200) : t;
    }

    static String firstLines(String s, int n) {
        return String.join(" | ", s.strip().lines().limit(n).map(String::strip).toList());
    }

    /** The figures of the campaign as a Markdown section (so far, while it runs). */
    public synchronized String report() {
        StringBuilder sb = new StringBuilder();
        sb.append(String.format(Locale.ROOT, "mutants: %d run of %d asked (seed %d), %d seed drawings, bound %d ms + %d ms per "
                + "KiB per run, %.0f s in all (%.2f mutants/s)%n%n", ran, cfg.count(), cfg.seed(), cfg.seeds().size(),
                cfg.boundMillis(), MILLIS_PER_KIB, totalNanos / 1e9, ran / Math.max(1e-9, totalNanos / 1e9)));
        sb.append("| outcome | runs |\n|---|---|\n");
        outcomes.forEach((k, v) -> sb.append("| ").append(k).append(" | ").append(v).append(" |\n"));
        sb.append("\n| kind | mutants | problems |\n|---|---|---|\n");
        perKind.forEach((k, v) -> sb.append("| `").append(k).append("` | ").append(v[0]).append(" | ").append(v[1])
                .append(" |\n"));
        sb.append(String.format(Locale.ROOT, "%nslowest run: %d ms (%s)%n", slowestMillis, slowest));
        sb.append(String.format(Locale.ROOT, "real command line: %d runs (%d of them killed part-way and followed "
                + "by a second run into the same folder)%n", cliRuns, killRuns));
        sb.append("independent reader: ").append(ezdxfSummary).append('\n');
        sb.append(String.format(Locale.ROOT, "runs over their bound: %d%n", outcomes.getOrDefault("over bound", 0)));
        sb.append(String.format(Locale.ROOT, "reference checks (length and bound of an extreme-weight spline): %d made, "
                + "%d skipped (the layer or its units not in the report), wrong bound: %d%n", referenceChecked,
                referenceSkipped, wrongBounds));
        sb.append("\ndistinct failures: ").append(failures.size()).append('\n');
        for (Failure f : failures.values()) {
            sb.append("- ").append(f.detail().replace('\n', ' ')).append(" (").append(f.seen()[0]).append(" times; first ")
                    .append(f.mutation()).append(" of ").append(f.seed())
                    .append(f.input() == null ? "" : ", saved as " + f.input().getFileName()).append(")\n");
        }
        return sb.toString();
    }
}
