package org.linemass.importer;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTimeoutPreemptively;
import static org.junit.jupiter.api.Assertions.fail;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;

/**
 * Seeded mutations (byte flips, cut-offs, deleted and duplicated lines, swapped numbers) of the
 * testdata fragments, of the corpus drawings when present, and of their binary renderings: the
 * importer must return a drawing or throw {@link DxfInputException} with a one-line message, never
 * anything else, and quickly. A deterministic complement to fuzzing.
 */
class MutationRobustnessTest {

    private static final int MUTANTS_PER_SEED = 100;
    private static final Duration BUDGET = Duration.ofSeconds(60);

    private static List<byte[]> seeds() throws IOException {
        List<byte[]> seeds = new ArrayList<>();
        List<Path> dirs = List.of(SharedFiles.testdata(), SharedFiles.corpus());
        for (Path dir : dirs) {
            if (!Files.isDirectory(dir)) {
                continue;
            }
            try (Stream<Path> s = Files.list(dir)) {
                for (Path p : s.filter(f -> f.toString().endsWith(".dxf")).sorted().toList()) {
                    byte[] ascii = Files.readAllBytes(p);
                    seeds.add(ascii);
                    seeds.add(Dxf.parse(new String(ascii, java.nio.charset.StandardCharsets.ISO_8859_1)).binary(true));
                }
            }
        }
        seeds.add(Dxf.create().entities().add(0, "SPLINE", 71, 3, 72, 8, 73, 4, 40, 0, 40, 0, 40, 0, 40, 0,
                40, 1, 40, 1, 40, 1, 40, 1, 10, 0, 20, 0, 10, 1, 20, 1, 10, 2, 20, 0, 10, 3, 20, 1,
                0, "POLYLINE", 70, 1, 0, "VERTEX", 10, 1, 42, 0.5, 0, "VERTEX", 10, 2, 0, "SEQEND").end().binary(true));
        return seeds;
    }

    @Test
    void mutatedDrawings_onlyEverGiveDrawingsOrInputErrors() throws IOException {
        List<byte[]> seeds = seeds();
        assertFalse(seeds.isEmpty());
        assertTimeoutPreemptively(BUDGET, () -> {
            Random rnd = new Random(7);
            for (byte[] seed : seeds) {
                for (int m = 0; m < MUTANTS_PER_SEED; m++) {
                    byte[] b = mutate(seed, rnd);
                    try {
                        DxfImporter.read(Dxf.NAME, b, ImportOptions.DEFAULTS);
                    } catch (DxfInputException e) {
                        if (e.getMessage().contains("\n") || e.problem().startsWith("internal error while reading")) {
                            fail("bad message: " + e.getMessage());
                        }
                    } catch (Throwable t) {
                        fail("escaped: " + t, t);
                    }
                }
            }
        });
    }

    private static byte[] mutate(byte[] seed, Random rnd) {
        byte[] b = seed.clone();
        int kind = rnd.nextInt(6);
        switch (kind) {
            case 0 -> {
                for (int i = 0; i < 1 + rnd.nextInt(8); i++) {
                    b[rnd.nextInt(b.length)] = (byte) rnd.nextInt(256);
                }
            }
            case 1 -> b = java.util.Arrays.copyOf(b, rnd.nextInt(b.length));
            case 2 -> {
                int at = rnd.nextInt(b.length);
                int len = Math.min(b.length - at, rnd.nextInt(40));
                byte[] c = new byte[b.length - len];
                System.arraycopy(b, 0, c, 0, at);
                System.arraycopy(b, at + len, c, at, b.length - at - len);
                b = c;
            }
            case 3 -> {
                int at = rnd.nextInt(b.length);
                int len = Math.min(b.length - at, rnd.nextInt(200));
                byte[] c = new byte[b.length + len];
                System.arraycopy(b, 0, c, 0, at + len);
                System.arraycopy(b, at, c, at + len, b.length - at);
                b = c;
            }
            case 4 -> {
                String[] digits = {"0", "-1", "1e308", "NaN", "-0", "99999999999", "1e-320", "7"};
                String s = new String(b, java.nio.charset.StandardCharsets.ISO_8859_1);
                String[] lines = s.split("\n", -1);
                for (int i = 0; i < 3; i++) {
                    int k = rnd.nextInt(lines.length);
                    if (lines[k].trim().matches("-?[0-9.eE+]+")) {
                        lines[k] = digits[rnd.nextInt(digits.length)];
                    }
                }
                b = String.join("\n", lines).getBytes(java.nio.charset.StandardCharsets.ISO_8859_1);
            }
            default -> {
                int at = rnd.nextInt(b.length);
                b[at] = (byte) (b[at] ^ (1 << rnd.nextInt(8)));
            }
        }
        return b;
    }
}
