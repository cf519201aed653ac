package org.linemass.app;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.networknt.schema.JsonSchema;
import com.networknt.schema.JsonSchemaFactory;
import com.networknt.schema.SpecVersion;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.apache.poi.ss.usermodel.Workbook;
import org.apache.poi.ss.usermodel.WorkbookFactory;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.linemass.reports.json.JsonReportWriter;

/**
 * {@code check --price-table} on the demo drawing with the invented demo prices
 * (testdata/demo/garden-planter-prices.csv): every cost against a hand calculation from the
 * demo's closed-form lengths (testdata/demo/README.md), missing prices named and never counted,
 * the stock shares of a cutting plan adding up to the stock cost.
 */
class CostCheckTest {

    /**
     * Costs are sums of products of engine lengths (about 1e-9 relative) and the scroll's length,
     * known by hand to about 1e-6 relative (demo README); 1e-5 EUR on totals of about 40 EUR is
     * well above both and far below a cent.
     */
    private static final double EUR = 1e-5;

    // demo README: closed-form lengths (m) and kg/m of the three sections
    private static final double D8_M = 1.6570796 + 1.5056637 + 1.2045722;
    private static final double D4_M = 1.6790 + 0.560243;
    private static final double D3_M = 0.4661947;
    private static final double D8_KG_M = 0.394584;
    private static final double D4_KG_M = 0.098646;
    private static final double D3_KG_M = 0.055488;

    private static final ObjectMapper MAPPER = new ObjectMapper();

    @TempDir
    Path tmp;

    private static Path demoDir() {
        return CorpusJsonTest.repo().resolve("testdata/demo");
    }

    private AppFixtures.Run demo(String... extra) {
        Path demo = demoDir();
        List<String> args = new ArrayList<>(List.of("check", demo.resolve("garden-planter.dxf").toString(),
                "--fail-at", "never", "--section-table", demo.resolve("garden-planter-section-table.csv").toString(),
                "--assign-file", demo.resolve("garden-planter-layers.csv").toString()));
        args.addAll(List.of(extra));
        return AppFixtures.run(new EnginePipeline(), args.toArray(String[]::new));
    }

    @Test
    void check_demoPrices_everyLineAsHandCalculation() throws Exception {
        Path json = tmp.resolve("r.json");
        AppFixtures.Run r = demo("--price-table", demoDir().resolve("garden-planter-prices.csv").toString(),
                "--json", json.toString(), "--xlsx", tmp.resolve("r.xlsx").toString(),
                "--html", tmp.resolve("r.html").toString(), "--cost-csv", tmp.resolve("cost.csv").toString());
        assertEquals(0, r.code(), r.err());
        JsonNode costs = validated(json).get("costs");
        // invented prices: steel 1.20 /kg, the 3 mm clip wire 2.50 /kg, 0.10 a cut, 0.25 a bend, 0.40 a weld
        double material = (D8_M * D8_KG_M + D4_M * D4_KG_M) * 1.20 + D3_M * D3_KG_M * 2.50;
        double cuts = 28 * 0.10; // 28 pieces (demo README bill)
        double bends = (4 + 12 * 1 + 4 + 4) * 0.25; // M01, M02 x12, M04, M05 (demo README bill)
        double welds = 48 * 0.40; // 24 crossings + 24 T-junctions (demo README notes)
        Map<String, Double> byItem = new HashMap<>();
        for (JsonNode l : costs.get("lines")) {
            byItem.merge(l.get("item").asText(), l.get("cost").asDouble(), Double::sum);
            assertTrue(l.get("formula").asText().endsWith(String.format(java.util.Locale.ROOT, "= %.2f",
                    l.get("cost").asDouble())), l.toString());
        }
        assertEquals(material, byItem.get("material"), EUR);
        assertEquals(cuts, byItem.get("cuts"), EUR);
        assertEquals(bends, byItem.get("bends"), EUR);
        assertEquals(welds, byItem.get("welds"), EUR);
        assertEquals(material + cuts + bends + welds, costs.get("total_priced").asDouble(), EUR);
        assertTrue(costs.get("complete").asBoolean());
        assertEquals("EUR", costs.get("currency").asText());
        assertTrue(r.out().contains("job total " + String.format(java.util.Locale.ROOT, "%.2f",
                material + cuts + bends + welds) + " EUR"), r.out());
        assertTrue(Files.readString(tmp.resolve("r.html")).contains("<h2>Costs</h2>"));
        assertTrue(Files.readString(tmp.resolve("cost.csv")).contains("M01,PLANTER-D8,bends,4,bend,0.2500,1.00,4 bends x 0.25 = 1.00"));
        try (Workbook wb = WorkbookFactory.create(tmp.resolve("r.xlsx").toFile())) {
            assertEquals(material + cuts + bends + welds,
                    wb.getSheet("cost totals").getRow(2).getCell(2).getNumericCellValue(), EUR);
        }
    }

