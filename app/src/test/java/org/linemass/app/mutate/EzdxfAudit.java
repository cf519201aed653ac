package org.linemass.app.mutate;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.TimeUnit;
import java.util.function.Consumer;

/**
 * Runs {@code scripts/ezdxf-audit} (Python with ezdxf, an independent DXF reader) over pairs of
 * original and marked-up drawings. Python with ezdxf is looked for as {@code python3} and
 * {@code /usr/bin/python3} (the Debian package installs into the system Python).
 */
public final class EzdxfAudit {

    private EzdxfAudit() {
    }

    /** A Python interpreter that can import ezdxf, or null. */
    public static String python() {
        for (String py : new String[] {"python3", "/usr/bin/python3"}) {
            try {
                Process p = new ProcessBuilder(py, "-c", "import ezdxf").redirectErrorStream(true).start();
                p.getInputStream().readAllBytes();
                if (p.waitFor(60, TimeUnit.SECONDS) && p.exitValue() == 0) {
                    return py;
                }
            } catch (IOException e) {
                // not this one
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
                return null;
            }
        }
        return null;
    }

    /** The audit script in the checkout. */
    public static Path script() {
        return Path.of(System.getProperty("linemass.repo", "..")).resolve("scripts/ezdxf-audit");
    }

    /** The script's output lines for the pairs; throws when Python or ezdxf is missing. */
    public static List<String> audit(List<Path[]> pairs) throws IOException {
        String py = python();
        if (py == null) {
            throw new IOException("no Python with ezdxf (apt-get install -y python3-ezdxf)");
        }
        List<String> cmd = new ArrayList<>(List.of(py, script().toString()));
        for (Path[] p : pairs) {
            cmd.add(p[0].toString());
            cmd.add(p[1].toString());
        }
        Process p = new ProcessBuilder(cmd).redirectErrorStream(true).start();
        String out = new String(p.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
        try {
            if (!p.waitFor(600, TimeUnit.SECONDS)) {
                p.destroyForcibly();
                throw new IOException("ezdxf audit did not finish in 600 s");
            }
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new IOException("interrupted", e);
        }
        return out.lines().toList();
    }

    /** Audits the pairs; reports each FAIL line to {@code problems}; returns a one-line summary. */
    static String run(List<Path[]> pairs, Consumer<String> problems) {
        List<String> lines;
        try {
            lines = audit(pairs);
        } catch (IOException e) {
            return "not run: " + e.getMessage();
        }
        int ok = 0;
        int skip = 0;
        int fail = 0;
        for (String l : lines) {
            if (l.startsWith("OK ")) {
                ok++;
            } else if (l.startsWith("SKIP ")) {
                skip++;
            } else if (l.startsWith("FAIL ")) {
                fail++;
                problems.accept("ezdxf-audit: " + l.substring(5).replaceAll("^\\S*/", ""));
            }
        }
        return String.format(Locale.ROOT, "ezdxf on %d marked-up copies: %d accepted, %d failed, %d skipped "
                + "(ezdxf cannot read the mutated original itself)", pairs.size(), ok, fail, skip);
    }
}
