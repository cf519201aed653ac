package org.linemass.reports.csv;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

class CsvCellTest {

    @ParameterizedTest
    @ValueSource(strings = {"=1+2", "+A1", "-2+3", "@SUM(A1)", "\tx", "\rx"})
    void text_formulaStart_getsQuotePrefix(String v) {
        // OWASP "CSV injection" guidance: prefix cells starting with = + - @ tab CR with a single quote
        assertEquals("'" + v, CsvCell.text(v));
    }

    @ParameterizedTest
    @ValueSource(strings = {"FRAME", "B10", "a=b", "1-2", " =x"})
    void text_harmless_isUnchanged(String v) {
        assertEquals(v, CsvCell.text(v));
    }

    @Test
    void quote_followsRfc4180() {
        assertEquals("plain", CsvCell.quote("plain"));
        assertEquals("\"a,b\"", CsvCell.quote("a,b"));
        assertEquals("\"say \"\"hi\"\"\"", CsvCell.quote("say \"hi\""));
        assertEquals("\"two\nlines\"", CsvCell.quote("two\nlines"));
        assertEquals("", CsvCell.text(null));
    }
}
