package org.linemass.app.mutate;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.stream.Stream;

/** The seed drawings: every .dxf of {@code shared/corpus} and, when asked, of {@code shared/external}. */
final class Seeds {

    private Seeds() {
    }

    static List<Seed> of(Path shared, boolean external) throws IOException {
        List<Seed> seeds = new ArrayList<>();
        for (String sub : external ? List.of("corpus", "external") : List.of("corpus")) {
            Path d = shared.resolve(sub);
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
}
