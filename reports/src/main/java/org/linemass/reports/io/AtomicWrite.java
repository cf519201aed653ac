package org.linemass.reports.io;

import java.io.IOException;
import java.io.OutputStream;
import java.nio.channels.Channels;
import java.nio.channels.FileChannel;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.DirectoryStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.StandardOpenOption;
import java.util.Locale;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Writes a file so that readers see either the previous content or the complete new content,
 * never half a file: the content goes to a temporary file in the target's folder, is forced to
 * disk, and is then moved over the target with {@link StandardCopyOption#ATOMIC_MOVE} (falling back
 * to {@link StandardCopyOption#REPLACE_EXISTING} where the file system cannot move atomically).
 * When the content producer fails, the temporary file is deleted and the target is untouched.
 *
 * <p>Temporaries are named {@code .NAME.linemass-PID-NNN.part}, with the writing process's id.
 * A run that is killed cannot delete its temporary; the next write into that folder deletes
 * every such temporary whose process is no longer alive ({@link #removeStale}).
 *
 * <p>A failure of the file system (no space left, quota, read-only) is reported as an
 * {@link IOException} whose one-line message names the target, says what happened in lower case
 * and that the previous file is kept.
 */
public final class AtomicWrite {

    /** Produces the file content. */
    @FunctionalInterface
    public interface Content {
        void writeTo(OutputStream out) throws IOException;
    }

    /** Temporaries of any target written by any linemass process: group 1 is the process id. */
    static final Pattern TEMPORARY = Pattern.compile("\\..*\\.linemass-(\\d+)-\\d+\\.part");

    private AtomicWrite() {
    }

    /** Resolves {@code target} with {@link OutputPath#of} and writes it (see the class comment). */
    public static void write(Path target, Content content) throws IOException {
        write(OutputPath.of(target), content);
    }

    /** Writes {@code content} to {@code target} atomically; creates missing parent folders. */
    public static void write(OutputPath target, Content content) throws IOException {
        prepare(target, content).commit();
    }

    /**
     * A file written to its temporary and forced to disk, not yet moved into place: {@link #commit}
     * moves it over the target, {@link #discard} deletes it. Lets a run write all its reports
     * first and put them in place only when every one of them succeeded.
     */
    public static final class Staged {
        private final OutputPath target;
        private final Path tmp;
        private boolean done;

        private Staged(OutputPath target, Path tmp) {
            this.target = target;
            this.tmp = tmp;
        }

        public OutputPath target() {
            return target;
        }

        /** Moves the temporary over the target. */
        public void commit() throws IOException {
            if (done) {
                throw new IllegalStateException("already committed or discarded: " + target);
            }
            done = true;
            try {
                try {
                    Files.move(tmp, target.resolved(), StandardCopyOption.ATOMIC_MOVE);
                } catch (AtomicMoveNotSupportedException e) {
                    Files.move(tmp, target.resolved(), StandardCopyOption.REPLACE_EXISTING);
                }
            } catch (IOException e) {
                Files.deleteIfExists(tmp);
                throw failure(target, e);
            }
        }

        /** Deletes the temporary; the target stays as it was. Never throws. */
        public void discard() {
            if (!done) {
                done = true;
                try {
                    Files.deleteIfExists(tmp);
                } catch (IOException e) {
                    // a later run removes it (removeStale)
                }
            }
        }
    }

    /**
     * Writes {@code content} to a temporary beside {@code target} and forces it to disk; the
     * target is not touched until {@link Staged#commit}. When writing fails the temporary is
     * deleted and the exception propagates.
     */
    public static Staged prepare(OutputPath target, Content content) throws IOException {
        Path abs = target.resolved();
        Path dir = abs.getParent();
        Path tmp;
        try {
            Files.createDirectories(dir);
            removeStale(dir);
            tmp = newTemporary(dir, "." + abs.getFileName() + ".linemass-" + ProcessHandle.current().pid() + "-");
        } catch (IOException e) {
            throw failure(target, e);
        }
        boolean written = false;
        try {
            try (FileChannel ch = FileChannel.open(tmp, StandardOpenOption.WRITE, StandardOpenOption.TRUNCATE_EXISTING)) {
                OutputStream out = Channels.newOutputStream(ch);
                content.writeTo(out);
                out.flush();
                ch.force(true);
            } catch (java.nio.file.FileSystemException e) {
                throw failure(target, e);
            } catch (IOException e) {
                if (isFileSystemFailure(e)) {
                    throw failure(target, e);
                }
                throw e;
            }
            written = true;
            return new Staged(target, tmp);
        } finally {
            if (!written) {
                Files.deleteIfExists(tmp);
            }
        }
    }

    /** Numbers the temporaries of this process (several outputs in one folder, several threads). */
    private static final java.util.concurrent.atomic.AtomicLong TEMPORARIES = new java.util.concurrent.atomic.AtomicLong();

    /**
     * Creates an empty temporary {@code prefix + N + ".part"} in {@code dir}. Created without explicit
     * permissions, so the file gets the user's usual ones (the process umask), as the report file
     * moved from it then has; {@link Files#createTempFile} would make every report owner-only (0600).
     */
    private static Path newTemporary(Path dir, String prefix) throws IOException {
        while (true) {
            Path p = dir.resolve(prefix + TEMPORARIES.incrementAndGet() + ".part");
            try {
                Files.newByteChannel(p, StandardOpenOption.CREATE_NEW, StandardOpenOption.WRITE).close();
                return p;
            } catch (java.nio.file.FileAlreadyExistsException e) {
                // left by an earlier process with the same id: take the next number
            }
        }
    }

    /**
     * Deletes the linemass temporaries in {@code dir} whose writing process has ended (a killed
     * run). Temporaries of live processes (another run writing now) are left alone. Best effort:
     * a temporary that cannot be deleted is left.
     */
    public static void removeStale(Path dir) {
        try (DirectoryStream<Path> ds = Files.newDirectoryStream(dir, ".*.linemass-*.part")) {
            long me = ProcessHandle.current().pid();
            for (Path p : ds) {
                Matcher m = TEMPORARY.matcher(p.getFileName().toString());
                if (!m.matches()) {
                    continue;
                }
                long pid;
                try {
                    pid = Long.parseLong(m.group(1));
                } catch (NumberFormatException e) {
                    continue;
                }
                boolean alive = pid == me || ProcessHandle.of(pid).map(ProcessHandle::isAlive).orElse(false);
                if (!alive) {
                    try {
                        Files.deleteIfExists(p);
                    } catch (IOException e) {
                        // left for a later run; never a reason to fail this one
                    }
                }
            }
        } catch (IOException | RuntimeException e) {
            // listing failed: nothing to clean
        }
    }

    /** True for the operating system's own messages for a full or refused file system. */
    private static boolean isFileSystemFailure(IOException e) {
        String m = e.getMessage() == null ? "" : e.getMessage().toLowerCase(Locale.ROOT);
        return m.contains("no space left") || m.contains("quota") || m.contains("read-only file system")
                || m.contains("input/output error") || m.contains("file too large");
    }

    /** One line: target, what the file system said (lower case), and that the old file is kept. */
    static IOException failure(OutputPath target, IOException e) {
        String reason;
        if (e instanceof java.nio.file.FileSystemException f && f.getReason() != null) {
            reason = f.getReason();
        } else if (e instanceof java.nio.file.AccessDeniedException) {
            reason = "permission denied";
        } else if (e instanceof java.nio.file.FileSystemException) {
            reason = e.getClass().getSimpleName().replace("Exception", "").replaceAll("([a-z])([A-Z])", "$1 $2");
        } else {
            reason = e.getMessage() == null ? e.getClass().getSimpleName() : e.getMessage();
        }
        reason = reason.toLowerCase(Locale.ROOT).strip();
        IOException out = new IOException(target.given() + ": cannot write the file: " + reason
                + "; the previous file, if any, is kept");
        out.initCause(e);
        return out;
    }
}
