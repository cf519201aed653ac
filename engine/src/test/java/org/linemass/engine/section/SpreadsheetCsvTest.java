package org.linemass.engine.section;

import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.StringReader;
import org.linemass.engine.error.AnalysisException;
import org.junit.jupiter.api.Test;

/**
 * Section and assignment tables saved by a spreadsheet on a comma-decimal desktop: ';' between
 * columns, or decimal commas. Each gets a message that says what is wrong and what to do, naming
 * the file and line, never a silent misreading.
 */
class SpreadsheetCsvTest {

    private static String sectionError(String csv) {
        AnalysisException e = assertThrows(AnalysisException.class,
                () -> SectionCsvReader.read(new StringReader(csv), "shop.csv"));
        return e.getMessage();
    }

    @Test
    void semicolonSeparated_sectionTable_saysSo() {
        String m = sectionError("section;mass_kg_per_m\nB8;0,395\n");
        assertTrue(m.contains("shop.csv") && m.contains("line 1") && m.contains("separated by ';'"), m);
    }

    @Test
    void tabSeparated_sectionTable_saysSo() {
        String m = sectionError("section\tmass_kg_per_m\nB8\t0.395\n");
        assertTrue(m.contains("separated by tabs"), m);
    }

    @Test
    void decimalCommaUnquoted_splitsTheRow_andTheMessageSuspectsIt() {
        String m = sectionError("section,mass_kg_per_m\nB8,0,395\n");
        assertTrue(m.contains("line 2") && m.contains("a decimal comma?"), m);
    }

    @Test
    void decimalCommaQuoted_isNotANumber_andTheMessageShowsThePoint() {
        String m = sectionError("section,mass_kg_per_m\nB8,\"0,395\"\n");
        assertTrue(m.contains("not a number: 0,395 (write decimals with a point: 0.395)"), m);
    }

    @Test
    void semicolonSeparated_assignmentFile_saysSo() {
        AnalysisException e = assertThrows(AnalysisException.class,
                () -> AssignmentReader.read(new StringReader("layer;section\nRAIL*;B8\n"), "layers.csv"));
        assertTrue(e.getMessage().contains("layers.csv") && e.getMessage().contains("separated by ';'"), e.getMessage());
    }
}
