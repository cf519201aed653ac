package org.linemass.engine.section;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.linemass.engine.error.AnalysisException;

/**
 * The optional {@code joins} column of a layer assignment file: a row with it makes its layers join
 * the listed ones, with the row's layer leading; rows without it and files without the column give
 * no joins; an empty pattern is a one-line error naming the file and line.
 */
class AssignmentJoinsTest {

    @TempDir
    Path tmp;

    private Path file(String text) throws Exception {
        Path p = tmp.resolve("layers.csv");
        Files.writeString(p, text, StandardCharsets.UTF_8);
        return p;
    }

    @Test
    void readJoins_rowWithJoins_leadIsTheRowsLayer() throws Exception {
        List<LayerJoin> joins = AssignmentReader.readJoins(file(
                "layer,section,joins\nSTIRRUP_D8,RB8,HOOK_D8+HOOK_EXTRA\nMAIN_D16,RB16,\n"));
        assertEquals(1, joins.size());
        LayerJoin j = joins.get(0);
        assertEquals(List.of("STIRRUP_D8", "HOOK_D8", "HOOK_EXTRA"), j.layerGlobs());
        assertEquals("STIRRUP_D8", j.leadLayer());
        assertTrue(j.matches("hook_d8"), "layer names compare without case");
        assertTrue(j.origin().endsWith("line 2"), j.origin());
    }

    @Test
    void readJoins_noColumn_none() throws Exception {
        assertEquals(List.of(), AssignmentReader.readJoins(file("layer,section\nA,RB8\n")));
    }

    @Test
    void readJoins_emptyPattern_errorNamesTheLine() throws Exception {
        AnalysisException e = assertThrows(AnalysisException.class,
                () -> AssignmentReader.readJoins(file("layer,section,joins\nA,RB8,B++C\n")));
        assertTrue(e.getMessage().contains("line 2"), e.getMessage());
        assertNull(LayerJoin.parse("A+B", "x").leadLayer());
    }
}
