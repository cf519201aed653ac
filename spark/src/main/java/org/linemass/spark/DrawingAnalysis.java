package org.linemass.spark;

import java.nio.file.Path;
import java.util.Iterator;
import java.util.function.UnaryOperator;
import org.apache.spark.SparkFiles;
import org.apache.spark.api.java.function.MapPartitionsFunction;
import org.apache.spark.sql.Row;
import org.linemass.app.DrawingSetup;
import org.linemass.app.EnginePipeline;
import org.linemass.app.InputProblem;
import org.linemass.engine.error.AnalysisException;
import org.linemass.importer.DxfInputException;
import org.linemass.reports.DrawingOutcome;
import org.linemass.reports.Report;

/**
 * The executor side: each binary record (path, length, content) of a task's partition becomes one
 * row of {@link Tables#ANALYSED}, read and analysed by {@link EnginePipeline}, what {@code check}
 * runs. Records are taken one at a time as the writer asks for rows, so a task holds one drawing
 * and its model at a time. A drawing that cannot be read or analysed (the project's input errors,
 * running out of heap or stack among them) is a {@code failed} row with {@code check}'s one-line
 * message; any other exception is a bug and is recorded as an {@link Tables#INTERNAL_ERROR} row.
 * Neither stops the task. The settings are built once per task from the job's arguments, with the
 * section table and assignment files read from the copies Spark shipped ({@link SparkFiles}).
 */
final class DrawingAnalysis implements MapPartitionsFunction<Row, Row> {

    private static final long serialVersionUID = 1L;

    private final String[] args;

    /** @param args the job's arguments, parsed again in each task */
    DrawingAnalysis(String[] args) {
        this.args = args.clone();
    }

    @Override
    public Iterator<Row> call(Iterator<Row> files) throws InputProblem, AnalysisException {
        ArchiveOptions options = ArchiveOptions.parse(args);
        UnaryOperator<Path> shipped = p -> Path.of(SparkFiles.get(p.getFileName().toString()));
        DrawingSetup setup = DrawingSetup.of(options.drawing, shipped);
        EnginePipeline pipeline = new EnginePipeline();
        return new Iterator<>() {
            @Override
            public boolean hasNext() {
                return files.hasNext();
            }

            @Override
            public Row next() {
                return analyse(files.next(), pipeline, setup);
            }
        };
    }

    private static Row analyse(Row file, EnginePipeline pipeline, DrawingSetup setup) {
        String path = file.getAs("path");
        long bytes = file.<Long>getAs("length");
        byte[] content = file.getAs("content");
        String name = displayName(path);
        long t0 = System.nanoTime();
        try {
            Report r = pipeline.analyse(name, content, setup.importOptions(), setup.settings());
            return ResultRows.analysed(path, bytes, DrawingOutcome.of(r, System.nanoTime() - t0));
        } catch (DxfInputException | AnalysisException e) {
            return ResultRows.failed(name, path, bytes, DrawingOutcome.FAILED, DrawingSetup.oneLine(e),
                    System.nanoTime() - t0);
        } catch (RuntimeException e) {
            String what = e.getClass().getSimpleName() + ": " + DrawingSetup.oneLine(e);
            return ResultRows.failed(name, path, bytes, Tables.INTERNAL_ERROR, name + ": internal error (" + what
                    + "); please report it with the drawing and the job's arguments", System.nanoTime() - t0);
        }
    }

    /**
     * The drawing's name in the tables and messages: for a local file its path, as {@code check}
     * names a file it found in a folder given by its absolute path; else the path Spark gives.
     */
    static String displayName(String sparkPath) {
        java.net.URI uri = new org.apache.hadoop.fs.Path(sparkPath).toUri();
        if ("file".equals(uri.getScheme()) || uri.getScheme() == null) {
            return Path.of(uri.getPath()).toString();
        }
        return sparkPath;
    }
}
