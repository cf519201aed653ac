package org.linemass.reports.io;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.LinkOption;
import java.nio.file.Path;

/**
 * An output file name resolved once, the way the file system resolves it: the folder part is
 * walked name by name from the root, each existing name replaced by its real path (so a symbolic
 * link to a folder is followed <em>before</em> a following {@code ..} is applied, as the operating
 * system does), then the file name is appended. The guard ({@link OutputGuard}) and the writer
 * ({@link AtomicWrite}) both use {@link #resolved()}, so what is checked is what is written.
 *
 * <p>An output whose name is itself a symbolic link is refused: linemass never writes through a
 * link (it would replace whatever file the link points to, or replace the link by a regular file);
 * the message names the link and its target. A name that is a folder, or {@code .} or {@code ..},
 * is refused too.
 *
 * @param given the path as the user gave it (for messages)
 * @param resolved the absolute path that is checked and written
 */
public record OutputPath(Path given, Path resolved) {

    /**
     * Resolves {@code given}.
     *
     * @throws IOException with a one-line message naming {@code given} when it is a folder or a
     *         symbolic link, or when a folder on the way cannot be resolved
     */
    public static OutputPath of(Path given) throws IOException {
        Path abs = given.toAbsolutePath();
        Path name = abs.getFileName();
        if (name == null || name.toString().equals(".") || name.toString().equals("..")) {
            throw new IOException(given + " is a folder; give a file name");
        }
        Path folder = realFolder(abs.getParent());
        Path target = folder.resolve(name);
        if (Files.isSymbolicLink(target)) {
            String to;
            try {
                to = Files.readSymbolicLink(target).toString();
            } catch (IOException e) {
                to = "?";
            }
            throw new IOException(given + " is a symbolic link (to " + to + "); linemass does not write through "
                    + "links: give the file it points to, or remove the link");
        }
        if (Files.isDirectory(target, LinkOption.NOFOLLOW_LINKS)) {
            throw new IOException(given + " is a folder; give a file name");
        }
        return new OutputPath(given, target);
    }

    /**
     * The real path of folder {@code abs}: from the root, each name that exists is replaced by
     * its real path; once a name does not exist (a folder the writer will create), later names
     * are appended and {@code ..} removes the last one, which is then exact because nothing below
     * a missing folder can be a link.
     */
    static Path realFolder(Path abs) throws IOException {
        Path current = abs.getRoot();
        for (Path part : abs) {
            String s = part.toString();
            if (s.equals(".")) {
                continue;
            }
            if (s.equals("..")) {
                Path up = current.getParent();
                current = up == null ? current : up;
                continue;
            }
            Path next = current.resolve(part);
            current = Files.exists(next) ? next.toRealPath() : next;
        }
        return current;
    }

    @Override
    public String toString() {
        return given.toString();
    }
}
