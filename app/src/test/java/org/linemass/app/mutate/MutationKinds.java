package org.linemass.app.mutate;

import java.util.ArrayList;
import java.util.List;

/**
 * Every mutation kind the campaign draws from, with equal chance. <b>To add a kind</b>: write it
 * as a {@link Mutation} (for group-level changes {@link GroupKinds#pairs} does the parsing), in a
 * class of its own for a family of kinds, and add it to {@link #all} below; give it a stable name,
 * which the figures and the saved failure inputs use.
 */
public final class MutationKinds {

    private MutationKinds() {
    }

    /** All kinds; {@code seeds} are available to kinds that combine two drawings. */
    public static List<Mutation> all(List<Seed> seeds) {
        List<Mutation> all = new ArrayList<>();
        all.addAll(ByteKinds.all(seeds));
        all.addAll(GroupKinds.all());
        all.addAll(HostileModelKinds.all());
        // more families of kinds go here
        return List.copyOf(all);
    }
}
