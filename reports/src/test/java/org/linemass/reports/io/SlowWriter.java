package org.linemass.reports.io;

import java.nio.charset.StandardCharsets;
import java.nio.file.Path;

/** Test helper run in a child JVM: starts an atomic write, says so, then stalls until killed. */
public final class SlowWriter {

    private SlowWriter() {
    }

    public static void main(String[] args) throws Exception {
        AtomicWrite.write(Path.of(args[0]), out -> {
            out.write("half of the new content".getBytes(StandardCharsets.UTF_8));
            out.flush();
            System.out.println("started");
            System.out.flush();
            try {
                Thread.sleep(120_000);
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
            }
        });
    }
}
