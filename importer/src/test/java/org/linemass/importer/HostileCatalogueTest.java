package org.linemass.importer;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTimeoutPreemptively;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.lang.management.ManagementFactory;
import java.nio.ByteBuffer;
import java.nio.channels.FileChannel;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;
import java.time.Duration;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.Set;
import java.util.TreeSet;
import java.util.stream.Collectors;
import java.util.stream.Stream;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.DynamicTest;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.TestFactory;
import org.junit.jupiter.api.io.TempDir;
import org.linemass.drawing.Block;
import org.linemass.drawing.Drawing;
import org.linemass.drawing.ImportNote;
import org.linemass.drawing.Insert;

/**
 * The hostile catalogue in {@code testdata/hostile}: every DXF file there is read through the file
 * API (read-only, streamed) and must give exactly the outcome its row in
 * {@code testdata/hostile/README.md} states: refused with that exact one-line message (the command
 * line exits 2), read with exactly those skipped-entity error notes (error findings, totals marked
 * incomplete), or read cleanly. Files too big to commit (10 MB lines, a 64 MB / 1 GB comment, 100000
 * nested blocks) are generated into a temporary folder by the tests below. The README must carry
 * every file and every expected message, so the table cannot drift from the behaviour.
 */
class HostileCatalogueTest {

    /** Generous bound for inputs that must be handled in bounded time; each takes well under a second. */
    // a hang guard, not a speed goal (speed is measured by benchmarks): generous enough for a
    // shared 2-core machine running several builds at once
    private static final Duration QUICK = Duration.ofSeconds(120);

    /** Default size of the generated giant-comment files; the full 1 GiB runs on request. */
    private static final long DEFAULT_BIG_BYTES = 64L << 20;
    private static final long FULL_BIG_BYTES = 1L << 30;

    private static final ImportOptions FOUR_VERTICES = new ImportOptions(Optional.empty(), 64, 1 << 20, 1_000_000, 4);

    private enum Outcome { REFUSED, SKIPPED, READ }

    /** One catalogue file and what reading it must give. */
    private record Case(String file, Outcome outcome, List<String> expected, ImportOptions options) {
    }

    private static Case refused(String file, String message) {
        return new Case(file, Outcome.REFUSED, List.of(message), ImportOptions.DEFAULTS);
    }

    /** Expected notes are written {@code line N, TYPE (handle H): message}. */
    private static Case skipped(String file, String... notes) {
        return new Case(file, Outcome.SKIPPED, List.of(notes), ImportOptions.DEFAULTS);
    }

    private static Case read(String file) {
        return new Case(file, Outcome.READ, List.of(), ImportOptions.DEFAULTS);
    }

