package org.linemass.plan.cutting;

import java.util.List;
import org.linemass.plan.stock.StockLength;

/**
 * The pieces of one section and the stock they are cut from. Every piece takes its length plus
 * {@code kerfM} from the bar (one cut per piece, so a bar cut exactly to its last piece is charged
 * one kerf more than a saw needs: the safe side); an offcut at least {@code minOffcutM} long is kept.
 */
public record CutProblem(String section, List<Demand> demands, List<StockLength> stock, double kerfM,
        double minOffcutM) {

    public CutProblem {
        demands = List.copyOf(demands);
        stock = List.copyOf(stock);
        if (stock.isEmpty()) {
            throw new IllegalArgumentException("no stock lengths for section " + section);
        }
    }
}
