package org.linemass.app;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.stream.Stream;

/**
 * Expands the command's arguments into drawing files: a file is taken as given; a folder is
 * searched recursively for names ending in {@code .dxf} (any case), in sorted order.
 */
final class InputFiles {

    private InputFiles() {
    }

    static List<Path> collect(List<Path> args) throws InputProblem {
        List<Path> files = new ArrayList<>();
        for (Path a : args) {
            if (Files.isDirectory(a)) {
                List<Path> found;
                try (Stream<Path> walk = Files.walk(a)) {
                    found = walk.filter(Files::isRegularFile)
                            .filter(p -> p.getFileName().toString().toLowerCase(Locale.ROOT).endsWith(".dxf"))
                            .sorted().toList();
                } catch (IOException | java.io.UncheckedIOException e) {
                    throw new InputProblem(a + ": cannot list the folder: " + e.getMessage());
                }
                if (found.isEmpty()) {
                    throw new InputProblem(a + ": no .dxf files in this folder");
                }
                files.addAll(found);
            } else if (Files.isRegularFile(a)) {
                files.add(a);
            } else if (Files.exists(a)) {
                throw new InputProblem(a + ": not a file or folder");
            } else {
                throw new InputProblem(a + ": no such file or folder");
            }
        }
        return files;
    }
}
