package org.linemass.engine.fuzz;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.BufferedReader;
import java.io.ByteArrayInputStream;
import java.io.InputStreamReader;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import org.linemass.engine.error.AnalysisException;

/**
 * What the CSV readers promise for any file content: they return a result or throw
 * {@link AnalysisException} with a one-line message naming the file; nothing else escapes (an
 * IllegalArgumentException, an IndexOutOfBoundsException or an error fails the fuzz test as it
 * is). The bytes are decoded the way the readers' {@code read(Path)} does, strict UTF-8, so that a
 * malformed byte surfaces as the same read error as from a real file.
 */
final class CsvReaderContract {

    static final String NAME = "fuzz.csv";

    /** One reader under test: section table or assignment file. */
    @FunctionalInterface
    interface Reader {
        Object read(BufferedReader in, String name) throws AnalysisException;
    }

    private CsvReaderContract() {
    }

    static void check(byte[] content, Reader reader) {
        var decoder = StandardCharsets.UTF_8.newDecoder().onMalformedInput(CodingErrorAction.REPORT)
                .onUnmappableCharacter(CodingErrorAction.REPORT);
        BufferedReader in = new BufferedReader(new InputStreamReader(new ByteArrayInputStream(content), decoder));
        try {
            Object result = reader.read(in, NAME);
            assertTrue(result != null, "a reader returns a value or throws");
        } catch (AnalysisException e) {
            String m = e.getMessage();
            assertTrue(m != null && m.contains(NAME), () -> "message must name the file: " + m);
            assertFalse(m.contains("\n") || m.contains("\r"), () -> "message must be one line: " + m);
        }
    }
}
