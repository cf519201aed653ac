package org.linemass.app.mutate;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The mutation campaign as a test. {@link #smoke} runs in every build: a few dozen mutants of the
 * ten corpus drawings, each through the whole command, must give no stack trace, no run over its
 * bound and no invalid output. {@link #campaign} is the real campaign, run by {@code scripts/mutate}
 * (system property {@code linemass.mutants} = number of mutants); it writes its figures to
 * {@code target/mutate/REPORT.md} and the distinct failures with their inputs beside it.
 */
class MutationCampaignTest {

    @TempDir
    Path work;

    static Path shared() {
        return Path.of(System.getProperty("linemass.repo", "..")).resolve("../shared").normalize();
    }

    /** The seed drawings: every .dxf of the corpus and, when asked, of the external set. */
    static List<Seed> seeds(boolean external) throws IOException {
        List<Seed> seeds = new ArrayList<>();
        for (String sub : external ? List.of("corpus", "external") : List.of("corpus")) {
            Path d = shared().resolve(sub);
            if (!Files.isDirectory(d)) {
                continue;
            }
            try (Stream<Path> s = Files.list(d)) {
                for (Path p : s.filter(f -> f.getFileName().toString().toLowerCase(Locale.ROOT).endsWith(".dxf"))
                        .sorted().toList()) {
                    seeds.add(new Seed(sub + "/" + p.getFileName(), Files.readAllBytes(p)));
                }
            }
        }
        return seeds;
    }

    @Test
    void smoke() throws IOException {
        List<Seed> seeds = seeds(false);
        assumeTrue(!seeds.isEmpty(), "../shared/corpus is not beside the checkout: mutation smoke test skipped");
        // 48 mutants with a fixed seed: every kind about twice; 60 s bound leaves room on a loaded machine
        Campaign c = new Campaign(new Campaign.Config(seeds, 48, 20261204L, 60_000, 0, 0, work, null));
        List<Campaign.Failure> failures = c.run();
        assertEquals(List.of(), failures.stream().map(Campaign.Failure::detail).toList(), c.report());
    }

    @Test
    void campaign() throws IOException {
        String n = System.getProperty("linemass.mutants");
        assumeTrue(n != null, "the full campaign runs only from scripts/mutate (-Dlinemass.mutants=N)");
        List<Seed> seeds = seeds(true);
        assumeTrue(!seeds.isEmpty(), "../shared is not beside the checkout");
        Path repo = Path.of(System.getProperty("linemass.repo", ".."));
        Path out = Path.of(System.getProperty("linemass.mutate.work", repo.resolve("target/mutate").toString()));
        Files.createDirectories(out);
        Path jar = repo.resolve("app/target/linemass.jar");
        Campaign c = new Campaign(new Campaign.Config(seeds, Integer.parseInt(n),
                Long.getLong("linemass.mutate.seed", 1L), Long.getLong("linemass.mutate.bound", 20_000L),
                Integer.getInteger("linemass.mutate.cliEvery", 200), Integer.getInteger("linemass.mutate.ezdxfEvery", 100),
                out, Files.exists(jar) ? jar : null));
        List<Campaign.Failure> failures = c.run();
        String report = c.report();
        Files.writeString(out.resolve("REPORT.md"), report, StandardCharsets.UTF_8);
        System.out.println(report);
        assertEquals(List.of(), failures.stream().map(Campaign.Failure::detail).toList(), report);
    }
}
