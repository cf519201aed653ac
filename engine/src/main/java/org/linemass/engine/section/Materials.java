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

    /**
     * What to say about a material id that is not built in: the closest built-in ids (by edit
     * distance, at most three, those within half the text's length) and where the whole list is.
     */
    public static String unknownMessage(String id) {
        String key = id.trim().toLowerCase(Locale.ROOT);
        List<String> near = TABLE.keySet().stream()
                .filter(k -> k.contains(key) && !key.isEmpty() || editDistance(k, key) <= Math.max(2, key.length() / 2))
                .sorted(java.util.Comparator.comparingInt((String k) -> editDistance(k, key)).thenComparing(k -> k))
                .limit(3).toList();
        return "unknown material '" + id + "'" + (near.isEmpty() ? "" : "; near: " + String.join(", ", near))
                + " ('linemass materials' lists them all)";
    }

    /** Levenshtein distance: insertions, deletions and substitutions of one character each cost 1. */
    static int editDistance(String a, String b) {
        int[] prev = new int[b.length() + 1];
        int[] cur = new int[b.length() + 1];
        for (int j = 0; j <= b.length(); j++) {
            prev[j] = j;
        }
        for (int i = 1; i <= a.length(); i++) {
            cur[0] = i;
            for (int j = 1; j <= b.length(); j++) {
                int sub = prev[j - 1] + (a.charAt(i - 1) == b.charAt(j - 1) ? 0 : 1);
                cur[j] = Math.min(sub, Math.min(prev[j], cur[j - 1]) + 1);
            }
            int[] t = prev;
            prev = cur;
            cur = t;
        }
        return prev[b.length()];
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