    private static final List<Case> CASES = List.of(
            refused("empty.dxf", "empty.dxf: empty file: no DXF group codes"),
            refused("png-header.dxf", "png-header.dxf: this is an image (PNG), not a DXF drawing; linemass reads DXF"
                    + " drawings (lines, arcs, polylines, splines), not pictures"),
            refused("zip-header.dxf", "zip-header.dxf: this is a ZIP archive, not a DXF drawing; unpack it and read the"
                    + " DXF file inside"),
            refused("random-bytes.dxf", "random-bytes.dxf:1: expected a group code (an integer), got "
                    + "'H?LwbT\"+uG???Y1?T????6?????]????[??=O???...'"),
            skipped("truncated-mid-entity.dxf", "line 23, LINE (handle 1F): the file ends inside this record, which "
                    + "may be cut off; not read"),
            refused("odd-line-count.dxf", "odd-line-count.dxf:23: LINE (handle 10): group code 0 has no value "
                    + "line (odd number of lines: file truncated?)"),
            refused("group-code-not-number.dxf", "group-code-not-number.dxf:11: LINE (handle 2B): expected a group "
                    + "code (an integer), got '1O'"),
            skipped("value-not-number.dxf",
                    "line 5, LINE (handle 2C): value of group code 10 at line 12 is not a number: '12,5'"),
            skipped("nan-coordinate.dxf", "line 5, LINE (handle 30): coordinate (group code 10) is not finite: NaN"),
            skipped("infinity-coordinate.dxf",
                    "line 5, CIRCLE (handle 31): coordinate (group code 20) is not finite: -Infinity"),
            skipped("huge-coordinate.dxf",
                    "line 5, LINE (handle 32): coordinate (group code 11) is out of range: 1.0E308 (limit 1.0E99)"),
            skipped("overflowing-coordinate.dxf",
                    "line 5, ARC (handle 33): radius (group code 40) is not a usable number: Infinity"),
            read("overflowing-insert-scale.dxf"),
            skipped("spline-billion-control-points.dxf",
                    "line 5, SPLINE (handle 40): declares 1000000000 control points, more than the limit 1000000"),
            skipped("negative-count.dxf", "line 5, LWPOLYLINE (handle 41): negative vertex count (group code 90): -5"),
            skipped("decreasing-knots.dxf", "line 5, SPLINE (handle 42): knots decrease at index 3 (1.0 then 0.5)"),
            skipped("zero-radius-arc.dxf", "line 5, ARC (handle 43): ARC radius must be positive, got 0.0"),
            skipped("block-inserts-itself.dxf", "line 25, INSERT (handle 50): block 'HOOK' inserts itself"),
            skipped("block-cycle-three.dxf",
                    "line 13, INSERT (handle 60): insert of block 'FRAME_A' in block 'PANEL' closes a cycle of block "
                            + "references",
                    "line 31, INSERT (handle 61): insert of block 'STAY' in block 'FRAME_A' closes a cycle of block "
                            + "references",
                    "line 61, INSERT (handle 62): insert of block 'PANEL' in block 'STAY' closes a cycle of block "
                            + "references"),
            skipped("undefined-block.dxf", "line 5, INSERT (handle 70): block 'POST_CAP' is not defined"),
            skipped("zero-scale-insert.dxf",
                    "line 33, INSERT (handle 71): y scale (group code 42) is 0 but block 'CLIP' extends along its y "
                            + "axis (0.0 to 5.0): the insert would flatten it and change its lengths"),
            read("huge-array.dxf"),
            read("huge-array-of-empty-block.dxf"),
            read("block-bomb.dxf"),
            read("block-bomb-empty-leaf.dxf"),
            read("bad-utf8-r2018.dxf"),
            new Case("polyline-over-vertex-limit.dxf", Outcome.SKIPPED,
                    List.of("line 5, POLYLINE (handle B0): has more than 4 vertices"), FOUR_VERTICES));

    private static Path catalogue() {
        return SharedFiles.repo().resolve("testdata").resolve("hostile");
    }

    private static String formatted(ImportNote n) {
        return "line " + n.line() + ", " + n.entityType() + " (handle " + n.handle() + "): " + n.message();
    }

    private static List<String> errorNotes(Drawing d) {
        return d.notes().stream().filter(ImportNote::skippedGeometry).map(HostileCatalogueTest::formatted).sorted()
                .collect(Collectors.toList());
    }

    /** The message with the bare file name at its start replaced by the path the importer was given. */
    private static String located(Path file, String message) {
        String name = file.getFileName().toString();
        assertTrue(message.startsWith(name), () -> "catalogue message must start with the file name: " + message);
        return file + message.substring(name.length());
    }

    @TestFactory
    Stream<DynamicTest> everyCatalogueFile_givesItsExactOutcome() {
        return CASES.stream().map(c -> DynamicTest.dynamicTest(c.file(), () -> {
            Path f = catalogue().resolve(c.file());
            assertTrue(Files.isRegularFile(f), () -> "missing catalogue file " + f);
            switch (c.outcome()) {
                case REFUSED -> {
                    DxfInputException e = assertTimeoutPreemptively(QUICK,
                            () -> assertThrows(DxfInputException.class, () -> DxfImporter.read(f, c.options())));
                    assertEquals(located(f, c.expected().get(0)), e.getMessage());
                }
                case SKIPPED -> {
                    Drawing d = assertTimeoutPreemptively(QUICK, () -> DxfImporter.read(f, c.options()));
                    assertEquals(c.expected(), errorNotes(d));
                    assertTrue(d.incomplete(), "a skipped entity marks the drawing incomplete");
                    // the rest of the drawing is still read: every file carries a good LINE on FRAME
                    assertTrue(d.modelSpace().segments().stream().anyMatch(s -> s.source().layer().equals("FRAME")),
                            "the good entities around the bad one are kept");
                }
                case READ -> {
                    Drawing d = assertTimeoutPreemptively(QUICK, () -> DxfImporter.read(f, c.options()));
                    assertEquals(List.of(), errorNotes(d));
                }
            }
        }));
    }

