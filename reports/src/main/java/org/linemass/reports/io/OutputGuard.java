package org.linemass.reports.io;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Collection;

/**
 * Refuses output paths that are an input drawing: compared by real path (symbolic links and
 * {@code ..} resolved), and by file identity when both exist (hard links).
 */
public final class OutputGuard {

    private OutputGuard() {
    }

    /**
     * @throws IOException naming both paths when {@code output} resolves to one of {@code inputs}
     */
    public static void check(Path output, Collection<Path> inputs) throws IOException {
        Path out = realOrResolved(output);
        for (Path in : inputs) {
            Path inReal = realOrResolved(in);
            boolean same = out.equals(inReal)
                    || Files.exists(output) && Files.exists(in) && Files.isSameFile(output, in);
            if (same) {
                throw new IOException("refusing to write " + output + ": it is the input drawing " + in);
            }
        }
    }

    /**
     * The real path of {@code p} when it exists; otherwise the real path of its nearest existing
     * ancestor with the remaining names appended (so a new file in a linked folder still compares).
     */
    static Path realOrResolved(Path p) throws IOException {
        Path abs = p.toAbsolutePath();
        if (Files.exists(abs)) {
            return abs.toRealPath();
        }
        Path existing = abs.getParent();
        while (existing != null && !Files.exists(existing)) {
            existing = existing.getParent();
        }
        if (existing == null) {
            return abs;
        }
        return existing.toRealPath().resolve(existing.relativize(abs)).normalize();
    }
}
