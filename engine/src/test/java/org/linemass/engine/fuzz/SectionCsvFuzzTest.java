package org.linemass.engine.fuzz;

import com.code_intelligence.jazzer.junit.FuzzTest;
import org.junit.jupiter.api.Timeout;
import org.linemass.engine.section.SectionCsvReader;

/**
 * Fuzzes the user section table reader with raw file bytes, seeded from the demo table and the
 * built-in tables. {@link Timeout} turns a hang into a failure (libFuzzer's per-input timeout
 * when fuzzing); {@code scripts/fuzz} overrides {@code maxDuration}.
 */
class SectionCsvFuzzTest {

    @Timeout(10)
    @FuzzTest(maxDuration = "2m")
    void sectionTable(byte[] content) {
        CsvReaderContract.check(content, SectionCsvReader::read);
    }
}