    @Test
    void everyFileInTheCatalogue_hasACase() throws IOException {
        Set<String> files;
        try (Stream<Path> s = Files.list(catalogue())) {
            files = s.map(p -> p.getFileName().toString()).filter(n -> n.endsWith(".dxf"))
                    .collect(Collectors.toCollection(TreeSet::new));
        }
        Set<String> cased = CASES.stream().map(Case::file).collect(Collectors.toCollection(TreeSet::new));
        assertEquals(cased, files);
    }

    @Test
    void readme_listsEveryFileWithItsExactMessage() throws IOException {
        String readme = Files.readString(catalogue().resolve("README.md"), StandardCharsets.UTF_8);
        List<String> missing = new ArrayList<>();
        for (Case c : CASES) {
            if (!readme.contains("| `" + c.file() + "` |")) {
                missing.add("row for " + c.file());
            }
            for (String m : c.expected()) {
                if (!readme.contains("`" + m + "`")) {
                    missing.add("message " + m);
                }
            }
        }
        assertEquals(List.of(), missing);
    }

    @Test
    void hugeArray_staysOneInsertOfTenBillionCopies() throws Exception {
        Drawing d = DxfImporter.read(catalogue().resolve("huge-array.dxf"), ImportOptions.DEFAULTS);
        // 100000 columns x 100000 rows are kept as one insert; the engine places them by instancing
        List<Insert> inserts = d.modelSpace().inserts();
        assertEquals(1, inserts.size());
        assertEquals(100_000, inserts.get(0).columns());
        assertEquals(100_000, inserts.get(0).rows());
        assertEquals(10_000_000_000L, inserts.get(0).copies());
        assertEquals(1, d.blocks().get("MESH_CELL").segments().size(), "the cell is stored once");
    }

    @Test
    void blockBomb_isReadAsElevenDefinitionsNotATrillionLines() {
        Drawing d = assertTimeoutPreemptively(Duration.ofSeconds(5),
                () -> DxfImporter.read(catalogue().resolve("block-bomb.dxf"), ImportOptions.DEFAULTS));
        // 16^10 = 1.1e12 copies of one line when expanded; the model is 11 blocks + model space
        assertEquals(12, d.blocks().size());
        int inserts = d.blocks().values().stream().mapToInt(b -> b.inserts().size()).sum();
        int segments = d.blocks().values().stream().mapToInt(b -> b.segments().size()).sum();
        assertEquals(10 * 16 + 1, inserts);
        assertEquals(1, segments);
    }

    @Test
    void badUtf8InAnR2018File_isReplacedNotFatal() throws Exception {
        Drawing d = DxfImporter.read(catalogue().resolve("bad-utf8-r2018.dxf"), ImportOptions.DEFAULTS);
        assertEquals("AC1032", d.dxfVersion());
        // C3 followed by '(' is not UTF-8: the decoder puts U+FFFD for the C3 and keeps the '('
        assertTrue(d.layers().containsKey("RAIL_\uFFFD("), () -> "layers: " + d.layers().keySet());
        assertEquals("RAIL_\uFFFD(", d.modelSpace().segments().get(0).source().layer());
        assertEquals(1, d.modelSpace().otherEntityCounts().get("TEXT"));
    }

    @Test
    void overflowingInsertScale_eachPlacementStaysFinite() throws Exception {
        Drawing d = DxfImporter.read(catalogue().resolve("overflowing-insert-scale.dxf"), ImportOptions.DEFAULTS);
        // each scale 1e99 is inside the importer's number limit and each placement is finite; the
        // product of the two (1e198 on coordinates of 1e99) is the engine's to refuse
        for (Block b : d.blocks().values()) {
            for (Insert i : b.inserts()) {
                assertTrue(i.placement().isFinite(), i::toString);
            }
        }
        assertEquals(1, d.blocks().get("MID").inserts().size());
    }

