package org.linemass.app;

import java.io.File;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.util.Map;
import java.util.concurrent.TimeUnit;
import org.linemass.reports.console.ConsoleReport;

/**
 * The width of the terminal the console report is printed on, in characters: {@code $COLUMNS}
 * when it is set to a number (the user's own choice, also for output to a file), else, on an
 * interactive terminal, the columns {@code stty size} reads from {@code /dev/tty}, else
 * {@value ConsoleReport#DEFAULT_WIDTH}. Values are kept between {@value #MIN} and {@value #MAX}
 * so a broken setting cannot squeeze the tables into one letter a line.
 */
final class TerminalWidth {

    static final int MIN = 40;
    static final int MAX = 400;
    /** How long {@code stty} may take before the default is used, ms. */
    private static final long STTY_WAIT_MS = 2000;

    private TerminalWidth() {
    }

    static int of(boolean terminal) {
        return of(System.getenv(), terminal ? TerminalWidth::stty : () -> 0);
    }

    /** As {@link #of(boolean)} with the environment and the terminal query given (tests). */
    static int of(Map<String, String> env, java.util.function.IntSupplier tty) {
        String columns = env.get("COLUMNS");
        if (columns != null && columns.trim().matches("[0-9]{1,6}")) {
            return clamp(Integer.parseInt(columns.trim()));
        }
        int t = tty.getAsInt();
        return t > 0 ? clamp(t) : ConsoleReport.DEFAULT_WIDTH;
    }

    private static int clamp(int w) {
        return Math.max(MIN, Math.min(MAX, w));
    }

    /** The columns {@code stty size} gives for /dev/tty, or 0 when it cannot tell. */
    private static int stty() {
        File tty = new File("/dev/tty");
        if (!tty.exists()) {
            return 0;
        }
        try {
            Process p = new ProcessBuilder("stty", "size").redirectInput(tty)
                    .redirectError(ProcessBuilder.Redirect.DISCARD).start();
            if (!p.waitFor(STTY_WAIT_MS, TimeUnit.MILLISECONDS)) {
                p.destroyForcibly();
                return 0;
            }
            String[] rc = new String(p.getInputStream().readAllBytes(), StandardCharsets.US_ASCII).trim().split("\\s+");
            return p.exitValue() == 0 && rc.length == 2 && rc[1].matches("[0-9]{1,6}") ? Integer.parseInt(rc[1]) : 0;
        } catch (IOException e) {
            return 0; // no stty on this system: the default width
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            return 0;
        }
    }
}
