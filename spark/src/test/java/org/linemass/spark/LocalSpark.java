package org.linemass.spark;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import org.apache.spark.sql.SparkSession;

/** A Spark session in local mode with two worker threads, as the tests use it; and running the job on it. */
final class LocalSpark {

    private LocalSpark() {
    }

    static SparkSession start() {
        return SparkSession.builder().master("local[2]").appName("linemass-spark test")
                .config("spark.ui.enabled", "false")
                // few shuffle partitions: the tables of a test are a few hundred rows
                .config("spark.sql.shuffle.partitions", "4")
                .getOrCreate();
    }

    /** What one run of the job gave: exit code, standard output and standard error. */
    record Run(int code, String out, String err) {
    }

    static Run job(SparkSession spark, String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int code = ArchiveJob.run(() -> spark, args, new PrintWriter(out), new PrintWriter(err));
        return new Run(code, out.toString(), err.toString());
    }

    /** The repository's root folder (the one holding importer/ and pom.xml). */
    static Path repo() {
        String p = System.getProperty("linemass.repo");
        Path d = p != null ? Path.of(p) : Path.of("").toAbsolutePath();
        while (d != null && !(Files.isDirectory(d.resolve("importer")) && Files.exists(d.resolve("pom.xml")))) {
            d = d.getParent();
        }
        return d;
    }
}
