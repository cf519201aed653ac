package org.linemass.reports;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import org.linemass.reports.json.JsonReportWriter;
import org.junit.jupiter.api.Test;

/** The published copies in docs/ must not drift from what the code uses. */
class DocsTest {

    static Path repo() {
        String p = System.getProperty("linemass.repo");
        Path d = p != null ? Path.of(p) : Path.of("").toAbsolutePath();
        while (d != null && !(Files.isDirectory(d.resolve("importer")) && Files.exists(d.resolve("pom.xml")))) {
            d = d.getParent();
        }
        return d;
    }

    @Test
    void schemaCopyInDocs_equalsResource() throws IOException {
        Path docs = repo() == null ? null : repo().resolve("docs/linemass-report.schema.json");
        assumeTrue(docs != null && Files.exists(docs), "docs folder not beside the module");
        try (InputStream in = JsonReportWriter.class.getResourceAsStream(JsonReportWriter.SCHEMA_RESOURCE)) {
            assertEquals(new String(in.readAllBytes(), StandardCharsets.UTF_8), Files.readString(docs));
        }
    }

    @Test
    void cautionInDocs_equalsReportText() throws IOException {
        Path docs = repo() == null ? null : repo().resolve("docs/command-line.md");
        assumeTrue(docs != null && Files.exists(docs), "docs folder not beside the module");
        String text = Files.readString(docs);
        String caution = text.substring(text.indexOf("## Caution") + "## Caution".length()).strip()
                .replaceAll("\\s+", " ");
        assertTrue(caution.equals(Caution.TEXT), "docs caution differs from Caution.TEXT:\n" + caution);
    }
}
