package org.linemass.engine.assemble;

import java.util.Optional;
import org.linemass.engine.field.FieldExpression;
import org.linemass.engine.section.Section;

/**
 * What one layer is made of: its section (may be empty) and its density expression (may be empty;
 * when present it gives the mass instead of the section's constant kg/m).
 */
public record LayerMaterial(String layer, Optional<Section> section, Optional<FieldExpression> field) {

    /** Whether the layer has a mass at all. */
    public boolean hasMass() {
        return section.isPresent() || field.isPresent();
    }
}
