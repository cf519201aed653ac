package org.linemass.importer;

import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.Paths;

/** Locates the repository root and the shared folder beside it (test helper). */
final class SharedFiles {

    private SharedFiles() {
    }

    static Path repo() {
        String prop = System.getProperty("linemass.repo");
        if (prop != null && !prop.isBlank() && Files.isDirectory(Paths.get(prop, "importer"))) {
            return Paths.get(prop).toAbsolutePath().normalize();
        }
        Path p = Paths.get("").toAbsolutePath();
        while (p != null) {
            if (Files.isDirectory(p.resolve("importer")) && Files.isRegularFile(p.resolve("pom.xml"))) {
                return p;
            }
            p = p.getParent();
        }
        return Paths.get("").toAbsolutePath();
    }

    static Path corpus() {
        return repo().resolve("..").resolve("shared").resolve("corpus").normalize();
    }

    static Path testdata() {
        return repo().resolve("testdata").resolve("importer");
    }
}
