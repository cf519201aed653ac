package org.linemass.app;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** {@code check} with stock: the cutting plan cuts exactly the bill's pieces; bad stock input is one line, exit 2. */
class PlanCheckTest {

    private static final Pattern PIECES = Pattern.compile("(\\d+) x ([^ ;]+)");

    @TempDir
    Path tmp;

    private AppFixtures.Run demo(String... extra) {
        Path demo = CorpusJsonTest.repo().resolve("testdata/demo");
        List<String> args = new java.util.ArrayList<>(List.of("check", demo.resolve("garden-planter.dxf").toString(),
                "--fail-at", "never", "-q", "--section-table", demo.resolve("garden-planter-section-table.csv").toString(),
                "--assign-file", demo.resolve("garden-planter-layers.csv").toString()));
        args.addAll(List.of(extra));
        return AppFixtures.run(new EnginePipeline(), args.toArray(String[]::new));
    }

    @Test
    void check_demoWithStock_planPieceCountsEqualBill() throws Exception {
        Path bom = tmp.resolve("bom.csv");
        Path cutting = tmp.resolve("cutting.csv");
        Path stock = Files.writeString(tmp.resolve("stock.csv"), "section,stock_lengths_mm,stock_counts,kerf_mm,min_offcut_mm,coil_kg\n"
                + "PLANTER-D8,6000;3000,;2,3,500,\nPLANTER-D4,,,0,,25\n");
        AppFixtures.Run r = demo("--stock", "6m", "--stock-table", stock.toString(), "--bom-csv", bom.toString(),
                "--cutting-csv", cutting.toString(), "--order-csv", tmp.resolve("order.csv").toString(),
                "--plan-csv", tmp.resolve("plan.csv").toString(), "--xlsx", tmp.resolve("plan.xlsx").toString(),
                "--html", tmp.resolve("plan.html").toString());
        assertEquals(0, r.code(), r.err());
        Map<String, Integer> bill = new HashMap<>();
        for (String line : Files.readAllLines(bom).subList(1, Files.readAllLines(bom).size())) {
            String[] c = line.replace("\uFEFF", "").split(",");
            if (!c[0].equals("TOTAL") && !c[0].equals("NOTE")) {
                bill.merge(c[0], Integer.parseInt(c[1]), Integer::sum);
            }
        }
        Map<String, Integer> planned = new HashMap<>();
        List<String> rows = Files.readAllLines(cutting);
        for (String line : rows.subList(1, rows.size())) {
            String[] c = line.split(",");
            int bars = c[2].isEmpty() ? 1 : Integer.parseInt(c[2]);
            Matcher m = PIECES.matcher(line.substring(line.indexOf(c[3]) + c[3].length()));
            while (m.find()) {
                planned.merge(m.group(2), bars * Integer.parseInt(m.group(1)), Integer::sum);
            }
        }
        assertEquals(bill, planned);
        String plan = Files.readString(tmp.resolve("plan.csv"));
        assertTrue(plan.contains("PLANTER-D4,1,"), "the 4 mm wire is bought as one 25 kg coil:\n" + plan);
        String html = Files.readString(tmp.resolve("plan.html"));
        assertTrue(html.contains("<h2>Cutting plan and order</h2>"));
    }

    @Test
    void check_badStockTable_oneLineNamingFileAndLine() throws Exception {
        Path stock = Files.writeString(tmp.resolve("stock.csv"), "section,stock_lengths_mm\nPLANTER-D8,6000;abc\n");
        AppFixtures.Run r = demo("--stock-table", stock.toString());
        assertEquals(2, r.code());
        assertTrue(r.err().contains("stock.csv: line 2: stock_lengths_mm: 'abc' is not a number"), r.err());
        assertEquals(1, r.err().strip().lines().count(), r.err());
    }

    @Test
    void check_planReportWithoutStock_refused() {
        AppFixtures.Run r = demo("--cutting-csv", tmp.resolve("c.csv").toString());
        assertEquals(2, r.code());
        assertTrue(r.err().contains("need --stock, --stock-table or stock columns in the section table"), r.err());
    }

    @Test
    void check_stockColumnsInSectionTable_planWithoutStockOptions() throws Exception {
        // the demo's section table with stock columns added (invented stock: 6 m bars of 8 mm, 25 kg coils of 4 mm)
        Path demo = CorpusJsonTest.repo().resolve("testdata/demo");
        List<String> rows = Files.readAllLines(demo.resolve("garden-planter-section-table.csv"));
        StringBuilder t = new StringBuilder(rows.get(0) + ",stock_lengths_mm,kerf_mm,coil_kg\n");
        for (String row : rows.subList(1, rows.size())) {
            String stock = row.startsWith("PLANTER-D8,") ? ",6000,3," : row.startsWith("PLANTER-D4,") ? ",,0,25" : ",,,";
            t.append(row).append(stock).append('\n');
        }
        Path sections = Files.writeString(tmp.resolve("sections.csv"), t.toString());
        Path plan = tmp.resolve("plan.csv");
        AppFixtures.Run r = AppFixtures.run(new EnginePipeline(), "check", demo.resolve("garden-planter.dxf").toString(),
                "--fail-at", "never", "-q", "--section-table", sections.toString(),
                "--assign-file", demo.resolve("garden-planter-layers.csv").toString(), "--plan-csv", plan.toString());
        assertEquals(0, r.code(), r.err());
        String text = Files.readString(plan);
        // 4.367 m of 8 mm bar in one 6 m bar; the 4 mm wire in one coil (demo README lengths)
        assertTrue(text.contains("\nPLANTER-D4,1,"), text);
        assertTrue(text.contains("\nPLANTER-D8,1,"), text);
        assertTrue(!text.contains("PLANTER-D3"), "the 3 mm row has no stock: not planned\n" + text);
    }
}
