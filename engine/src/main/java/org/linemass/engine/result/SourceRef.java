package org.linemass.engine.result;

import java.util.List;
import org.linemass.geometry.Provenance;

/** A reference to one DXF entity: line number, handle (may be empty), type and block path. */
public record SourceRef(int line, String handle, String entityType, List<String> blockPath) {

    public SourceRef {
        blockPath = List.copyOf(blockPath);
    }

    public static SourceRef of(Provenance p) {
        return new SourceRef(p.line(), p.handle(), p.entityType(), p.blockPath());
    }
}
