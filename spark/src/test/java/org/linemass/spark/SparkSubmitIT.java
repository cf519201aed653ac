package org.linemass.spark;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.apache.spark.sql.Row;
import org.apache.spark.sql.SparkSession;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The README's line, {@code spark-submit --class org.linemass.spark.ArchiveJob --master local[2]
 * spark/target/linemass-spark.jar IN GLOB OUT}, run after the jar is built: {@code spark-submit}
 * starts {@code org.apache.spark.deploy.SparkSubmit} with these arguments on the classpath of the
 * Spark installation, which this test does directly in a new JVM, with Spark's jars (and no
 * linemass class) on the classpath, so the job can only come from the jar. Check values: the
 * hostile catalogue's message for the refused drawing ({@code testdata/hostile/README.md}).
 */
class SparkSubmitIT {

    /** A generous bound for starting Spark and two drawings on a shared 2-core machine (common practice, no source). */
    private static final long TIMEOUT_MINUTES = 10;

    @TempDir
    Path dir;

    @Test
    void sparkSubmit_readmeLine_writesTables() throws IOException, InterruptedException {
        Path jar = Path.of(System.getProperty("linemass.spark.jar"));
        assumeTrue(Files.exists(jar), jar + " is not built yet; this test runs after package (mvn verify)");
        Path repo = LocalSpark.repo();
        Path in = dir.resolve("in");
        Files.createDirectories(in);
        Files.copy(repo.resolve("testdata/demo/garden-planter.dxf"), in.resolve("garden-planter.dxf"));
        Files.copy(repo.resolve("testdata/hostile/zip-header.dxf"), in.resolve("order-17.dxf"));
        Path out = dir.resolve("out");

        List<String> cmd = new ArrayList<>();
        cmd.add(Path.of(System.getProperty("java.home"), "bin", "java").toString());
        cmd.add("-Xmx1g");
        cmd.addAll(Arrays.asList(System.getProperty("linemass.spark.opens").trim().split("\\s+")));
        cmd.add("-cp");
        cmd.add(Files.readString(Path.of(System.getProperty("linemass.spark.classpath"))).trim());
        cmd.add("org.apache.spark.deploy.SparkSubmit");
        cmd.addAll(List.of("--class", "org.linemass.spark.ArchiveJob", "--master", "local[2]",
                jar.toString(), in.toString(), "*.dxf", out.toString()));
        Path stdout = dir.resolve("stdout.txt");
        Path stderr = dir.resolve("stderr.txt");
        Process p = new ProcessBuilder(cmd).redirectOutput(stdout.toFile()).redirectError(stderr.toFile()).start();
        boolean ended = p.waitFor(TIMEOUT_MINUTES, TimeUnit.MINUTES);
        if (!ended) {
            p.destroyForcibly();
        }
        String err = Files.readString(stderr, StandardCharsets.UTF_8);
        assertTrue(ended, "spark-submit did not end in time: " + err);
        assertEquals(0, p.exitValue(), err);
        assertEquals("linemass-spark: 2 drawings, 1 failed, 1 ok; tables in " + out + "\n",
                Files.readString(stdout, StandardCharsets.UTF_8));
        for (String t : List.of(Tables.DRAWINGS, Tables.LAYERS, Tables.BILL, Tables.FINDINGS, Tables.COMBINED_BILL)) {
            assertTrue(Files.exists(out.resolve(t).resolve("_SUCCESS")), t + " committed");
        }

        SparkSession spark = LocalSpark.start();
        try {
            Row bad = spark.read().parquet(out.resolve(Tables.DRAWINGS).toString())
                    .where("status = 'failed'").first();
            // testdata/hostile/README.md: zip-header.dxf's message, after the path given to the importer
            assertEquals(in.resolve("order-17.dxf") + ": this is a ZIP archive, not a DXF drawing; unpack it and read "
                    + "the DXF file inside", bad.getAs("message"));
        } finally {
            spark.stop();
        }
    }
}
