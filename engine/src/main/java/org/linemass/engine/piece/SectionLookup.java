package org.linemass.engine.piece;

import java.util.Optional;
import org.linemass.engine.section.Section;

/** The section a layer is made of, if any. */
@FunctionalInterface
public interface SectionLookup {
    Optional<Section> forLayer(String layer);
}
