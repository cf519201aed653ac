package org.linemass.spark;

import static org.apache.spark.sql.functions.col;
import static org.apache.spark.sql.functions.posexplode;

import java.io.OutputStreamWriter;
import java.io.PrintWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import java.util.function.Supplier;
import java.util.function.UnaryOperator;
import org.apache.spark.api.java.function.ForeachPartitionFunction;
import org.apache.spark.api.java.function.MapFunction;
import org.apache.spark.sql.Column;
import org.apache.spark.sql.DataFrameWriter;
import org.apache.spark.sql.Dataset;
import org.apache.spark.sql.Encoders;
import org.apache.spark.sql.Row;
import org.apache.spark.sql.SaveMode;
import org.apache.spark.sql.SparkSession;
import org.apache.spark.storage.StorageLevel;
import org.linemass.app.DrawingSetup;
import org.linemass.app.InputProblem;
import org.linemass.engine.error.AnalysisException;
import org.linemass.reports.DrawingOutcome;

/**
 * {@code check} over an archive on Apache Spark: {@code spark-submit --class org.linemass.spark.ArchiveJob
 * linemass-spark.jar INPUT GLOB OUTPUT [options]}.
 *
 * <p>Every file under INPUT whose name matches GLOB is read as one binary record (never split) by
 * Spark's {@code binaryFile} source, and analysed in an executor ({@link DrawingAnalysis}). Spark's
 * file source hands the files to tasks largest first, packing small ones together up to
 * {@code --task-bytes} (each file counting an eighth of that on top of its size), so one huge
 * drawing among thousands of small ones gets a task of its own and starts first, while the small
 * ones fill the other cores. The per-drawing rows are kept (memory, then disk) while five tables are
 * written from them through the DataFrame writer, each replacing what its folder held (mode
 * overwrite): a retried task's output is committed once by Spark's output committer, and a re-run
 * into the same OUTPUT replaces the tables rather than adding to them.
 *
 * <p>A drawing that cannot be read is a failed row, never a failed job: the exit code is 0 once
 * the tables are written, and 2 only for bad arguments or an INPUT Spark cannot list.
 */
public final class ArchiveJob {

    private ArchiveJob() {
    }

    /** The spark-submit entry point: the session comes from spark-submit's configuration (master, memory). */
    public static void main(String[] args) {
        PrintWriter out = new PrintWriter(new OutputStreamWriter(System.out, StandardCharsets.UTF_8), true);
        PrintWriter err = new PrintWriter(new OutputStreamWriter(System.err, StandardCharsets.UTF_8), true);
        SparkSession[] session = new SparkSession[1];
        int code;
        try {
            code = run(() -> session[0] = SparkSession.builder().appName("linemass archive job").getOrCreate(),
                    args, out, err);
        } finally {
            if (session[0] != null) {
                session[0].stop();
            }
        }
        if (code != 0) {
            System.exit(code);
        }
    }

    /**
     * Runs the job on the session {@code spark} gives (asked for only once the arguments are good)
     * and returns the exit code; a one-line summary goes to {@code out}, a one-line error to {@code err}.
     */
    public static int run(Supplier<SparkSession> spark, String[] args, PrintWriter out, PrintWriter err) {
        ArchiveOptions options;
        try {
            options = ArchiveOptions.parse(args);
            // the same checks, with the same one-line messages, as check makes of these options
            DrawingSetup.of(options.drawing, UnaryOperator.identity());
        } catch (InputProblem | AnalysisException e) {
            err.println("linemass-spark: " + DrawingSetup.oneLine(e));
            err.flush();
            return 2;
        }
        try {
            Map<String, Long> byStatus = run(spark.get(), options, args);
            long total = byStatus.values().stream().mapToLong(Long::longValue).sum();
            StringBuilder line = new StringBuilder("linemass-spark: " + total + " drawings");
            byStatus.forEach((s, n) -> line.append(", ").append(n).append(' ').append(s));
            out.println(line.append("; tables in ").append(options.output));
            out.flush();
            return 0;
        } catch (InputProblem | org.apache.spark.sql.AnalysisException e) {
            err.println("linemass-spark: " + DrawingSetup.oneLine(e));
            err.flush();
            return 2;
        }
    }

