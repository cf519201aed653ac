package org.linemass.app;

import java.io.IOException;
import java.io.OutputStream;
import java.io.OutputStreamWriter;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.linemass.reports.io.AtomicWrite;
import org.linemass.reports.io.OutputGuard;
import org.linemass.reports.io.OutputPath;
import org.linemass.reports.io.ProtectedFiles;

/**
 * The report files of one run, written in two steps so that a run that fails writes no report:
 * {@link #text} and {@link #bytes} write each report to a temporary beside its target (or, for
 * {@code -}, to a buffer for standard output); {@link #commit} then moves every file into place
 * and prints the buffer, and {@link #discard} drops them all. Every target is checked first: it
 * must be none of the files the run reads ({@link ProtectedFiles}), and its path is resolved once
 * ({@link OutputPath}) so that the guard and the writer use the same path.
 */
final class ReportFiles {

    /** Writes text about some items (reports, or outcomes of a run) to a Writer. */
    @FunctionalInterface
    interface TextReport<T> {
        void write(List<T> items, Writer out) throws IOException;
    }

    private final PrintWriter stdout;
    private final ProtectedFiles inputs;
    private final List<AtomicWrite.Staged> staged = new ArrayList<>();
    private final StringWriter toStdout = new StringWriter();

    ReportFiles(PrintWriter stdout, ProtectedFiles inputs) {
        this.stdout = stdout;
        this.inputs = inputs;
    }

    /**
     * Refuses an output path that resolves to a file the run reads, a folder or a symbolic link
     * (checked before any work is done), and removes what killed runs left in its folder; returns
     * the resolved path, or null for standard output.
     */
    OutputPath guard(String target) throws IOException {
        if (target != null && !target.equals(OutputOptions.STDOUT)) {
            OutputPath p = OutputGuard.check(Path.of(target), inputs);
            if (Files.isDirectory(p.resolved().getParent())) {
                AtomicWrite.removeStale(p.resolved().getParent());
            }
            return p;
        }
        return null;
    }

    /**
     * Start-up clean-up: removes the temporaries that killed runs left in the folders of
     * {@code targets} (and in a target that is a folder, for marked-up copies). Never fails.
     */
    static void removeStale(List<String> targets) {
        for (String t : targets) {
            if (t.equals(OutputOptions.STDOUT)) {
                continue;
            }
            Path p = Path.of(t).toAbsolutePath();
            if (Files.isDirectory(p)) {
                AtomicWrite.removeStale(p);
            }
            if (p.getParent() != null && Files.isDirectory(p.getParent())) {
                AtomicWrite.removeStale(p.getParent());
            }
        }
    }

    <T> void text(String target, List<T> reports, TextReport<T> writer) throws IOException {
        text(target, reports, writer, false);
    }

    /**
     * Like {@link #text(String, List, TextReport)}; with {@code byteOrderMark} a file (not standard
     * output) starts with the UTF-8 byte order mark, which spreadsheet programs need to read
     * non-ASCII layer names in a CSV file correctly.
     */
    <T> void text(String target, List<T> reports, TextReport<T> writer, boolean byteOrderMark) throws IOException {
        if (target == null) {
            return;
        }
        if (target.equals(OutputOptions.STDOUT)) {
            writer.write(reports, toStdout);
            return;
        }
        OutputPath p = OutputGuard.check(Path.of(target), inputs);
        staged.add(AtomicWrite.prepare(p, os -> {
            Writer w = new OutputStreamWriter(nonClosing(os), StandardCharsets.UTF_8);
            if (byteOrderMark) {
                w.write('\uFEFF');
            }
            writer.write(reports, w);
            w.flush();
        }));
    }

    void bytes(Path target, AtomicWrite.Content content) throws IOException {
        if (Files.isDirectory(target)) {
            throw new IOException(target + " is a folder; give a file name for one drawing");
        }
        staged.add(AtomicWrite.prepare(OutputGuard.check(target, inputs), content));
    }

    /** Moves every written report into place, then prints the standard-output report, if any. */
    void commit() throws IOException {
        for (int i = 0; i < staged.size(); i++) {
            try {
                staged.get(i).commit();
            } catch (IOException e) {
                staged.subList(i + 1, staged.size()).forEach(AtomicWrite.Staged::discard);
                throw e;
            }
        }
        staged.clear();
        if (!toStdout.getBuffer().isEmpty()) {
            stdout.write(toStdout.toString());
            stdout.flush();
        }
    }

    /** Drops every report written so far; no target is touched. */
    void discard() {
        staged.forEach(AtomicWrite.Staged::discard);
        staged.clear();
        toStdout.getBuffer().setLength(0);
    }

    private static OutputStream nonClosing(OutputStream os) {
        return new java.io.FilterOutputStream(os) {
            @Override
            public void write(byte[] b, int off, int len) throws IOException {
                out.write(b, off, len);
            }

            @Override
            public void close() throws IOException {
                flush();
            }
        };
    }
}
