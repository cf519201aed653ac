package org.linemass.engine.section;

import java.util.ArrayList;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;

/**
 * An immutable table of sections keyed by id (ids compare case-insensitively). Later tables
 * override earlier rows with the same id when combined with {@link #overriddenBy}.
 */
public final class SectionTable {

    private final Map<String, Section> rows;

    private SectionTable(Map<String, Section> rows) {
        this.rows = Collections.unmodifiableMap(rows);
    }

    /** A table of the given rows; IllegalArgumentException when an id appears twice. */
    public static SectionTable of(List<Section> sections) {
        Map<String, Section> m = new LinkedHashMap<>();
        for (Section s : sections) {
            if (m.put(key(s.id()), s) != null) {
                throw new IllegalArgumentException("section id " + s.id() + " appears twice");
            }
        }
        return new SectionTable(m);
    }

    public static SectionTable empty() {
        return new SectionTable(new LinkedHashMap<>());
    }

    public Optional<Section> find(String id) {
        return Optional.ofNullable(rows.get(key(id)));
    }

    public List<Section> rows() {
        return new ArrayList<>(rows.values());
    }

    /** This table with the rows of {@code other} added, replacing rows with the same id. */
    public SectionTable overriddenBy(SectionTable other) {
        Map<String, Section> m = new LinkedHashMap<>(rows);
        m.putAll(other.rows);
        return new SectionTable(m);
    }

    private static String key(String id) {
        return id.trim().toUpperCase(Locale.ROOT);
    }
}
