package org.linemass.app.mutate;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;

/**
 * Runs a mutant through the real command line ({@code java -jar linemass.jar check ...}) in its
 * own JVM, with a time bound, and checks it as the in-process run is checked. With {@code kill}
 * the first run is killed part-way (as a user's Ctrl-C or a batch system's timeout would) and a
 * second run into the same folder must leave no temporary behind.
 */
final class CliSample {

    private final Path jar;
    private final Path dir;
    private final long boundMillis;

    CliSample(Path jar, Path dir, long boundMillis) {
        this.jar = jar;
        this.dir = dir;
        this.boundMillis = boundMillis;
    }

    List<String> check(byte[] mutant, boolean binary, boolean sections, boolean kill) throws IOException {
        Files.createDirectories(dir);
        Path in = dir.resolve("mutant.dxf");
        Files.write(in, mutant);
        Path out = dir.resolve("out");
        MutantRun.clear(out);
        List<String> args = MutantRun.args(in, out, binary, sections, false);
        List<String> problems = new ArrayList<>();
        if (kill) {
            Process p = start(args);
            sleep(200 + Math.floorMod(mutant.length, 600));
            p.destroyForcibly();
            waitFor(p, 30_000);
            for (String name : OutputChecks.REPORTS) {
                Files.deleteIfExists(out.resolve(name));
            }
        }
        Process p = start(args);
        if (!waitFor(p, boundMillis)) {
            p.destroyForcibly();
            waitFor(p, 30_000);
            problems.add("over-bound: the command line still ran after " + boundMillis + " ms");
            return problems;
        }
        String stdout = Files.readString(dir.resolve("stdout.txt"), StandardCharsets.UTF_8);
        String stderr = Files.readString(dir.resolve("stderr.txt"), StandardCharsets.UTF_8);
        MutantRun.Result r = new MutantRun.Result(p.exitValue(), stdout, stderr, 0, false, out);
        switch (r.code()) {
            case 0, 1 -> problems.addAll(OutputChecks.success(r, mutant));
            case 2 -> {
                problems.addAll(Campaign.message(stderr, "mutant.dxf"));
                problems.addAll(OutputChecks.failure(r));
            }
            default -> problems.add("stack-trace: command line exit " + r.code() + ": " + Campaign.firstLines(stderr, 3));
        }
        if (kill) {
            // the second run is the "later run in that folder": what the killed one left must be gone
            OutputChecks.temporaries(out, problems);
        }
        return problems.stream().map(s -> s.replaceFirst(":", " (command line):")).toList();
    }

    private Process start(List<String> args) throws IOException {
        List<String> cmd = new ArrayList<>(List.of(Path.of(System.getProperty("java.home"), "bin", "java").toString(),
                "-XX:+UseParallelGC", "-jar", jar.toString()));
        cmd.addAll(args);
        return new ProcessBuilder(cmd).redirectOutput(dir.resolve("stdout.txt").toFile())
                .redirectError(dir.resolve("stderr.txt").toFile()).start();
    }

    private static boolean waitFor(Process p, long millis) throws IOException {
        try {
            return p.waitFor(millis, TimeUnit.MILLISECONDS);
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new IOException("interrupted", e);
        }
    }

    private static void sleep(long ms) {
        try {
            Thread.sleep(ms);
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
        }
    }
}
