package org.linemass.app;

import java.io.IOException;
import java.io.OutputStream;
import java.io.OutputStreamWriter;
import java.io.PrintWriter;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.linemass.reports.Report;
import org.linemass.reports.io.AtomicWrite;
import org.linemass.reports.io.OutputGuard;
import org.linemass.reports.io.OutputPath;
import org.linemass.reports.io.ProtectedFiles;

/**
 * Sends one text report to its target: standard output for {@code -}, otherwise a file written
 * atomically after checking that it is none of the files the run reads ({@link ProtectedFiles}).
 * The output path is resolved once ({@link OutputPath}); the guard and the writer use that path.
 */
final class ReportFiles {

    /** Writes text to a Writer. */
    @FunctionalInterface
    interface TextReport {
        void write(List<Report> reports, Writer out) throws IOException;
    }

    private final PrintWriter stdout;
    private final ProtectedFiles inputs;

    ReportFiles(PrintWriter stdout, ProtectedFiles inputs) {
        this.stdout = stdout;
        this.inputs = inputs;
    }

    /**
     * Refuses an output path that resolves to a file the run reads, a folder or a symbolic link
     * (checked before any work is done); returns the resolved path, or null for standard output.
     */
    OutputPath guard(String target) throws IOException {
        if (target != null && !target.equals(OutputOptions.STDOUT)) {
            return OutputGuard.check(Path.of(target), inputs);
        }
        return null;
    }

    void text(String target, List<Report> reports, TextReport writer) throws IOException {
        text(target, reports, writer, false);
    }

    /**
     * Like {@link #text(String, List, TextReport)}; with {@code byteOrderMark} a file (not standard
     * output) starts with the UTF-8 byte order mark, which spreadsheet programs need to read
     * non-ASCII layer names in a CSV file correctly.
     */
    void text(String target, List<Report> reports, TextReport writer, boolean byteOrderMark) throws IOException {
        if (target == null) {
            return;
        }
        if (target.equals(OutputOptions.STDOUT)) {
            writer.write(reports, stdout);
            stdout.flush();
            return;
        }
        OutputPath p = OutputGuard.check(Path.of(target), inputs);
        AtomicWrite.write(p, os -> {
            Writer w = new OutputStreamWriter(nonClosing(os), StandardCharsets.UTF_8);
            if (byteOrderMark) {
                w.write('\uFEFF');
            }
            writer.write(reports, w);
            w.flush();
        });
    }

    void bytes(Path target, AtomicWrite.Content content) throws IOException {
        if (Files.isDirectory(target)) {
            throw new IOException(target + " is a folder; give a file name for one drawing");
        }
        AtomicWrite.write(OutputGuard.check(target, inputs), content);
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