    // ---- generated at run time: too big to commit -------------------------------------------------

    private static final byte[] ENTITIES_START = "0\nSECTION\n2\nENTITIES\n".getBytes(StandardCharsets.US_ASCII);
    private static final byte[] GOOD_LINE_AND_END =
            "0\nLINE\n8\nFRAME\n10\n0\n20\n0\n11\n100\n21\n0\n0\nENDSEC\n0\nEOF\n".getBytes(StandardCharsets.US_ASCII);

    /** Writes head, then {@code fillBytes} bytes of {@code unit} repeated (cut to fit), then tail. */
    private static void writeStreaming(Path f, byte[] head, byte[] unit, long fillBytes, byte[] tail)
            throws IOException {
        try (FileChannel ch = FileChannel.open(f, StandardOpenOption.CREATE_NEW, StandardOpenOption.WRITE)) {
            ch.write(ByteBuffer.wrap(head));
            int reps = Math.max(1, (1 << 20) / unit.length);
            byte[] chunk = new byte[reps * unit.length];
            for (int i = 0; i < reps; i++) {
                System.arraycopy(unit, 0, chunk, i * unit.length, unit.length);
            }
            long left = fillBytes;
            while (left > 0) {
                int n = (int) Math.min(left, chunk.length);
                ByteBuffer b = ByteBuffer.wrap(chunk, 0, n);
                while (b.hasRemaining()) {
                    ch.write(b);
                }
                left -= n;
            }
            ch.write(ByteBuffer.wrap(tail));
        }
    }

    private static long bigBytes() {
        boolean full = Boolean.parseBoolean(System.getProperty("linemass.bigtests", "false"))
                || "true".equalsIgnoreCase(String.valueOf(System.getenv("LINEMASS_BIGTESTS")));
        return full ? FULL_BIG_BYTES : DEFAULT_BIG_BYTES;
    }

    /** Bytes the current thread allocated while running {@code read}, or -1 when the JVM cannot say. */
    private static long allocatedDuring(ThrowingRead read) throws Exception {
        var mx = ManagementFactory.getThreadMXBean();
        if (!(mx instanceof com.sun.management.ThreadMXBean hot) || !hot.isThreadAllocatedMemorySupported()) {
            read.run();
            return -1;
        }
        hot.setThreadAllocatedMemoryEnabled(true);
        long before = hot.getCurrentThreadAllocatedBytes();
        read.run();
        return hot.getCurrentThreadAllocatedBytes() - before;
    }

    @FunctionalInterface
    private interface ThrowingRead {
        void run() throws Exception;
    }

    @Test
    void giantComment_isSteppedOverUnreadWithoutLoadingTheFile(@TempDir Path dir) throws Exception {
        // a comment far longer than the line limit: the importer does not need it, so it is not held
        long size = bigBytes();
        Path f = dir.resolve("giant-comment.dxf");
        byte[] head = "0\nSECTION\n2\nENTITIES\n999\n".getBytes(StandardCharsets.US_ASCII);
        byte[] tail = ("\n".getBytes(StandardCharsets.US_ASCII));
        writeStreaming(f, head, "wire shelf note ".getBytes(StandardCharsets.US_ASCII), size, concat(tail,
                GOOD_LINE_AND_END));
        Drawing[] d = new Drawing[1];
        long allocated = assertTimeoutPreemptively(Duration.ofSeconds(120),
                () -> allocatedDuring(() -> d[0] = DxfImporter.read(f, ImportOptions.DEFAULTS)));
        assertEquals(1, d[0].modelSpace().segments().size(), "the line after the comment is read");
        assertBounded(allocated, size);
    }

    @Test
    void manyComments_areStreamedPastWithBoundedMemory(@TempDir Path dir) throws Exception {
        long size = bigBytes();
        Path f = dir.resolve("many-comments.dxf");
        byte[] comment = ("999\n" + "trellis wire note ".repeat(55) + "\n").getBytes(StandardCharsets.US_ASCII);
        long fill = size - size % comment.length;
        writeStreaming(f, ENTITIES_START, comment, fill, GOOD_LINE_AND_END);
        Drawing[] d = new Drawing[1];
        long allocated = assertTimeoutPreemptively(Duration.ofSeconds(120),
                () -> allocatedDuring(() -> d[0] = DxfImporter.read(f, ImportOptions.DEFAULTS)));
        assertEquals(1, d[0].modelSpace().segments().size(), "the line after the comments is read");
        assertBounded(allocated, size);
    }

