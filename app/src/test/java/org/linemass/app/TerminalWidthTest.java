package org.linemass.app;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.Map;
import org.junit.jupiter.api.Test;
import org.linemass.reports.console.ConsoleReport;

class TerminalWidthTest {

    @Test
    void of_columnsSet_takesIt_overTheTerminal() {
        assertEquals(80, TerminalWidth.of(Map.of("COLUMNS", "80"), () -> 132));
        assertEquals(132, TerminalWidth.of(Map.of(), () -> 132), "stty's columns without $COLUMNS");
    }

    @Test
    void of_nothingKnown_default_andNonsenseKeptInBounds() {
        assertEquals(ConsoleReport.DEFAULT_WIDTH, TerminalWidth.of(Map.of(), () -> 0));
        assertEquals(ConsoleReport.DEFAULT_WIDTH, TerminalWidth.of(Map.of("COLUMNS", "wide"), () -> 0));
        assertEquals(TerminalWidth.MIN, TerminalWidth.of(Map.of("COLUMNS", "3"), () -> 0));
        assertEquals(TerminalWidth.MAX, TerminalWidth.of(Map.of("COLUMNS", "99999"), () -> 0));
    }
}
