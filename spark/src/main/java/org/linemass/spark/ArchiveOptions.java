package org.linemass.spark;

import org.linemass.app.DrawingOptions;
import org.linemass.app.InputProblem;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/**
 * The job's arguments: input path, file-name glob, output path, its own options, and every drawing
 * option of {@code check} ({@link DrawingOptions}, the same class, so the same names, defaults and
 * checks). Parsed on the driver and again in each task, from the same strings.
 */
@Command(name = "linemass-spark", description = "check on every drawing of an archive, run by Apache Spark.")
final class ArchiveOptions {

    /** What a usage error adds after its message. */
    static final String USAGE = "usage: linemass-spark INPUT GLOB OUTPUT [--csv] [--task-bytes N] "
            + "[--max-drawing-bytes N] [drawing options of linemass check]";

    @Parameters(index = "0", paramLabel = "INPUT", description = "Folder of drawings (searched recursively) or one "
            + "file, as any Spark file source reads it: a local path, hdfs://, s3a://, abfss://, gs://.")
    String input;

    @Parameters(index = "1", paramLabel = "GLOB", description = "Which file names are drawings, e.g. '*.dxf' "
            + "(Hadoop glob on the file name, case-sensitive: '*.[dD][xX][fF]' for any case).")
    String glob;

    @Parameters(index = "2", paramLabel = "OUTPUT", description = "Folder the tables are written to (each table a "
            + "sub-folder, replaced when it exists).")
    String output;

    @Option(names = "--csv", description = "Write the tables as CSV with a header line instead of Parquet.")
    boolean csv;

    @Option(names = "--task-bytes", paramLabel = "N", description = "Drawing bytes one task reads at most "
            + "(default ${DEFAULT-VALUE}); each drawing also counts an eighth of this, so about eight small "
            + "drawings share a task and a big one has a task to itself.")
    long taskBytes = 8L << 20;

    @Option(names = "--max-drawing-bytes", paramLabel = "N", description = "Drawings larger than this are not read "
            + "but listed as failed (default ${DEFAULT-VALUE}, the largest binary record Spark reads).")
    long maxDrawingBytes = Integer.MAX_VALUE;

    @Mixin
    DrawingOptions drawing = new DrawingOptions();

    /** Parses {@code args}; a usage error or a bad value is an {@link InputProblem} with a one-line message. */
    static ArchiveOptions parse(String... args) throws InputProblem {
        ArchiveOptions o = new ArchiveOptions();
        try {
            new CommandLine(o).setCaseInsensitiveEnumValuesAllowed(true).parseArgs(args);
        } catch (CommandLine.ParameterException e) {
            throw new InputProblem(e.getMessage() + " (" + USAGE + ")");
        }
        if (o.taskBytes < 1) {
            throw new InputProblem("--task-bytes must be 1 or more, got " + o.taskBytes);
        }
        if (o.maxDrawingBytes < 0 || o.maxDrawingBytes > Integer.MAX_VALUE) {
            throw new InputProblem("--max-drawing-bytes must be between 0 and " + Integer.MAX_VALUE + ", got "
                    + o.maxDrawingBytes);
        }
        if (o.glob.isEmpty()) {
            throw new InputProblem("GLOB is empty; give the drawings' file names, e.g. '*.dxf'");
        }
        return o;
    }
}