    /**
     * Streaming means the importer allocates far less than the file size. The bound, a quarter of
     * the file, leaves room for the 1 MiB read window and JIT/class-loading noise (measured: a few
     * MB) while a reader that loads the file would allocate at least the whole file.
     */
    private static void assertBounded(long allocated, long fileSize) {
        Assumptions.assumeTrue(allocated >= 0, "thread allocation counter not available in this JVM");
        assertTrue(allocated < fileSize / 4, () -> String.format(Locale.ROOT,
                "allocated %d bytes reading a %d-byte file", allocated, fileSize));
    }

    private static byte[] concat(byte[] a, byte[] b) {
        byte[] out = Arrays.copyOf(a, a.length + b.length);
        System.arraycopy(b, 0, out, a.length, b.length);
        return out;
    }

    @Test
    void tenMegabyteLine_fromAFile_isRefusedWithTheLimit(@TempDir Path dir) throws Exception {
        // a value the importer keeps (a layer name) is limited; unused ones are stepped over
        Path f = dir.resolve("long-line.dxf");
        byte[] head = "0\nSECTION\n2\nENTITIES\n0\nLINE\n5\n2F\n8\n".getBytes(StandardCharsets.US_ASCII);
        writeStreaming(f, head, "x".getBytes(StandardCharsets.US_ASCII), 10L << 20, concat(
                "\n".getBytes(StandardCharsets.US_ASCII), GOOD_LINE_AND_END));
        DxfInputException e = assertTimeoutPreemptively(QUICK,
                () -> assertThrows(DxfInputException.class, () -> DxfImporter.read(f, ImportOptions.DEFAULTS)));
        assertEquals(f + ":10: LINE (handle 2F): line longer than 1048576 bytes", e.getMessage());
    }

    @Test
    void tenMegabyteStringInABinaryFile_isRefusedWithTheLimit(@TempDir Path dir) throws Exception {
        Path f = dir.resolve("long-string.dxf");
        ByteBuffer head = ByteBuffer.allocate(64).order(java.nio.ByteOrder.LITTLE_ENDIAN);
        head.put("AutoCAD Binary DXF\r\n\u001a\u0000".getBytes(StandardCharsets.ISO_8859_1));
        head.putShort((short) 0).put("SECTION\0".getBytes(StandardCharsets.US_ASCII));
        head.putShort((short) 2).put("ENTITIES\0".getBytes(StandardCharsets.US_ASCII));
        head.putShort((short) 0).put("LINE\0".getBytes(StandardCharsets.US_ASCII));
        head.putShort((short) 8);
        byte[] h = Arrays.copyOf(head.array(), head.position());
        writeStreaming(f, h, "y".getBytes(StandardCharsets.US_ASCII), 10L << 20, new byte[] {0});
        DxfInputException e = assertTimeoutPreemptively(QUICK,
                () -> assertThrows(DxfInputException.class, () -> DxfImporter.read(f, ImportOptions.DEFAULTS)));
        // the layer's group code 8 sits after the sentinel (22), SECTION (2+8), ENTITIES (2+9), LINE (2+5)
        assertEquals(f + ":byte 50: LINE: string value longer than 1048576 bytes", e.getMessage());
    }

    /** 100000 blocks, each inserting the next: B0 -> B1 -> ... -> B99999, each with one line. */
    private static Path deepChain(Path dir, int levels) throws IOException {
        Path f = dir.resolve("deep-" + levels + ".dxf");
        StringBuilder sb = new StringBuilder(levels * 48).append("0\nSECTION\n2\nBLOCKS\n");
        for (int k = 0; k < levels; k++) {
            sb.append("0\nBLOCK\n2\nB").append(k).append("\n0\nLINE\n8\n0\n11\n1\n");
            if (k + 1 < levels) {
                sb.append("0\nINSERT\n8\n0\n2\nB").append(k + 1).append('\n');
            }
            sb.append("0\nENDBLK\n");
        }
        sb.append("0\nENDSEC\n0\nSECTION\n2\nENTITIES\n0\nINSERT\n5\nD0\n8\nDEEP\n2\nB0\n0\nENDSEC\n0\nEOF\n");
        Files.writeString(f, sb, StandardCharsets.US_ASCII);
        return f;
    }