    @Test
    void check_pricesMissing_namedAndNotCounted() throws Exception {
        Path prices = Files.writeString(tmp.resolve("p.csv"), "charge,section,unit_price\nper_kg,PLANTER-D8,1.20\n"
                + "per_cut,,0.10\n");
        Path json = tmp.resolve("r.json");
        AppFixtures.Run r = demo("--price-table", prices.toString(), "--json", json.toString(),
                "--cost-totals-csv", tmp.resolve("totals.csv").toString());
        assertEquals(0, r.code(), r.err());
        JsonNode costs = validated(json).get("costs");
        assertFalse(costs.get("complete").asBoolean());
        List<String> missing = new ArrayList<>();
        costs.get("missing").forEach(m -> missing.add(m.get("price").asText() + " x" + m.get("lines").asInt()));
        // per_kg for D4 (M05, M06, M07) and D3 (M02); bends of M01, M02, M04, M05; welds on D4 and D8
        // in the order of the lines: M01 bends, M02 material and bends, M04 bends, M05 ..., then the welds
        assertEquals(List.of("per_bend for PLANTER-D8 x2", "per_kg for PLANTER-D3 x1", "per_bend for PLANTER-D3 x1",
                "per_kg for PLANTER-D4 x3", "per_bend for PLANTER-D4 x1", "per_weld for PLANTER-D4 x1",
                "per_weld for PLANTER-D8 x1"), missing);
        for (JsonNode l : costs.get("lines")) {
            boolean priced = l.get("missing_price").isNull();
            assertEquals(priced, !l.get("cost").isNull(), l.toString());
        }
        assertEquals(D8_M * D8_KG_M * 1.20 + 28 * 0.10, costs.get("total_priced").asDouble(), EUR);
        String totals = Files.readString(tmp.resolve("totals.csv"));
        assertTrue(totals.contains("lower figure: some prices are missing"), totals);
        assertTrue(totals.contains("missing price,per_weld for PLANTER-D8,,,1 line without cost"), totals);
        assertTrue(r.out().contains("missing price: per_kg for PLANTER-D4 (3 lines without cost)"), r.out());
    }

    @Test
    void check_pricesWithPlan_stockSharesAddUpToStockCost() throws Exception {
        Path stock = Files.writeString(tmp.resolve("stock.csv"), "section,stock_lengths_mm,kerf_mm,coil_kg\n"
                + "PLANTER-D8,6000,3,\nPLANTER-D4,,0,25\n");
        Path json = tmp.resolve("r.json");
        AppFixtures.Run r = demo("--price-table", demoDir().resolve("garden-planter-prices.csv").toString(),
                "--stock-table", stock.toString(), "--json", json.toString(), "-q");
        assertEquals(0, r.code(), r.err());
        JsonNode doc = validated(json);
        JsonNode costs = doc.get("costs");
        Map<String, Double> stockCost = new HashMap<>();
        for (JsonNode s : costs.get("stock")) {
            stockCost.merge(s.get("section").asText(), s.get("cost").asDouble(), Double::sum);
        }
        // 4.367 m of 8 mm bar fits one 6 m bar (3.10); the 4 mm wire is one 25 kg coil (24.00): invented prices
        assertEquals(3.10, stockCost.get("PLANTER-D8"), EUR);
        assertEquals(24.00, stockCost.get("PLANTER-D4"), EUR);
        Map<String, Double> shares = new HashMap<>();
        for (JsonNode l : costs.get("lines")) {
            if (l.get("item").asText().equals("stock share")) {
                shares.merge(l.get("section").asText(), l.get("cost").asDouble(), Double::sum);
            }
        }
        assertEquals(stockCost.keySet(), shares.keySet());
        // the marks' shares are the whole stock cost of each section (a length-weighted split: equal up to rounding)
        stockCost.forEach((k, v) -> assertEquals(v, shares.get(k), EUR, k));
        assertEquals(1, doc.get("cutting_plan").get("sections").get(1).get("bars").asInt(), doc.get("cutting_plan").toString());
    }

    @Test
    void check_badPriceTable_oneLineExit2() throws Exception {
        Path prices = Files.writeString(tmp.resolve("p.csv"), "charge,unit_price\nper_kg,abc\n");
        AppFixtures.Run r = demo("--price-table", prices.toString());
        assertEquals(2, r.code());
        assertTrue(r.err().contains("p.csv: line 2: unit_price: 'abc' is not a number"), r.err());
        assertEquals(1, r.err().strip().lines().count(), r.err());
        AppFixtures.Run noTable = demo("--cost-csv", tmp.resolve("c.csv").toString());
        assertEquals(2, noTable.code());
        assertTrue(noTable.err().contains("need --price-table"), noTable.err());
    }

    private static JsonNode validated(Path json) throws Exception {
        JsonSchema schema;
        try (InputStream s = JsonReportWriter.class.getResourceAsStream(JsonReportWriter.SCHEMA_RESOURCE)) {
            schema = JsonSchemaFactory.getInstance(SpecVersion.VersionFlag.V202012).getSchema(s);
        }
        JsonNode doc = MAPPER.readTree(json.toFile());
        assertEquals(java.util.Set.of(), schema.validate(doc), "schema errors");
        return doc;
    }
}
