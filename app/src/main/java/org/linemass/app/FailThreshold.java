package org.linemass.app;

import java.util.List;
import java.util.Locale;
import org.linemass.engine.result.Finding;
import org.linemass.engine.result.Severity;

/** The finding severity at which {@code check} exits with 1; NEVER keeps it at 0. */
public enum FailThreshold {
    INFO(Severity.INFO), WARNING(Severity.WARNING), ERROR(Severity.ERROR), NEVER(null);

    private final Severity severity;

    FailThreshold(Severity severity) {
        this.severity = severity;
    }

    /** True when some finding is at or above this threshold. */
    public boolean tripped(List<Finding> findings) {
        return severity != null && findings.stream().anyMatch(f -> f.severity().atLeast(severity));
    }

    static FailThreshold parse(String text) {
        String t = text == null ? "" : text.trim().toUpperCase(Locale.ROOT);
        for (FailThreshold f : values()) {
            if (f.name().equals(t)) {
                return f;
            }
        }
        throw new IllegalArgumentException("'" + text + "' is not a severity (use info, warning, error or never)");
    }
}
