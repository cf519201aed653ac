package org.linemass.engine.result;

import java.util.Locale;

/** How much a finding matters; ordered from least to most serious. */
public enum Severity {
    INFO, WARNING, ERROR;

    public String jsonName() {
        return name().toLowerCase(Locale.ROOT);
    }

    public boolean atLeast(Severity other) {
        return compareTo(other) >= 0;
    }

    public static Severity parse(String text) {
        return valueOf(text.trim().toUpperCase(Locale.ROOT));
    }
}
