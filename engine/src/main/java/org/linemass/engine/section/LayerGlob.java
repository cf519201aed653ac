package org.linemass.engine.section;

import java.util.regex.Pattern;

/**
 * A layer-name pattern with {@code *} (any run of characters) and {@code ?} (one character),
 * matched against the whole name, case-insensitively (layer names in DXF compare without case).
 * Every other character is literal. Immutable.
 */
public final class LayerGlob {

    private final String text;
    private final Pattern pattern;

    private LayerGlob(String text, Pattern pattern) {
        this.text = text;
        this.pattern = pattern;
    }

    /** Compiles a glob; IllegalArgumentException for an empty pattern. */
    public static LayerGlob of(String glob) {
        if (glob == null || glob.isEmpty()) {
            throw new IllegalArgumentException("empty layer pattern");
        }
        StringBuilder re = new StringBuilder();
        StringBuilder literal = new StringBuilder();
        for (char c : glob.toCharArray()) {
            if (c == '*' || c == '?') {
                if (literal.length() > 0) {
                    re.append(Pattern.quote(literal.toString()));
                    literal.setLength(0);
                }
                re.append(c == '*' ? ".*" : ".");
            } else {
                literal.append(c);
            }
        }
        if (literal.length() > 0) {
            re.append(Pattern.quote(literal.toString()));
        }
        return new LayerGlob(glob, Pattern.compile(re.toString(),
                Pattern.CASE_INSENSITIVE | Pattern.UNICODE_CASE | Pattern.DOTALL));
    }

    public boolean matches(String layer) {
        return pattern.matcher(layer).matches();
    }

    @Override
    public String toString() {
        return text;
    }
}
