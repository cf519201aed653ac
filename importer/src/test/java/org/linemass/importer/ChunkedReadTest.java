package org.linemass.importer;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.Random;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.linemass.geometry.Provenance;
import org.linemass.geometry.Segment;

/**
 * Files larger than the read buffer (1 MiB) are streamed in chunks, so lines, CRLF pairs and binary
 * values straddle chunk boundaries: reading such a file from disk must give exactly what reading
 * the same bytes from memory (one window, no refills) gives.
 */
class ChunkedReadTest {

    private static final Provenance NONE = Provenance.of("", "", 0, "", "");

    private static Dxf bigDrawing(int entities) {
        Random rnd = new Random(3);
        Dxf dxf = Dxf.create().entities();
        for (int k = 0; k < entities; k++) {
            String h = Integer.toHexString(0x100 + k).toUpperCase(Locale.ROOT);
            switch (k % 3) {
                case 0 -> dxf.add(0, "LINE", 5, h, 8, "W" + (k % 7), 10, rnd.nextGaussian(), 20, rnd.nextGaussian(),
                        30, rnd.nextGaussian(), 11, rnd.nextGaussian(), 21, rnd.nextGaussian(), 31, rnd.nextGaussian());
                case 1 -> dxf.add(0, "ARC", 5, h, 8, "A", 10, rnd.nextGaussian(), 20, rnd.nextGaussian(), 40,
                        0.5 + rnd.nextDouble(), 50, 360 * rnd.nextDouble(), 51, 360 * rnd.nextDouble());
                default -> dxf.add(0, "LWPOLYLINE", 5, h, 8, "P", 90, 3, 70, 1, 10, rnd.nextGaussian(), 20,
                        rnd.nextGaussian(), 42, rnd.nextDouble() - 0.5, 10, rnd.nextGaussian(), 20, rnd.nextGaussian(),
                        10, rnd.nextGaussian(), 20, rnd.nextGaussian());
            }
            if (k % 500 == 0) {
                dxf.add(999, "x".repeat(1 + k % 3000));
            }
        }
        return dxf.end();
    }

    private static void assertSame(List<Segment> a, List<Segment> b) {
        assertEquals(a.size(), b.size());
        for (int i = 0; i < a.size(); i++) {
            assertEquals(a.get(i).withSource(NONE), b.get(i).withSource(NONE));
            assertEquals(a.get(i).source().line(), b.get(i).source().line());
            assertEquals(a.get(i).source().handle(), b.get(i).source().handle());
            assertEquals(a.get(i).source().layer(), b.get(i).source().layer());
        }
    }

    @Test
    void asciiLfAndCrlf_streamedEqualsInMemory(@TempDir Path dir) throws Exception {
        Dxf dxf = bigDrawing(30_000);
        byte[] lf = dxf.ascii();
        byte[] crlf = dxf.text().replace("\n", "\r\n").getBytes(java.nio.charset.StandardCharsets.ISO_8859_1);
        assertEquals(true, lf.length > 3 * (1 << 20), "several buffer fills");
        List<Segment> mem = DxfImporter.read("m.dxf", lf, ImportOptions.DEFAULTS).modelSpace().segments();
        for (byte[] content : List.of(lf, crlf)) {
            Path f = dir.resolve("big.dxf");
            Files.write(f, content);
            assertSame(mem, DxfImporter.read(f, ImportOptions.DEFAULTS).modelSpace().segments());
        }
    }

    @Test
    void lineLongerThanTheFirstBuffer_growsItWithinTheLimit(@TempDir Path dir) throws Exception {
        Path f = dir.resolve("long.dxf");
        Dxf dxf = Dxf.create().entities().add(0, "MTEXT", 1, "n".repeat(3 << 20)).add(0, "LINE", 10, 1, 11, 4, 21, 4)
                .end();
        Files.write(f, dxf.ascii());
        Files.write(dir.resolve("long.bin"), dxf.binary(true));
        ImportOptions eight = new ImportOptions(java.util.Optional.empty(), 64, 8 << 20, 1000, 1000);
        for (Path p : List.of(f, dir.resolve("long.bin"))) {
            org.linemass.drawing.Drawing d = DxfImporter.read(p, eight);
            // closed form: (1,0,0) to (4,4,0) has length 5
            assertEquals(5, ((org.linemass.geometry.Straight) d.modelSpace().segments().get(0)).length(), 1e-12);
            assertEquals(1, d.modelSpace().otherEntityCounts().get("MTEXT"));
        }
    }

    @Test
    void binary_streamedEqualsInMemory(@TempDir Path dir) throws Exception {
        byte[] bin = bigDrawing(40_000).binary(true);
        assertEquals(true, bin.length > 2 * (1 << 20), "several buffer fills");
        Path f = dir.resolve("big.dxf");
        Files.write(f, bin);
        List<Segment> mem = DxfImporter.read("m.dxf", bin, ImportOptions.DEFAULTS).modelSpace().segments();
        List<Segment> disk = DxfImporter.read(f, ImportOptions.DEFAULTS).modelSpace().segments();
        assertEquals(mem.size(), disk.size());
        for (int i = 0; i < mem.size(); i++) {
            assertEquals(mem.get(i).withSource(NONE), disk.get(i).withSource(NONE));
            assertEquals(mem.get(i).source().line(), disk.get(i).source().line(), "byte offsets agree");
        }
    }
}
