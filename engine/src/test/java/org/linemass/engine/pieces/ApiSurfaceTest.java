package org.linemass.engine.pieces;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.IOException;
import java.lang.reflect.Constructor;
import java.lang.reflect.Field;
import java.lang.reflect.Method;
import java.lang.reflect.Modifier;
import java.net.URISyntaxException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;

/**
 * House rule (STYLE.md, "The shape of the house"): JTS and Commons Math types stay inside the
 * engine packages that use them and never appear in a public signature of the pieces stage.
 */
class ApiSurfaceTest {

    private static final List<String> FOREIGN = List.of("org.locationtech.", "org.apache.commons.math3.");

    @Test
    void noPublicSignatureMentionsJtsOrCommonsMath() throws IOException, URISyntaxException, ClassNotFoundException {
        Path root = Path.of(PieceAnalyzer.class.getProtectionDomain().getCodeSource().getLocation().toURI());
        Path dir = root.resolve("org/linemass/engine/pieces");
        List<String> offending = new ArrayList<>();
        int classes = 0;
        try (Stream<Path> files = Files.walk(dir)) {
            for (Path f : files.filter(p -> p.toString().endsWith(".class")).toList()) {
                String name = root.relativize(f).toString().replace('/', '.').replace(".class", "");
                Class<?> c = Class.forName(name);
                classes++;
                if (!Modifier.isPublic(c.getModifiers())) {
                    continue;
                }
                for (Method m : c.getDeclaredMethods()) {
                    if (Modifier.isPublic(m.getModifiers())) {
                        check(offending, c, m.toGenericString());
                    }
                }
                for (Constructor<?> k : c.getDeclaredConstructors()) {
                    if (Modifier.isPublic(k.getModifiers())) {
                        check(offending, c, k.toGenericString());
                    }
                }
                for (Field fd : c.getDeclaredFields()) {
                    if (Modifier.isPublic(fd.getModifiers())) {
                        check(offending, c, fd.toGenericString());
                    }
                }
            }
        }
        assertEquals(true, classes > 20, "scanned the compiled pieces classes: " + classes);
        assertEquals(List.of(), offending);
    }

    private static void check(List<String> offending, Class<?> c, String signature) {
        for (String f : FOREIGN) {
            if (signature.contains(f)) {
                offending.add(c.getName() + ": " + signature);
            }
        }
    }
}