    private static Map<String, Long> run(SparkSession spark, ArchiveOptions options, String[] args)
            throws InputProblem, org.apache.spark.sql.AnalysisException {
        ship(spark, DrawingSetup.filesRead(options.drawing));
        spark.conf().set("spark.sql.files.maxPartitionBytes", Long.toString(options.taskBytes));
        spark.conf().set("spark.sql.files.openCostInBytes", Long.toString(Math.max(1, options.taskBytes / 8)));
        Dataset<Row> files = spark.read().format("binaryFile")
                .option("pathGlobFilter", options.glob)
                .option("recursiveFileLookup", "true")
                .load(options.input);
        long max = options.maxDrawingBytes;
        // the length filter is pushed into the binary file source, so a file too big is never read
        Dataset<Row> analysed = files.filter(col("length").leq(max)).select("path", "length", "content")
                .mapPartitions(new DrawingAnalysis(args), Encoders.row(Tables.ANALYSED));
        MapFunction<Row, Row> tooBig = r -> ResultRows.failed(DrawingAnalysis.displayName(r.getString(0)),
                r.getString(0), r.getLong(1), DrawingOutcome.FAILED, DrawingAnalysis.displayName(r.getString(0))
                        + ": " + r.getLong(1) + " bytes, more than --max-drawing-bytes " + max + "; not read", 0);
        // one task lists the few files over the limit: their rows need no reading
        Dataset<Row> oversized = files.filter(col("length").gt(max)).select("path", "length").coalesce(1)
                .map(tooBig, Encoders.row(Tables.ANALYSED));
        Dataset<Row> persisted = analysed.union(oversized).persist(StorageLevel.MEMORY_AND_DISK());
        try {
            // the analysis itself: every drawing once, in the file source's tasks (largest first)
            persisted.foreachPartition((ForeachPartitionFunction<Row>) rows -> rows.forEachRemaining(r -> { }));
            // the results are small: the tables are written from a few partitions, not one per task
            Dataset<Row> all = persisted.coalesce(Math.max(1, 2 * spark.sparkContext().defaultParallelism()));
            Map<String, Long> byStatus = new TreeMap<>();
            for (Row r : all.groupBy("status").count().collectAsList()) {
                byStatus.put(r.getString(0), r.getLong(1));
            }
            if (byStatus.isEmpty()) {
                throw new InputProblem(options.input + ": no file name matches " + options.glob);
            }
            Column[] summary = java.util.Arrays.stream(Tables.SUMMARY.fieldNames()).map(c -> col(c)).toArray(Column[]::new);
            write(all.select(summary).orderBy("drawing"), options, Tables.DRAWINGS);
            write(nested(all, "layers"), options, Tables.LAYERS);
            write(nested(all, "bill"), options, Tables.BILL);
            write(nested(all, "findings"), options, Tables.FINDINGS);
            write(CombinedBill.of(all), options, Tables.COMBINED_BILL);
            return byStatus;
        } finally {
            persisted.unpersist();
        }
    }

    /** The rows of one nested table with each row's drawing and status first, in drawing order. */
    private static Dataset<Row> nested(Dataset<Row> all, String column) {
        return all.select(col("drawing"), col("status"), posexplode(col(column)).as(new String[] {"row", "r"}))
                .orderBy(col("drawing"), col("row"))
                .select(col("drawing"), col("status"), col("r.*"));
    }

    private static void write(Dataset<Row> table, ArchiveOptions options, String name) {
        String target = options.output.replaceAll("/+$", "") + "/" + name;
        DataFrameWriter<Row> w = table.write().mode(SaveMode.Overwrite);
        if (options.csv) {
            w.option("header", "true").csv(target);
        } else {
            w.parquet(target);
        }
    }

    /**
     * Sends the section table and assignment files to every executor ({@code SparkContext.addFile});
     * the tasks find them by file name, so two of them may not share one.
     */
    private static void ship(SparkSession spark, List<Path> files) throws InputProblem {
        Map<String, Path> byName = new HashMap<>();
        for (Path p : files) {
            Path other = byName.put(p.getFileName().toString(), p);
            if (other != null && !other.toAbsolutePath().equals(p.toAbsolutePath())) {
                throw new InputProblem(other + " and " + p + " have the same file name; the job ships them to the "
                        + "executors by name, so copy one under another name");
            }
        }
        for (Path p : byName.values()) {
            spark.sparkContext().addFile(p.toAbsolutePath().toString());
        }
    }
}
