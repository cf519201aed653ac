package org.linemass.reports.io;

import java.io.IOException;
import java.nio.file.Path;

/**
 * Refuses output paths that are a file the run reads ({@link ProtectedFiles}): compared by real
 * path, with the output resolved by {@link OutputPath} exactly as the writer will use it, and by
 * file identity when both exist (hard links).
 */
public final class OutputGuard {

    private OutputGuard() {
    }

    /**
     * @throws IOException naming the output and the protected file when they are the same file
     */
    public static void check(OutputPath output, ProtectedFiles inputs) throws IOException {
        ProtectedFiles.Entry hit = inputs.match(output.resolved());
        if (hit != null) {
            throw new IOException("refusing to write " + output.given() + ": it is the " + hit.role() + " "
                    + hit.path() + " read by this run");
        }
    }

    /** Resolves {@code output} and checks it; returns the resolved path for the writer. */
    public static OutputPath check(Path output, ProtectedFiles inputs) throws IOException {
        OutputPath p = OutputPath.of(output);
        check(p, inputs);
        return p;
    }
}
