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
import java.nio.file.StandardCopyOption;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.DynamicTest;
import org.junit.jupiter.api.TestFactory;
import org.junit.jupiter.api.io.TempDir;

/**
 * Golden outputs: {@code check} with every report on the demo drawing (with its section table and
 * layer assignments) and on every drawing of ../shared/corpus, compared byte for byte with the
 * files under {@code testdata/golden/}. Guards refactorings: a change that moves code must not
 * move a single output byte. A change that means to alter an output regenerates the files with
 * {@code mvn -pl app -am test -Dtest=GoldenOutputTest -Dlinemass.golden.update=true
 * -Dsurefire.failIfNoSpecifiedTests=false} and says in its commit message why the bytes changed.
 *
 * <p>The run folder's absolute path is replaced by {@code <dir>} in text outputs so the files do
 * not depend on where the test runs.
 */
class GoldenOutputTest {

    private static final boolean UPDATE = Boolean.getBoolean("linemass.golden.update");

    /** The report files each run writes, by the option that asks for them. */
    private static final List<String[]> OUTPUTS = List.of(
            new String[] {"--json", "report.json"},
            new String[] {"--bom-csv", "bom.csv"},
            new String[] {"--pieces-csv", "pieces.csv"},
            new String[] {"--findings-csv", "findings.csv"},
            new String[] {"--html", "report.html"},
            new String[] {"--markup-dxf", "markup.dxf"});

    @TempDir
    Path tmp;

    @TestFactory
    Stream<DynamicTest> check_demoDrawing_matchesGolden() {
        Path demo = CorpusJsonTest.repo().resolve("testdata/demo");
        return Stream.of(DynamicTest.dynamicTest("demo", () -> compare("demo", demo.resolve("garden-planter.dxf"),
                List.of("--section-table", demo.resolve("garden-planter-section-table.csv").toString(),
                        "--assign-file", demo.resolve("garden-planter-layers.csv").toString()))));
    }

    @TestFactory
    Stream<DynamicTest> check_corpusDrawings_matchGolden() throws IOException {
        Path dir = CorpusJsonTest.corpus();
        assumeTrue(dir != null && Files.isDirectory(dir),
                "../shared/corpus is not beside this checkout: corpus golden outputs not compared");
        List<Path> files;
        try (Stream<Path> s = Files.list(dir)) {
            files = s.filter(p -> p.toString().endsWith(".dxf")).sorted().toList();
        }
        return files.stream().map(f -> DynamicTest.dynamicTest(f.getFileName().toString(), () -> {
            String name = f.getFileName().toString().replaceFirst("\\.dxf$", "");
            // the R12 gate has no $INSUNITS; the manifest reads it as millimetres
            List<String> extra = name.startsWith("v04") ? List.of("--units", "mm") : List.of();
            compare("corpus/" + name, f, extra);
        }));
    }

    private void compare(String golden, Path drawing, List<String> extra) throws IOException {
        Path run = Files.createDirectories(tmp.resolve(golden.replace('/', '_')));
        Path dxf = Files.copy(drawing, run.resolve("drawing.dxf"), StandardCopyOption.REPLACE_EXISTING);
        List<String> args = new ArrayList<>(List.of("check", dxf.toString(), "--fail-at", "never"));
        args.addAll(extra);
        for (String[] o : OUTPUTS) {
            args.add(o[0]);
            args.add(run.resolve(o[1]).toString());
        }
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        AppContext ctx = new AppContext(new PrintWriter(out), new PrintWriter(err), new EnginePipeline(),
                new EngineSectionCatalog(), new EngineFieldIntegrator(), false);
        int code = Cli.run(ctx, args.toArray(String[]::new));
        assertEquals(0, code, () -> "exit code of " + golden + ": " + err);

        Path want = CorpusJsonTest.repo().resolve("testdata/golden").resolve(golden);
        List<String[]> produced = new ArrayList<>();
        // every output as bytes read as ISO-8859-1: one char per byte, so the bytes round-trip exactly
        produced.add(new String[] {"console.txt", latin1(out.toString().getBytes(StandardCharsets.UTF_8))});
        produced.add(new String[] {"stderr.txt", latin1(err.toString().getBytes(StandardCharsets.UTF_8))});
        for (String[] o : OUTPUTS) {
            produced.add(new String[] {o[1], latin1(Files.readAllBytes(run.resolve(o[1])))});
        }
        String dirText = run.toString();
        for (String[] p : produced) {
            String text = p[1].replace(dirText, "<dir>");
            // a marked-up copy holds the corpus drawing's own bytes, which stay out of this repository
            boolean hashOnly = golden.startsWith("corpus/") && p[0].endsWith(".dxf");
            String name = hashOnly ? p[0] + ".sha256" : p[0];
            if (hashOnly) {
                text = sha256(text) + "\n";
            }
            Path file = want.resolve(name);
            if (UPDATE) {
                Files.createDirectories(want);
                Files.writeString(file, text, StandardCharsets.ISO_8859_1);
            } else {
                assertTrue(Files.exists(file), () -> "no golden file " + file + " (run with -Dlinemass.golden.update=true)");
                assertEquals(Files.readString(file, StandardCharsets.ISO_8859_1), text,
                        () -> golden + "/" + name + " differs from its golden copy");
            }
        }
    }

    private static String sha256(String latin1Text) {
        try {
            byte[] d = java.security.MessageDigest.getInstance("SHA-256")
                    .digest(latin1Text.getBytes(StandardCharsets.ISO_8859_1));
            return java.util.HexFormat.of().formatHex(d);
        } catch (java.security.NoSuchAlgorithmException e) {
            throw new AssertionError("every JDK has SHA-256", e);
        }
    }

    private static String latin1(byte[] bytes) {
        return new String(bytes, StandardCharsets.ISO_8859_1);
    }
}
