package org.linemass.engine.fuzz;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.Paths;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import java.util.TreeSet;
import java.util.stream.Collectors;
import java.util.stream.Stream;
import org.junit.jupiter.api.DynamicTest;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.TestFactory;
import org.linemass.engine.error.AnalysisException;
import org.linemass.engine.section.AssignmentReader;
import org.linemass.engine.section.SectionCsvReader;

/**
 * The CSV part of the hostile catalogue ({@code testdata/hostile/*.csv}): each section table or
 * layer assignment file is read through the file API and must be refused with exactly the one-line
 * message of its row in {@code testdata/hostile/README.md}, naming the file and the line.
 */
class HostileCsvCatalogueTest {

    /** One catalogue file: which reader, and the message with the bare file name. */
    private record Case(String file, boolean sections, String message) {
    }

    private static final List<Case> CASES = List.of(
            new Case("section-missing-columns.csv", true,
                    "section-missing-columns.csv: line 4: column wall_mm is empty"),
            new Case("section-negative-density.csv", true,
                    "section-negative-density.csv: line 3: column density_kg_m3 must be positive, got -7850"),
            new Case("section-duplicate-ids.csv", true,
                    "section-duplicate-ids.csv: line 4: section hook-5 already defined on line 2"),
            new Case("section-no-mass-column.csv", true,
                    "section-no-mass-column.csv: line 1: the header needs a 'mass_kg_per_m' or a 'shape' column"),
            new Case("section-bad-utf8.csv", true,
                    "section-bad-utf8.csv: not UTF-8 text (malformed byte sequence); save the file as UTF-8"),
            new Case("assignment-missing-columns.csv", false,
                    "assignment-missing-columns.csv: line 1: the header needs 'layer' and 'section' columns"),
            new Case("assignment-empty-section.csv", false,
                    "assignment-empty-section.csv: line 3: column section is empty"));

    /** The repository root: the {@code linemass.repo} property, else the nearest folder with importer/ and pom.xml. */
    private static Path repo() {
        String prop = System.getProperty("linemass.repo");
        if (prop != null && !prop.isBlank() && Files.isDirectory(Paths.get(prop, "engine"))) {
            return Paths.get(prop).toAbsolutePath().normalize();
        }
        Path p = Paths.get("").toAbsolutePath();
        while (p != null && !(Files.isDirectory(p.resolve("importer")) && Files.isRegularFile(p.resolve("pom.xml")))) {
            p = p.getParent();
        }
        return p == null ? Paths.get("").toAbsolutePath() : p;
    }

    private static Path catalogue() {
        return repo().resolve("testdata").resolve("hostile");
    }

    @TestFactory
    Stream<DynamicTest> everyCsvFile_isRefusedWithItsExactMessage() {
        return CASES.stream().map(c -> DynamicTest.dynamicTest(c.file(), () -> {
            Path f = catalogue().resolve(c.file());
            assertTrue(Files.isRegularFile(f), () -> "missing catalogue file " + f);
            AnalysisException e = assertThrows(AnalysisException.class,
                    () -> {
                        if (c.sections()) {
                            SectionCsvReader.read(f);
                        } else {
                            AssignmentReader.read(f);
                        }
                    });
            // the readers name the file by the path they were given; the catalogue uses the bare name
            assertEquals(c.message().replace(c.file(), f.toString()), e.getMessage());
        }));
    }

    @Test
    void everyCsvFileInTheCatalogue_hasACase() throws IOException {
        Set<String> files;
        try (Stream<Path> s = Files.list(catalogue())) {
            files = s.map(p -> p.getFileName().toString()).filter(n -> n.endsWith(".csv"))
                    .collect(Collectors.toCollection(TreeSet::new));
        }
        assertEquals(CASES.stream().map(Case::file).collect(Collectors.toCollection(TreeSet::new)), files);
    }

    @Test
    void readme_listsEveryCsvFileWithItsExactMessage() throws IOException {
        String readme = Files.readString(catalogue().resolve("README.md"), StandardCharsets.UTF_8);
        List<String> missing = new ArrayList<>();
        for (Case c : CASES) {
            if (!readme.contains("| `" + c.file() + "` |") || !readme.contains("`" + c.message() + "`")) {
                missing.add(c.file());
            }
        }
        assertEquals(List.of(), missing);
    }
}
