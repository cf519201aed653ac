package org.linemass.engine.testing;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Optional;

/**
 * Finds {@code <repo>/../shared}: {@code <repo>} from the system property {@code linemass.repo}
 * (surefire sets it to the multi-module root), else by walking up from the working directory to the
 * folder holding {@code importer/} and {@code pom.xml}.
 */
public final class SharedDir {

    private SharedDir() {
    }

    public static Optional<Path> corpus() {
        return repo().map(r -> r.resolve("..").resolve("shared").resolve("corpus").normalize())
                .filter(p -> Files.isRegularFile(p.resolve("manifest.json")));
    }

    static Optional<Path> repo() {
        String prop = System.getProperty("linemass.repo");
        if (prop != null && !prop.isBlank() && Files.isDirectory(Path.of(prop, "importer"))) {
            return Optional.of(Path.of(prop).toAbsolutePath());
        }
        for (Path p = Path.of("").toAbsolutePath(); p != null; p = p.getParent()) {
            if (Files.isDirectory(p.resolve("importer")) && Files.isRegularFile(p.resolve("pom.xml"))) {
                return Optional.of(p);
            }
        }
        return Optional.empty();
    }
}
