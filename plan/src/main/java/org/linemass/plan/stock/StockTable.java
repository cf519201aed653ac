package org.linemass.plan.stock;

import java.util.List;
import java.util.Locale;
import java.util.Optional;

/**
 * Stock rows in file order; {@link #forSection} finds the last row whose pattern matches a section
 * name (case-insensitive, {@code *} any run of characters, {@code ?} one), so a general {@code *}
 * row first and particular rows after it behave as a user expects.
 */
public record StockTable(List<SectionStock> rows) {

    public StockTable {
        rows = List.copyOf(rows);
    }

    /** The stock for {@code section}, or empty when no row matches. */
    public Optional<SectionStock> forSection(String section) {
        if (section == null) {
            return Optional.empty();
        }
        SectionStock found = null;
        for (SectionStock s : rows) {
            if (matches(s.sectionPattern().toLowerCase(Locale.ROOT), section.toLowerCase(Locale.ROOT))) {
                found = s;
            }
        }
        return Optional.ofNullable(found);
    }

    /** Glob match of lower-cased texts without backtracking blow-up: pieces between stars placed leftmost. */
    public static boolean matches(String pattern, String name) {
        int p = 0;
        int n = 0;
        int star = -1;
        int mark = 0;
        while (n < name.length()) {
            if (p < pattern.length() && (pattern.charAt(p) == '?' || pattern.charAt(p) == name.charAt(n))) {
                p++;
                n++;
            } else if (p < pattern.length() && pattern.charAt(p) == '*') {
                star = p++;
                mark = n;
            } else if (star >= 0) {
                p = star + 1;
                n = ++mark;
            } else {
                return false;
            }
        }
        while (p < pattern.length() && pattern.charAt(p) == '*') {
            p++;
        }
        return p == pattern.length();
    }
}
