package org.linemass.engine.section;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTimeoutPreemptively;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.time.Duration;
import java.util.regex.Pattern;
import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;
import org.junit.jupiter.api.Test;

/**
 * The glob matcher against java.util.regex as the reference (a general library, which does
 * backtrack), and the pathological patterns that used to take exponential time.
 */
class LayerGlobTest {

    /**
     * Wall-clock cap for the pathological cases. The matcher does at most name x pattern
     * comparisons (1e6 x 4 here, milliseconds); the backtracking matcher it replaces took over
     * 30 s on the 100-character case. 5 s leaves room for a loaded two-core build machine.
     */
    private static final Duration CAP = Duration.ofSeconds(5);

    @Test
    void matches_manyStarsOnLongName_finishesQuickly() {
        String name = "A".repeat(100);
        LayerGlob glob = LayerGlob.of("*A*A*A*A*A*A*B");
        boolean hit = assertTimeoutPreemptively(CAP, () -> glob.matches(name));
        assertFalse(hit);
        assertTrue(LayerGlob.of("*A*A*A*A*A*A*A").matches(name));
    }

    @Test
    void matches_megabyteName_finishesQuickly() {
        String name = "a".repeat(1 << 20);
        boolean miss = assertTimeoutPreemptively(CAP, () -> LayerGlob.of("*A*B").matches(name));
        assertFalse(miss);
        boolean hit = assertTimeoutPreemptively(CAP, () -> LayerGlob.of("*A*a").matches(name));
        assertTrue(hit);
        boolean questions = assertTimeoutPreemptively(CAP,
                () -> LayerGlob.of("*?A?*?A?*B").matches(name));
        assertFalse(questions);
    }

    @Test
    void matches_edgeCases() {
        assertTrue(LayerGlob.of("*").matches(""));
        assertTrue(LayerGlob.of("**").matches("x"));
        assertFalse(LayerGlob.of("?").matches(""));
        assertTrue(LayerGlob.of("a*a").matches("aa"));
        assertFalse(LayerGlob.of("a*a").matches("a"));
        assertTrue(LayerGlob.of("*ab*ab").matches("xabyab"));
        assertFalse(LayerGlob.of("ab*ba").matches("aba"));
        // One '?' is one character, also outside the basic plane (one code point, two chars).
        assertTrue(LayerGlob.of("r?d").matches("r\uD83D\uDE00d"));
        // Case folding is one code point to one, as in String.equalsIgnoreCase: ß is not SS.
        assertFalse(LayerGlob.of("straße").matches("STRASSE"));
    }

    @Provide
    Arbitrary<String> globs() {
        return Arbitraries.strings().withChars("aAb*?").ofMinLength(1).ofMaxLength(8);
    }

    @Provide
    Arbitrary<String> names() {
        return Arbitraries.strings().withChars("aAbB").ofMaxLength(10);
    }

    @Property(tries = 3000)
    void matches_agreesWithRegex(@ForAll("globs") String glob, @ForAll("names") String name) {
        assertEquals(reference(glob).matcher(name).matches(), LayerGlob.of(glob).matches(name),
                () -> glob + " on " + name);
    }

    /** The translation the matcher used before: quoted literals, '.*' and '.'. */
    private static Pattern reference(String glob) {
        StringBuilder re = new StringBuilder();
        for (char c : glob.toCharArray()) {
            re.append(c == '*' ? ".*" : c == '?' ? "." : Pattern.quote(String.valueOf(c)));
        }
        return Pattern.compile(re.toString(),
                Pattern.CASE_INSENSITIVE | Pattern.UNICODE_CASE | Pattern.DOTALL);
    }
}
