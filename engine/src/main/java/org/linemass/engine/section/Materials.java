package org.linemass.engine.section;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;

/**
 * The built-in materials table ({@code materials.csv} beside this class, each row with its source).
 * Ids compare without case; the American spelling {@code aluminum} is accepted for {@code aluminium}.
 * Loaded once; immutable and thread-safe.
 */
public final class Materials {

    private static final Map<String, Material> TABLE = load();

    private Materials() {
    }

    /** Every built-in material in table order. */
    public static List<Material> all() {
        return List.copyOf(TABLE.values());
    }

    /** The material with this id, if built in. */
    public static Optional<Material> find(String id) {
        String key = id.trim().toLowerCase(Locale.ROOT).replace("aluminum", "aluminium");
        return Optional.ofNullable(TABLE.get(key));
    }

    private static Map<String, Material> load() {
        Map<String, Material> m = new LinkedHashMap<>();
        for (CsvRows.Row r : Resources.csv("materials.csv").rows()) {
            Material mat = new Material(r.require("material"), r.require("name"), r.positive("density_kg_m3"),
                    r.require("source"));
            m.put(mat.id().toLowerCase(Locale.ROOT), mat);
        }
        return m;
    }

    /** Reads the built-in CSV resources of this package. */
    static final class Resources {
        private Resources() {
        }

        static CsvRows csv(String name) {
            try (InputStream in = Materials.class.getResourceAsStream(name)) {
                if (in == null) {
                    throw new IllegalStateException("built-in table " + name + " is missing from the engine jar");
                }
                return CsvRows.read(new BufferedReader(new InputStreamReader(in, StandardCharsets.UTF_8)));
            } catch (IOException e) {
                throw new UncheckedIOException("cannot read built-in table " + name, e);
            }
        }
    }
}
