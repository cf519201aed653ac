package org.linemass.app.mutate;

import com.fasterxml.jackson.databind.JsonNode;
import java.util.List;

/**
 * One mutant: its bytes, extra arguments for {@code check} (put before the drawing's name), and
 * an optional reference check of the JSON report of a run that read it.
 *
 * @param bytes the drawing
 * @param args extra command-line arguments, such as a layer rule {@code -a GLOB=SECTION}
 * @param reference null, or a check of the JSON report against a value computed outside the
 *        program (each problem one line starting {@code wrong-bound:})
 */
public record Mutant(byte[] bytes, List<String> args, Reference reference) {

    public Mutant {
        args = List.copyOf(args);
    }

    /** A check of a report against a reference value. */
    @FunctionalInterface
    public interface Reference {
        /**
         * The problems found, empty when the report agrees; null when the report holds nothing to
         * check (the part it checks was not reported, so no comparison was made).
         */
        List<String> check(JsonNode report);
    }
}
