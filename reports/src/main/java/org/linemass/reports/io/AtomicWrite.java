package org.linemass.reports.io;

import java.io.IOException;
import java.io.OutputStream;
import java.nio.channels.Channels;
import java.nio.channels.FileChannel;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.StandardOpenOption;

/**
 * Writes a file so that readers see either the previous content or the complete new content,
 * never half a file: the content goes to a temporary file in the target's directory, is forced to
 * disk, and is then moved over the target with {@link StandardCopyOption#ATOMIC_MOVE} (falling back
 * to {@link StandardCopyOption#REPLACE_EXISTING} where the file system cannot move atomically).
 * When the content producer fails, the temporary file is deleted and the target is untouched.
 */
public final class AtomicWrite {

    /** Produces the file content. */
    @FunctionalInterface
    public interface Content {
        void writeTo(OutputStream out) throws IOException;
    }

    private AtomicWrite() {
    }

    /** Writes {@code content} to {@code target} atomically; creates missing parent folders. */
    public static void write(Path target, Content content) throws IOException {
        Path abs = target.toAbsolutePath().normalize();
        Path dir = abs.getParent();
        Files.createDirectories(dir);
        Path tmp = Files.createTempFile(dir, "." + abs.getFileName() + ".", ".part");
        boolean moved = false;
        try {
            try (FileChannel ch = FileChannel.open(tmp, StandardOpenOption.WRITE, StandardOpenOption.TRUNCATE_EXISTING)) {
                OutputStream out = Channels.newOutputStream(ch);
                content.writeTo(out);
                out.flush();
                ch.force(true);
            }
            try {
                Files.move(tmp, abs, StandardCopyOption.ATOMIC_MOVE);
            } catch (AtomicMoveNotSupportedException e) {
                Files.move(tmp, abs, StandardCopyOption.REPLACE_EXISTING);
            }
            moved = true;
        } finally {
            if (!moved) {
                Files.deleteIfExists(tmp);
            }
        }
    }
}
