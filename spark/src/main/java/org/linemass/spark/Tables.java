package org.linemass.spark;

import static org.apache.spark.sql.types.DataTypes.DoubleType;
import static org.apache.spark.sql.types.DataTypes.IntegerType;
import static org.apache.spark.sql.types.DataTypes.LongType;
import static org.apache.spark.sql.types.DataTypes.StringType;

import org.apache.spark.sql.types.DataTypes;
import org.apache.spark.sql.types.StructField;
import org.apache.spark.sql.types.StructType;

/**
 * The tables the job writes, by folder name under the output path, and their columns. Numbers come
 * twice: as doubles in SI units ({@code _m}, {@code _kg}) for queries, and as the text
 * {@code check}'s CSV reports print ({@code _text}, metric units, the same {@code UnitSystem}
 * formatting), which is what the comparison with the command line checks byte for byte. Text from
 * the drawing is stored as it is (the CSV reports' guard against spreadsheet formulas is a CSV
 * matter). A drawing that failed has one row in {@link #DRAWINGS} and none in the other tables.
 */
public final class Tables {

    /** One row per drawing: status, message, totals, counts. */
    public static final String DRAWINGS = "drawings";
    /** One row per layer of each drawing analysed. */
    public static final String LAYERS = "layers";
    /** The bill of materials: one row per mark of each drawing analysed. */
    public static final String BILL = "bill";
    /** One row per finding of each drawing analysed, numbered from 1 in each drawing. */
    public static final String FINDINGS = "findings";
    /** The bill of all drawings together: one row per section and material. */
    public static final String COMBINED_BILL = "combined_bill";

    /** Status of a drawing whose analysis hit a bug (an internal error); {@code check} would stop there. */
    public static final String INTERNAL_ERROR = "internal_error";

    static final StructType LAYER = new StructType(new StructField[] {
        field("layer", StringType), field("section", StringType), field("pieces", IntegerType),
        field("length_m", DoubleType), field("drawn_length_m", DoubleType), field("mass_kg", DoubleType),
        field("cog_x_m", DoubleType), field("cog_y_m", DoubleType), field("cog_z_m", DoubleType),
        field("cog_of", StringType), field("error_bound_m", DoubleType),
        field("length_text", StringType), field("drawn_length_text", StringType), field("mass_text", StringType),
    });

    static final StructType MARK = new StructType(new StructField[] {
        field("mark", StringType), field("quantity", IntegerType), field("section", StringType),
        field("material", StringType), field("length_each_m", DoubleType), field("bends_each", IntegerType),
        field("mass_each_kg", DoubleType), field("mass_total_kg", DoubleType), field("layer", StringType),
        field("length_total_m", DoubleType),
        field("cut_length_each_text", StringType), field("mass_each_text", StringType),
        field("mass_total_text", StringType), field("cut_length_total_text", StringType),
    });

    static final StructType FINDING = new StructType(new StructField[] {
        field("number", IntegerType), field("kind", StringType), field("severity", StringType),
        field("x_m", DoubleType), field("y_m", DoubleType), field("z_m", DoubleType), field("size_m", DoubleType),
        field("layer", StringType), field("mass_kg", DoubleType), field("entities", StringType),
        field("message", StringType),
        field("x_text", StringType), field("y_text", StringType), field("z_text", StringType),
        field("size_text", StringType), field("mass_text", StringType),
    });

    /** The summary columns of a drawing, in the order of {@link #DRAWINGS}. */
    static final StructType SUMMARY = new StructType(new StructField[] {
        field("drawing", StringType), field("path", StringType), field("bytes", LongType),
        field("status", StringType), field("message", StringType),
        field("length_m", DoubleType), field("mass_kg", DoubleType),
        field("pieces", IntegerType), field("marks", IntegerType),
        field("errors", LongType), field("warnings", LongType), field("notes", LongType),
        field("seconds", DoubleType), field("length_text", StringType), field("mass_text", StringType),
    });

    /** What an executor hands back per drawing: the summary columns and the drawing's rows of the other tables. */
    static final StructType ANALYSED = withNested(SUMMARY);

    static final StructType COMBINED = new StructType(new StructField[] {
        field("section", StringType), field("material", StringType), field("drawings", LongType),
        field("quantity", LongType), field("length_total_m", DoubleType), field("mass_total_kg", DoubleType),
        field("cut_length_total_text", StringType), field("mass_total_text", StringType),
    });

    private Tables() {
    }

    private static StructType withNested(StructType summary) {
        return summary
                .add("layers", DataTypes.createArrayType(LAYER, false), false)
                .add("bill", DataTypes.createArrayType(MARK, false), false)
                .add("findings", DataTypes.createArrayType(FINDING, false), false);
    }

    private static StructField field(String name, org.apache.spark.sql.types.DataType type) {
        return DataTypes.createStructField(name, type, true);
    }
}
