package org.linemass.reports;

/** Small wording helpers shared by the writers, so every format says "1 finding" and "2 findings" alike. */
public final class Words {

    private Words() {
    }

    /** {@code n} and the noun, with an "s" unless {@code n} is one: "1 mark", "0 marks", "12 marks". */
    public static String count(long n, String noun) {
        return n + " " + noun + (n == 1 ? "" : "s");
    }
}
