package org.linemass.reports.io;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

/**
 * The files a run reads and so must never write: input drawings, section tables, layer
 * assignment files and any table added later. Each part of a command that reads a file registers
 * it here with what it is ({@code "input drawing"}, {@code "section table"}, ...) before any
 * report is written; {@link OutputGuard} checks every output against all of them. Thread-safe.
 */
public final class ProtectedFiles {

    /** One registered file. */
    public record Entry(Path path, String role) {
    }

    private final List<Entry> entries = new ArrayList<>();

    /** Registers {@code path} as a file the run reads; {@code role} names it in messages. */
    public synchronized ProtectedFiles add(Path path, String role) {
        entries.add(new Entry(path, role));
        return this;
    }

    /** Registers every path in {@code paths} with the same role. */
    public synchronized ProtectedFiles addAll(List<Path> paths, String role) {
        paths.forEach(p -> entries.add(new Entry(p, role)));
        return this;
    }

    /** The registered files, in the order registered. */
    public synchronized List<Entry> entries() {
        return List.copyOf(entries);
    }

    /**
     * The registered file {@code out} is, or null: same real path, or the same file by identity
     * when both exist (hard links).
     */
    Entry match(Path out) throws IOException {
        for (Entry e : entries()) {
            Path in = e.path().toAbsolutePath();
            boolean same;
            if (Files.exists(in)) {
                same = in.toRealPath().equals(out) || Files.exists(out) && Files.isSameFile(out, in);
            } else {
                same = OutputPath.realFolder(in.getParent()).resolve(in.getFileName()).equals(out);
            }
            if (same) {
                return e;
            }
        }
        return null;
    }
}
