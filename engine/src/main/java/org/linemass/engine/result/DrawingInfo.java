package org.linemass.engine.result;

import org.linemass.drawing.LengthUnit;
import org.linemass.drawing.UnitSource;

/** The drawing as read: file, $ACADVER, units and where they came from. */
public record DrawingInfo(String file, String dxfVersion, boolean binary, LengthUnit unit, UnitSource unitSource) {
}
