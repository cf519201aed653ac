package org.linemass.engine.pieces.dedup;

import java.util.Locale;
import org.linemass.geometry.Provenance;

/** A sortable text of a provenance, so ties are broken by source order, not by input order. */
final class Ranks {

    private Ranks() {
    }

    static String of(Provenance p) {
        return String.format(Locale.ROOT, "%s|%010d|%s|%s|%s", p.file(), p.line(), p.handle(), p.entityType(),
                String.join(">", p.blockPath()));
    }
}
