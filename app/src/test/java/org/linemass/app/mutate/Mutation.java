package org.linemass.app.mutate;

import java.util.Random;

/**
 * One kind of mutation: from a seed drawing and a random source, a mutant's bytes. Must be
 * deterministic for a given {@code Random} state, so a campaign is reproduced by its seed.
 */
public interface Mutation {

    /** Stable name, used in the figures and in the names of saved failure inputs. */
    String name();

    /**
     * The mutant, or null when this kind does not apply to the seed (a group-level kind on a
     * binary drawing, say); the campaign then draws another kind.
     */
    byte[] apply(Seed seed, Random rnd);

    /**
     * The mutant with what else its run needs: extra command-line arguments and a reference
     * check of the report. By default the bytes of {@link #apply} alone; kinds that need more
     * override this (and may leave {@link #apply} to call it).
     */
    default Mutant make(Seed seed, Random rnd) {
        byte[] b = apply(seed, rnd);
        return b == null ? null : new Mutant(b, java.util.List.of(), null);
    }

    /** A mutation from a name and a function. */
    static Mutation of(String name, java.util.function.BiFunction<Seed, Random, byte[]> f) {
        return new Mutation() {
            @Override
            public String name() {
                return name;
            }

            @Override
            public byte[] apply(Seed seed, Random rnd) {
                return f.apply(seed, rnd);
            }
        };
    }
}
