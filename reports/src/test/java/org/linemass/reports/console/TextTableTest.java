package org.linemass.reports.console;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;

/** Column padding of the console tables. */
class TextTableTest {

    @Test
    void aVeryLongCell_isWrittenOnce_notPaddedIntoEveryRow() {
        // a layer named with 100,000 letters (found by the mutation campaign): the table used to pad
        // every row to that width, 335 MB of console output for a 150 KB drawing
        String longName = "A".repeat(100_000);
        TextTable t = new TextTable(List.of("layer", "length [m]"), false, true);
        t.add(List.of(longName, "1.000"));
        for (int i = 0; i < 1000; i++) {
            t.add(List.of("L" + i, "2.000"));
        }
        String out = t.render("  ");
        // the long name once plus 1002 short lines (header, rule, rows) of indent + 64 + 2 + 10 + newline;
        // padding every row to the long name would give over 10^8 characters
        assertTrue(out.length() <= 100_000 + 1003 * (2 + TextTable.MAX_PAD + 2 + 10 + 1), "output " + out.length());
        List<String> lines = out.lines().toList();
        // "length [m]" is 10 wide: numbers right-aligned in it, two spaces between columns
        assertTrue(lines.get(2).equals("  " + longName + "       1.000"), "the long row is the name and its number");
        assertEquals("  L0" + " ".repeat(TextTable.MAX_PAD - 2) + "       2.000", lines.get(3));
    }

    @Test
    void ordinaryCells_stillPaddedToTheWidest() {
        TextTable t = new TextTable(List.of("layer", "n"), false, true);
        t.add(List.of("FRAME", "1"));
        t.add(List.of("X", "12"));
        assertEquals("  layer   n\n  -----  --\n  FRAME   1\n  X      12\n", t.render("  "));
    }
}
