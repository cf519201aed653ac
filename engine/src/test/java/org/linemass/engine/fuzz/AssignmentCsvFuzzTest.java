package org.linemass.engine.fuzz;

import com.code_intelligence.jazzer.junit.FuzzTest;
import org.junit.jupiter.api.Timeout;
import org.linemass.engine.section.AssignmentReader;

/**
 * Fuzzes the layer assignment reader (layer globs to section ids) with raw file bytes, seeded from
 * the demo assignment file. Same contract as {@link SectionCsvFuzzTest}.
 */
class AssignmentCsvFuzzTest {

    @Timeout(10)
    @FuzzTest(maxDuration = "2m")
    void assignments(byte[] content) {
        CsvReaderContract.check(content, AssignmentReader::read);
    }
}
