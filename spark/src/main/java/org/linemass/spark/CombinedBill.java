package org.linemass.spark;

import static org.apache.spark.sql.functions.col;
import static org.apache.spark.sql.functions.explode;

import java.math.BigDecimal;
import java.util.HashSet;
import java.util.Iterator;
import java.util.Set;
import org.apache.spark.api.java.function.MapFunction;
import org.apache.spark.api.java.function.MapGroupsFunction;
import org.apache.spark.sql.Dataset;
import org.apache.spark.sql.Encoders;
import org.apache.spark.sql.Row;
import org.apache.spark.sql.RowFactory;
import org.linemass.reports.UnitSystem;
import scala.Tuple2;

/**
 * The bill of all drawings together: per section and material (marks without either are summed
 * under an empty one, as {@code check}'s combined bill does), the number of drawings, the quantity,
 * the cut length total and the mass total (null when no mark of the group has a mass). Sums are
 * exact (each double converted to a {@link BigDecimal} without rounding, rounded once at the end),
 * so they do not depend on the order in which Spark's tasks meet the rows, and a re-run gives the
 * same bits; {@code check}'s compensated sums agree with them to well below the printed decimals.
 */
final class CombinedBill {

    private CombinedBill() {
    }

    /** The combined bill of {@code analysed} (rows of {@link Tables#ANALYSED}), sorted by section and material. */
    static Dataset<Row> of(Dataset<Row> analysed) {
        Dataset<Row> marks = analysed.select(col("drawing"), explode(col("bill")).as("m"))
                .select(col("drawing"), col("m.section"), col("m.material"), col("m.quantity"),
                        col("m.length_total_m"), col("m.mass_total_kg"));
        MapFunction<Row, Tuple2<String, String>> key = r -> new Tuple2<>(orEmpty(r.getString(1)), orEmpty(r.getString(2)));
        MapGroupsFunction<Tuple2<String, String>, Row, Row> sum = CombinedBill::group;
        return marks.groupByKey(key, Encoders.tuple(Encoders.STRING(), Encoders.STRING()))
                .mapGroups(sum, Encoders.row(Tables.COMBINED))
                .orderBy(col("section"), col("material"));
    }

    private static Row group(Tuple2<String, String> key, Iterator<Row> rows) {
        Set<String> drawings = new HashSet<>();
        long quantity = 0;
        BigDecimal length = BigDecimal.ZERO;
        BigDecimal mass = null;
        while (rows.hasNext()) {
            Row r = rows.next();
            drawings.add(r.getString(0));
            quantity += r.getInt(3);
            length = length.add(new BigDecimal(r.getDouble(4)));
            if (!r.isNullAt(5)) {
                mass = (mass == null ? BigDecimal.ZERO : mass).add(new BigDecimal(r.getDouble(5)));
            }
        }
        double lengthM = length.doubleValue();
        Double massKg = mass == null ? null : mass.doubleValue();
        UnitSystem units = UnitSystem.METRIC;
        return RowFactory.create(key._1(), key._2(), (long) drawings.size(), quantity, lengthM, massKg,
                units.longLength(lengthM), units.mass(massKg));
    }

    private static String orEmpty(String s) {
        return s == null ? "" : s;
    }
}