    @Test
    void hundredThousandLevels_fromAFile_stopAtTheDepthLimit(@TempDir Path dir) throws Exception {
        Path f = deepChain(dir, 100_000);
        Drawing d = assertTimeoutPreemptively(QUICK, () -> DxfImporter.read(f, ImportOptions.DEFAULTS));
        List<String> errors = errorNotes(d);
        assertEquals(1, errors.size(), () -> errors.subList(0, Math.min(3, errors.size())).toString());
        // the insert of B64 sits in block B63: 4 section lines, 63 blocks of 18 lines, then the
        // block's own BLOCK (4 lines) and LINE (6 lines): the INSERT's 0 is line 11 of the block
        assertEquals("line " + (4 + 63 * 18 + 11) + ", INSERT (handle ): block 'B64' would be nested deeper than "
                + "the limit of 64 levels", errors.get(0));
    }

    @Test
    void hundredThousandLevels_withTheLimitRaised_areResolvedWithoutStackOverflow(@TempDir Path dir)
            throws Exception {
        Path f = deepChain(dir, 100_000);
        ImportOptions deep = new ImportOptions(Optional.empty(), 200_000, 1 << 20, 1_000_000, 10_000_000);
        Drawing d = assertTimeoutPreemptively(QUICK, () -> DxfImporter.read(f, deep));
        assertEquals(List.of(), errorNotes(d));
        assertEquals(100_001, d.blocks().size());
        long placed = d.blocks().values().stream().mapToLong(b -> b.inserts().size()).sum();
        assertEquals(100_000, placed, "every link of the chain is kept");
    }

    // ---- each ImportOptions limit, at a non-default value ------------------------------------------

    private static ImportOptions limits(int depth, int lineBytes, int controlPoints, int vertices) {
        return new ImportOptions(Optional.empty(), depth, lineBytes, controlPoints, vertices);
    }

    private static List<String> errorNotes(Dxf dxf, ImportOptions o) throws DxfInputException {
        return errorNotes(DxfImporter.read(Dxf.NAME, dxf.ascii(), o));
    }

    @Test
    void maxBlockDepth_isEnforcedAtItsConfiguredValue() throws Exception {
        Dxf dxf = Dxf.create().add(0, "SECTION", 2, "BLOCKS",
                0, "BLOCK", 2, "A", 0, "INSERT", 5, "1A", 2, "B", 0, "ENDBLK",
                0, "BLOCK", 2, "B", 0, "INSERT", 5, "1B", 2, "C", 0, "ENDBLK",
                0, "BLOCK", 2, "C", 0, "LINE", 11, 1, 0, "ENDBLK", 0, "ENDSEC")
                .entities().add(0, "INSERT", 5, "10", 2, "A").end();
        // model space (0) -> A (1) -> B (2) -> C (3): a limit of 2 stops the insert of C in B, whose
        // 0 INSERT is line 21 (4 section lines, 12 lines of block A, BLOCK and name of B)
        assertEquals(List.of("line 21, INSERT (handle 1B): block 'C' would be nested deeper than the limit of 2 "
                + "levels"), errorNotes(dxf, limits(2, 1 << 20, 1_000_000, 10_000_000)));
        assertEquals(List.of(), errorNotes(dxf, limits(3, 1 << 20, 1_000_000, 10_000_000)));
    }

