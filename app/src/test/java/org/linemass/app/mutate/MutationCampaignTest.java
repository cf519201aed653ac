package org.linemass.app.mutate;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.io.IOException;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The mutation campaign as a test. {@link #smoke} runs in every build: a few dozen mutants of the
 * ten corpus drawings, each through the whole command, must give no stack trace, no run over its
 * bound and no invalid output. The real campaign is {@link CampaignMain}, run by {@code scripts/mutate}.
 */
class MutationCampaignTest {

    @TempDir
    Path work;

    static Path shared() {
        return Path.of(System.getProperty("linemass.repo", "..")).resolve("../shared").normalize();
    }

    @Test
    void smoke() throws IOException {
        List<Seed> seeds = Seeds.of(shared(), false);
        assumeTrue(!seeds.isEmpty(), "../shared/corpus is not beside the checkout: mutation smoke test skipped");
        // 48 mutants with a fixed seed: every kind about twice; 60 s bound leaves room on a loaded machine
        Campaign c = new Campaign(new Campaign.Config(seeds, 48, 20261204L, 60_000, 0, 0, work, null));
        List<Campaign.Failure> failures = c.run();
        assertEquals(List.of(), failures.stream().map(Campaign.Failure::detail).toList(), c.report());
    }
}
