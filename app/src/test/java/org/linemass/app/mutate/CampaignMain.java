package org.linemass.app.mutate;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

/**
 * The campaign from the command line ({@code scripts/mutate} runs it on the test class path):
 * {@code CampaignMain COUNT SEED WORK REPO} with the bound, the command-line sample and the ezdxf
 * sample as system properties {@code linemass.mutate.bound} (ms, default 20000),
 * {@code linemass.mutate.cliEvery} (default 200) and {@code linemass.mutate.ezdxfEvery} (default 100).
 * Writes {@code WORK/REPORT.md}; exits 0 when no mutant failed, 1 otherwise.
 */
public final class CampaignMain {

    private CampaignMain() {
    }

    public static void main(String[] args) throws IOException {
        if (args.length != 4) {
            System.err.println("usage: CampaignMain COUNT SEED WORK REPO");
            System.exit(2);
        }
        int count = Integer.parseInt(args[0]);
        long seed = Long.parseLong(args[1]);
        Path work = Files.createDirectories(Path.of(args[2]));
        Path repo = Path.of(args[3]);
        System.setProperty("linemass.repo", repo.toString());
        List<Seed> seeds = Seeds.of(repo.resolve("../shared").normalize(), true);
        if (seeds.isEmpty()) {
            System.err.println("mutate: no drawings in ../shared/corpus or ../shared/external beside the checkout");
            System.exit(2);
        }
        Path jar = repo.resolve("app/target/linemass.jar");
        // REPORT.md is rewritten every 100 mutants, so a campaign stopped part-way leaves its figures so far
        java.util.function.Consumer<Campaign> progress = c -> {
            try {
                Files.writeString(work.resolve("REPORT.md.part"), "(stopped or still running; figures so far)\n\n"
                        + c.report(), StandardCharsets.UTF_8);
                Files.move(work.resolve("REPORT.md.part"), work.resolve("REPORT.md"),
                        java.nio.file.StandardCopyOption.REPLACE_EXISTING, java.nio.file.StandardCopyOption.ATOMIC_MOVE);
            } catch (IOException e) {
                System.err.println("mutate: cannot write the progress report: " + e.getMessage());
            }
        };
        Campaign c = new Campaign(new Campaign.Config(seeds, count, seed, Long.getLong("linemass.mutate.bound", 20_000L),
                Integer.getInteger("linemass.mutate.cliEvery", 200), Integer.getInteger("linemass.mutate.ezdxfEvery", 100),
                work, Files.exists(jar) ? jar : null, progress));
        List<Campaign.Failure> failures = c.run();
        String report = c.report();
        Files.writeString(work.resolve("REPORT.md"), report, StandardCharsets.UTF_8);
        System.out.print(report);
        System.exit(failures.isEmpty() ? 0 : 1);
    }
}
