package org.linemass.app;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.regex.Pattern;
import org.linemass.app.mutate.EzdxfAudit;
import org.linemass.importer.DxfImporter;
import org.linemass.importer.ImportOptions;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A marked-up copy of a drawing whose group pairs are swapped (code line and value line changed
 * places) either imports again and passes the audit of an independent reader (ezdxf), or is
 * refused with a message naming the file and the line. Drawings: the ten of ../shared/corpus.
 */
class MarkupValidityTest {

    private static final Pattern FILE_AND_LINE = Pattern.compile("swapped-\\d+\\.dxf:\\d+: ");

    @TempDir
    Path dir;

    @Test
    void swappedGroupPairs_markupIsValidOrRefusedWithFileAndLine() throws Exception {
        Path corpus = Path.of(System.getProperty("linemass.repo", "..")).resolve("../shared/corpus").normalize();
        assumeTrue(Files.isDirectory(corpus), "../shared/corpus is not beside the checkout: test skipped");
        List<Path[]> pairs = new ArrayList<>();
        int refused = 0;
        int n = 0;
        try (var s = Files.list(corpus)) {
            for (Path f : s.filter(p -> p.toString().endsWith(".dxf")).sorted().toList()) {
                String text = Files.readString(f, StandardCharsets.ISO_8859_1);
                String eol = text.contains("\r\n") ? "\r\n" : "\n";
                String[] lines = text.split("\r?\n", -1);
                // swap the pair at a quarter, at a half and at three quarters of the file
                for (int q = 1; q <= 3; q++) {
                    int at = (lines.length / 4 * q) & ~1;
                    String[] m = lines.clone();
                    String t = m[at];
                    m[at] = m[at + 1];
                    m[at + 1] = t;
                    Path in = Files.writeString(dir.resolve("swapped-" + (++n) + ".dxf"), String.join(eol, m),
                            StandardCharsets.ISO_8859_1);
                    Path out = dir.resolve("marked-" + n + ".dxf");
                    StringWriter err = new StringWriter();
                    AppContext ctx = new AppContext(new PrintWriter(new StringWriter()), new PrintWriter(err),
                            new EnginePipeline(), new EngineSectionCatalog(), new EngineFieldIntegrator(), false);
                    int code = Cli.run(ctx, "check", "--fail-at", "never", "--markup-dxf", out.toString(), in.toString());
                    if (code == 2) {
                        refused++;
                        assertTrue(FILE_AND_LINE.matcher(err.toString()).find(), f.getFileName() + ": " + err);
                        assertTrue(Files.notExists(out), "a refused run writes no copy");
                        continue;
                    }
                    assertEquals(0, code, f.getFileName() + " swapped at line " + (at + 1) + ": " + err);
                    String marked = Files.readString(out, StandardCharsets.ISO_8859_1);
                    assertEquals(0, marked.split("\r?\n").length % 2, "whole pairs");
                    assertTrue(marked.endsWith("EOF" + eol), "ends with EOF");
                    DxfImporter.read(out, ImportOptions.DEFAULTS); // throws if it does not import again
                    pairs.add(new Path[] {in, out});
                }
            }
        }
        assertTrue(n == 30, "ten drawings, three swaps each");
        String py = EzdxfAudit.python();
        assumeTrue(py != null, "no Python with ezdxf (apt-get install -y python3-ezdxf): the independent audit of "
                + pairs.size() + " marked-up copies is skipped (" + refused + " were refused)");
        List<String> lines = EzdxfAudit.audit(pairs);
        List<String> failed = lines.stream().filter(l -> l.startsWith("FAIL")).toList();
        assertEquals(List.of(), failed);
        assertEquals(pairs.size(), lines.stream().filter(l -> l.startsWith("OK") || l.startsWith("SKIP")).count(),
                String.join("\n", lines));
    }
}
