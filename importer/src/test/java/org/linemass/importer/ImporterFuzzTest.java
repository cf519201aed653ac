package org.linemass.importer;

import com.code_intelligence.jazzer.junit.FuzzTest;

/**
 * Fuzz target for the importer (ASCII and binary content alike). In the normal test run it
 * replays the inputs under src/test/resources/org/linemass/importer/ImporterFuzzTestInputs/readAny
 * (seeds and any crash found so far); with JAZZER_FUZZ=1 it fuzzes. Contract checked: only
 * {@link DxfInputException} may escape, with a one-line message that is not an internal error.
 */
class ImporterFuzzTest {

    /** Small limits keep each execution fast while exercising every limit path. */
    private static final ImportOptions SMALL = new ImportOptions(java.util.Optional.empty(), 16, 4096, 4096, 4096);

    @FuzzTest(maxDuration = "3m")
    void readAny(byte[] data) {
        try {
            DxfImporter.read("fuzz.dxf", data, SMALL);
        } catch (DxfInputException e) {
            if (e.getMessage().indexOf('\n') >= 0 || e.problem().startsWith("internal error while reading")
                    || e.problem().startsWith("drawing too large or too deeply nested")) {
                throw new IllegalStateException("bad input error: " + e.getMessage(), e);
            }
        }
    }
}
