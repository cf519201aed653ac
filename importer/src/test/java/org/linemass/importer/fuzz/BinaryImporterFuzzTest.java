package org.linemass.importer.fuzz;

import com.code_intelligence.jazzer.junit.FuzzTest;
import java.nio.charset.StandardCharsets;
import org.junit.jupiter.api.Timeout;

/**
 * Fuzzes the binary importer: every input is put behind the 22-byte binary DXF sentinel so that the
 * fuzzer spends its time on group codes and values, not on finding the sentinel. Seeds are binary
 * versions of the test drawings (without the sentinel). Same contract as the ASCII test.
 */
class BinaryImporterFuzzTest {

    /** "AutoCAD Binary DXF" CR LF SUB NUL (DXF Reference, binary DXF files). */
    private static final byte[] SENTINEL = "AutoCAD Binary DXF\r\n\u001a\u0000".getBytes(StandardCharsets.ISO_8859_1);

    @Timeout(10)
    @FuzzTest(maxDuration = "2m")
    void binaryDrawing(byte[] afterSentinel) {
        byte[] content = new byte[SENTINEL.length + afterSentinel.length];
        System.arraycopy(SENTINEL, 0, content, 0, SENTINEL.length);
        System.arraycopy(afterSentinel, 0, content, SENTINEL.length, afterSentinel.length);
        ImporterContract.check(content);
    }
}
