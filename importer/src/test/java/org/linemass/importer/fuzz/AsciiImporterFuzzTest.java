package org.linemass.importer.fuzz;

import com.code_intelligence.jazzer.junit.FuzzTest;
import org.junit.jupiter.api.Timeout;

/**
 * Fuzzes the ASCII importer with raw bytes, seeded from the project's test drawings and the shared
 * corpus. {@link Timeout} makes a hang a failure (and becomes libFuzzer's per-input timeout when
 * fuzzing); {@code maxDuration} is the default campaign length, which {@code scripts/fuzz} overrides.
 */
class AsciiImporterFuzzTest {

    @Timeout(10)
    @FuzzTest(maxDuration = "2m")
    void asciiDrawing(byte[] content) {
        ImporterContract.check(content);
    }
}
