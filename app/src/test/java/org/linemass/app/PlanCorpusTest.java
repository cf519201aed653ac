package org.linemass.app;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.HashMap;
import java.util.Map;
import java.util.TreeMap;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * {@code check} on the folder of corpus drawings (../shared/corpus) as one job with a stock table:
 * the plan cuts exactly the bill's pieces, and for every section the proven lower bound lies
 * between the material bound (the bill's total length: no plan can buy less) and the stock bought,
 * with the reported gap between them.
 */
class PlanCorpusTest {

    /**
     * Lengths are sums of a few thousand doubles of at most tens of metres: 1e-9 m relative is
     * far above their rounding and far below any stock length.
     */
    private static final double REL = 1e-9;

    @TempDir
    Path tmp;

    @Test
    void check_corpusFolderWithStockTable_planCountsEqualBillAndBoundHolds() throws Exception {
        Path corpus = CorpusJsonTest.corpus();
        assumeTrue(corpus != null && Files.exists(corpus.resolve("manifest.json")),
                "../shared/corpus not present beside the checkout; corpus plan check skipped");
        // the sections and stock are invented for the test: two bar sections by layer name and one coil
        Path sections = Files.writeString(tmp.resolve("sections.csv"),
                "section,shape,d_mm,material,stock_lengths_mm,stock_counts,kerf_mm,min_offcut_mm,coil_kg\n"
                + "TEST-BAR8,round,8,steel,6000;12000,;,3,500,\n"
                + "TEST-WIRE4,round,4,steel,,,0,,25\n");
        Path stock = Files.writeString(tmp.resolve("stock.csv"), "section,stock_lengths_mm,kerf_mm\ntube:*,6000,2\n");
        Path json = tmp.resolve("job.json");
        AppFixtures.Run r = AppFixtures.run(new EnginePipeline(), "check", corpus.toString(), "--fail-at", "never",
                "-q", "--section-table", sections.toString(), "-a", "*=TEST-BAR8", "-a", "*WIRE*=TEST-WIRE4",
                "-a", "*TUBE*=tube:42.4x2.6:steel", "--stock-table", stock.toString(), "--plan-time", "5",
                "--json", json.toString());
        assertEquals(0, r.code(), r.err());
        JsonNode doc = new ObjectMapper().readTree(json.toFile());
        JsonNode plan = doc.get("cutting_plan");
        assertTrue(plan != null && plan.get("sections").size() >= 1, "a plan is made from the section table's stock");

        Map<String, Integer> bill = new TreeMap<>();
        Map<String, Double> billLength = new HashMap<>();
        for (JsonNode d : doc.get("drawings")) {
            String file = d.get("drawing").get("file").asText();
            for (JsonNode g : d.get("groups")) {
                bill.merge(file + ":" + g.get("mark").asText(), g.get("quantity").asInt(), Integer::sum);
                if (!g.get("section").isNull()) {
                    billLength.merge(g.get("section").asText(), g.get("length_total_m").asDouble(), Double::sum);
                }
            }
        }
        Map<String, Integer> planned = new TreeMap<>();
        for (JsonNode s : plan.get("sections")) {
            double uncut = 0;
            for (JsonNode p : s.get("patterns")) {
                for (JsonNode x : p.get("pieces")) {
                    planned.merge(x.get("mark").asText(), p.get("bars").asInt() * x.get("count").asInt(), Integer::sum);
                }
            }
            for (JsonNode u : s.get("uncut")) {
                planned.merge(u.get("mark").asText(), u.get("quantity").asInt(), Integer::sum);
                uncut += u.get("quantity").asInt() * u.get("length_m").asDouble();
            }
            String name = s.get("section").asText();
            double bought = s.get("bought_m").asDouble();
            double bound = s.get("lower_bound_m").asDouble();
            double material = billLength.get(name) - uncut;
            assertTrue(bound >= material * (1 - REL), name + ": bound " + bound + " below the material bound " + material);
            assertTrue(bought >= bound * (1 - REL), name + ": bought " + bought + " below the bound " + bound);
            assertEquals((bought - bound) / bought, s.get("gap").asDouble(), REL, name + ": the gap reported");
        }
        for (JsonNode u : plan.get("unplanned")) {
            planned.merge(u.get("mark").asText(), u.get("quantity").asInt(), Integer::sum);
        }
        assertEquals(bill, planned, "every piece of the bill is in the plan once");
    }
}
