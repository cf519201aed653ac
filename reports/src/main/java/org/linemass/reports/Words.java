package org.linemass.reports;

/** Small wording helpers shared by the writers, so every format says "1 finding" and "2 findings" alike. */
public final class Words {

    private Words() {
    }

    /** {@code n} and the noun, with an "s" unless {@code n} is one: "1 mark", "0 marks", "12 marks". */
    public static String count(long n, String noun) {
        return n + " " + noun + (n == 1 ? "" : "s");
    }

    /**
     * Splits text into lines of at most {@code width} characters at spaces (a word longer than the
     * width is cut), for console text that must fit a terminal.
     */
    public static java.util.List<String> wrap(String text, int width) {
        if (width < 1) {
            throw new IllegalArgumentException("wrap width " + width);
        }
        java.util.List<String> out = new java.util.ArrayList<>();
        String rest = text;
        while (rest.length() > width) {
            int cut = rest.lastIndexOf(' ', width);
            if (cut <= 0) {
                cut = width;
            }
            out.add(rest.substring(0, cut).stripTrailing());
            rest = rest.substring(cut).stripLeading();
        }
        out.add(rest);
        return out;
    }
}
