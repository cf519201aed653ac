package org.linemass.plan.cost;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/** The price table: columns in any order, last matching row wins, every error names file, line and column. */
class PriceTableReaderTest {

    /** Prices are read from decimal text and compared exactly: no arithmetic happens in between. */
    private static final double EXACT = 0;

    private static PriceTable read(String text) throws Exception {
        return PriceTableReader.read(text, "prices.csv", "prices.csv");
    }

    @Test
    void find_lastMatchingRowWins_globsOnSectionAndMaterial() throws Exception {
        PriceTable t = read("# invented prices\nUNIT_PRICE,Charge,section,material,currency\n"
                + "1.20,per_kg,,steel,EUR\n2.50,per_kg,B*,,EUR\n0.10,per_cut,,,\n");
        assertEquals(1.20, t.find(Charge.PER_KG, "RB12", "steel", 0).orElseThrow().price(), EXACT);
        assertEquals(2.50, t.find(Charge.PER_KG, "b10", "steel", 0).orElseThrow().price(), EXACT);
        assertTrue(t.find(Charge.PER_KG, "RB12", "aluminium", 0).isEmpty(), "no price for aluminium");
        assertEquals(0.10, t.find(Charge.PER_CUT, null, "", 0).orElseThrow().price(), EXACT);
        assertEquals(5, t.find(Charge.PER_CUT, "X", "", 0).orElseThrow().line());
        assertEquals("EUR", t.currency());
    }

    @Test
    void find_barPriceForOneStockLength() throws Exception {
        PriceTable t = read("charge,section,stock_length_mm,unit_price\nper_bar,D8,6000,3.10\nper_bar,D8,12000,6.00\n");
        assertEquals(6.00, t.find(Charge.PER_BAR, "D8", "", 12.0).orElseThrow().price(), EXACT);
        assertEquals(3.10, t.find(Charge.PER_BAR, "D8", "", 6.0002).orElseThrow().price(), EXACT);
        assertTrue(t.find(Charge.PER_BAR, "D8", "", 3.0).isEmpty());
    }

    @Test
    void read_quotedFieldWithComma() throws Exception {
        PriceTable t = read("charge,unit_price,note\nper_bend,0.25,\"invented, per bend\"\n");
        assertEquals(0.25, t.find(Charge.PER_BEND, "A", "", 0).orElseThrow().price(), EXACT);
    }

    @Test
    void read_badRows_oneMessageNamingFileLineAndColumn() {
        assertMessage("charge,unit_price\nper_kg,1,5\n", "prices.csv: line 2: 3 fields");
        assertMessage("charge,unit_price\n\nper_gram,1\n", "prices.csv: line 3: charge: 'per_gram' is not one of per_kg");
        assertMessage("charge,unit_price\nper_kg,1,50\n", "prices.csv: line 2:");
        assertMessage("charge,unit_price\nper_kg,\"1,50\"\n", "line 2: unit_price: '1,50' is not a number (write decimals with a point: 1.50)");
        assertMessage("charge,unit_price\nper_kg,-1\n", "line 2: unit_price: -1 is not a finite number of at least 0");
        assertMessage("charge,unit_price\nper_kg,NaN\n", "line 2: unit_price: NaN is not a finite number");
        assertMessage("charge,unit_price\nper_kg,\n", "line 2: unit_price is empty");
        assertMessage("charge,unit_price,stock_length_mm\nper_kg,1,6000\n", "line 2: stock_length_mm: only a per_bar price");
        assertMessage("charge,price\nper_kg,1\n", "prices.csv: the header has no 'unit_price' column");
        assertMessage("charge,unit_price\n", "prices.csv: no price rows");
        assertMessage("charge,unit_price,currency\nper_kg,1,EUR\nper_cut,1,GBP\n", "more than one currency (EUR, GBP)");
        assertMessage("charge,unit_price\nper_kg,\"1\n", "prices.csv: not a readable CSV table");
    }

    private static void assertMessage(String text, String expected) {
        Exception e = assertThrows(Exception.class, () -> read(text));
        assertTrue(e instanceof org.linemass.plan.stock.PlanInputException, e.toString());
        assertTrue(e.getMessage().contains(expected), e.getMessage());
    }
}
