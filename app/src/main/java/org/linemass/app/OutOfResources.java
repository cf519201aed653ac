package org.linemass.app;

import java.util.Locale;
import org.linemass.engine.error.AnalysisException;

/**
 * Turns the JVM running out of heap or stack while a drawing is read or analysed into the one-line
 * input error every other bad input gets: which file, what ran out, and what the user can change.
 * The partly built model is unreachable once the error has unwound to here, so there is room to
 * report it. The error is kept as the cause, so that a caller running drawings side by side can
 * tell it apart and run the drawing again alone.
 */
final class OutOfResources {

    private OutOfResources() {
    }

    /** The error for {@code file} when {@code e} is an out-of-memory or stack-overflow error. */
    static AnalysisException of(java.nio.file.Path file, VirtualMachineError e) {
        return of(file.toString(), e);
    }

    /** As {@link #of(java.nio.file.Path, VirtualMachineError)} for a drawing named {@code file}. */
    static AnalysisException of(String file, VirtualMachineError e) {
        AnalysisException a = new AnalysisException(file + ": " + what(e));
        a.initCause(e);
        return a;
    }

    /** What ran out and how to get further, without a file name (for errors no command caught). */
    static String what(VirtualMachineError e) {
        if (e instanceof StackOverflowError) {
            return "the drawing is nested too deeply for the Java stack; run with LINEMASS_JAVA_OPTS=-Xss64m "
                    + "or lower --limit-block-depth";
        }
        long mb = Runtime.getRuntime().maxMemory() / (1024 * 1024);
        return String.format(Locale.ROOT, "out of memory (Java heap limit %d MB) while reading and analysing the "
                + "drawing; give Java more with LINEMASS_JAVA_OPTS=-Xmx8g (or more), or lower --limit-expanded", mb);
    }
}