    @Test
    void maxControlPoints_isEnforcedAtItsConfiguredValue() throws Exception {
        Dxf dxf = Dxf.create().entities().add(0, "SPLINE", 5, "2A", 71, 1, 72, 5, 73, 3,
                40, 0, 40, 0, 40, 1, 40, 2, 40, 2, 10, 0, 20, 0, 10, 1, 20, 0, 10, 2, 20, 0).end();
        // the 5 knots count against the limit as well as the 3 control points
        assertEquals(List.of("line 5, SPLINE (handle 2A): declares 5 knots, more than the limit 4"),
                errorNotes(dxf, limits(64, 1 << 20, 4, 10_000_000)));
        assertEquals(List.of(), errorNotes(dxf, limits(64, 1 << 20, 5, 10_000_000)));
    }

    @Test
    void maxVertices_isEnforcedOnLwpolylinesAndOnRecordSize() throws Exception {
        Dxf lw = Dxf.create().entities().add(0, "LWPOLYLINE", 5, "3A", 90, 3, 10, 0, 20, 0, 10, 1, 20, 0,
                10, 1, 20, 1).end();
        assertEquals(List.of("line 5, LWPOLYLINE (handle 3A): declares 3 vertices, more than the limit 2"),
                errorNotes(lw, limits(64, 1 << 20, 1_000_000, 2)));
        assertEquals(List.of(), errorNotes(lw, limits(64, 1 << 20, 1_000_000, 3)));
        // a polyline record may hold 8 groups per allowed vertex plus 65536: with 1 vertex, 65544 groups
        Dxf big = Dxf.create().entities().add(0, "LWPOLYLINE");
        for (int i = 0; i < 65_545; i++) {
            big.add(i % 2 == 0 ? 10 : 20, "0");
        }
        big.end();
        DxfInputException e = assertThrows(DxfInputException.class,
                () -> DxfImporter.read(Dxf.NAME, big.ascii(), limits(64, 1 << 20, 1_000_000, 1)));
        // group k (from 0) of the record is on line 7 + 2k; k = 65544 is one too many
        assertEquals("t.dxf:131095: LWPOLYLINE: record has more than 65544 groups", e.getMessage());
        // an entity without wire geometry keeps only its first groups, so a huge one costs no memory and is read
        Dxf text = Dxf.create().entities().add(0, "TEXT");
        for (int i = 0; i < 65_545; i++) {
            text.add(1001, "x");
        }
        text.end();
        assertEquals(1, DxfImporter.read(Dxf.NAME, text.ascii(), limits(64, 1 << 20, 1_000_000, 1)).modelSpace()
                .otherEntityCounts().get("TEXT"));
    }

    @Test
    void maxLineBytes_boundsBinaryStringsToo() {
        byte[] bin = Dxf.create().entities().add(0, "LINE", 8, "seventeen letters").end().binary(true);
        DxfInputException e = assertThrows(DxfInputException.class,
                () -> DxfImporter.read(Dxf.NAME, bin, limits(64, 16, 1_000_000, 10_000_000)));
        // group code 8 after sentinel (22), SECTION (2+8), ENTITIES (2+9) and LINE (2+5)
        assertEquals("t.dxf:byte 50: LINE: string value longer than 16 bytes", e.getMessage());
    }

    @Test
    void limitsBelowTheirMinimum_areRefusedAsBadArguments() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> limits(-1, 0, 5, 5));
        assertEquals("import limits out of range: maxBlockDepth=-1 (at least 0), maxLineBytes=0, maxControlPoints=5, "
                + "maxVertices=5 (each at least 1)", e.getMessage());
    }

    @Test
    void inputFiles_areOpenedReadOnlyAndLeftUntouched(@TempDir Path dir) throws Exception {
        // a refused file and a read file, both made read-only: reading works and changes nothing
        for (String name : List.of("truncated-mid-entity.dxf", "block-bomb.dxf")) {
            Path f = dir.resolve(name);
            Files.copy(catalogue().resolve(name), f);
            byte[] before = Files.readAllBytes(f);
            var stamp = Files.getLastModifiedTime(f);
            assertTrue(f.toFile().setReadOnly(), "cannot make the copy read-only");
            try {
                DxfImporter.read(f, ImportOptions.DEFAULTS);
            } catch (DxfInputException expected) {
                // refusal is the expected outcome of the truncated file
            }
            assertTrue(Arrays.equals(before, Files.readAllBytes(f)), name + " content changed");
            assertEquals(stamp, Files.getLastModifiedTime(f), name + " modification time changed");
        }
    }
}
