package org.linemass.app.serve;

/**
 * What one server accepts: the largest upload (bytes), drawings and bytes of drawings held per
 * session, the number of sessions (browser tabs) at once, and how long an idle session is kept.
 */
public record ServeLimits(long maxUploadBytes, int maxDrawings, long maxSessionBytes, int maxSessions,
        long idleMillis) {

    /** 512 MiB uploads (a large real drawing), 50 drawings and 2 GiB per tab, 16 tabs, 2 hours idle. */
    public static final ServeLimits DEFAULTS = new ServeLimits(512L << 20, 50, 2L << 30, 16, 2 * 3600_000L);

    public ServeLimits {
        if (maxUploadBytes <= 0 || maxDrawings <= 0 || maxSessionBytes <= 0 || maxSessions <= 0 || idleMillis <= 0) {
            throw new IllegalArgumentException("server limits must be positive, got upload " + maxUploadBytes
                    + ", drawings " + maxDrawings + ", session bytes " + maxSessionBytes + ", sessions " + maxSessions
                    + ", idle ms " + idleMillis);
        }
    }

    /** {@code bytes} for a person: "512 MB", "1.5 kB". */
    static String size(long bytes) {
        if (bytes < 1024) {
            return bytes + " bytes";
        }
        String[] units = {"kB", "MB", "GB", "TB"};
        double v = bytes;
        int u = -1;
        while (v >= 1024 && u < units.length - 1) {
            v /= 1024;
            u++;
        }
        String n = v == Math.rint(v) ? Long.toString((long) v) : String.format(java.util.Locale.ROOT, "%.1f", v);
        return n + " " + units[u];
    }
}
