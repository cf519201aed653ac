package org.linemass.importer.entity;

import java.util.ArrayList;
import java.util.List;
import org.linemass.importer.read.Record;

/**
 * One MLINESTYLE object of the OBJECTS section (DXF Reference, MLINESTYLE): its name (2), handle
 * (5) and the offset of each element from the centre path (49, one per element, in drawing units
 * before the MLINE's scale). The element count (71), when given, must match the offsets listed; a
 * missing count is not a count of zero. Colours, line types, fill and caps are drawing ornament and
 * are not kept.
 *
 * @param name the style name as written (MLINEs name it in their group 2)
 * @param handle the style's handle (MLINEs point at it with group 340), empty when not given
 * @param offsets the element offsets in file order
 */
public record MlineStyle(String name, String handle, List<Double> offsets) {

    public MlineStyle {
        offsets = List.copyOf(offsets);
    }

    /** Reads an MLINESTYLE record; {@link EntitySkip} when its offsets are unusable. */
    public static MlineStyle read(Record r) throws EntitySkip {
        List<Double> offsets = new ArrayList<>();
        for (int i = 0; i < r.size(); i++) {
            if (r.code(i) == 49) {
                offsets.add(Values.real(r.num(i), 49, "element offset"));
            }
        }
        if (r.indexOf(71) >= 0 && Values.count(r.num(71, 0), 71, "element count") != offsets.size()) {
            throw new EntitySkip("declares " + (long) r.num(71, 0) + " elements but lists " + offsets.size()
                    + " element offsets (group code 49)");
        }
        if (offsets.isEmpty()) {
            throw new EntitySkip("has no element offsets (group code 49)");
        }
        return new MlineStyle(r.str(2, ""), r.handle(), offsets);
    }

    /**
     * The shift that the MLINE's justification (its group 70) adds to every offset: 0 top puts the
     * path on the element of largest offset, 2 bottom on the smallest, 1 zero leaves the offsets.
     */
    double justificationShift(int justification) {
        double max = Double.NEGATIVE_INFINITY;
        double min = Double.POSITIVE_INFINITY;
        for (double o : offsets) {
            max = Math.max(max, o);
            min = Math.min(min, o);
        }
        return switch (justification) {
            case TOP -> -max;
            case BOTTOM -> -min;
            default -> 0;
        };
    }

    /** MLINE justification (group 70): the centre path on the element of largest offset. */
    static final int TOP = 0;
    /** MLINE justification (group 70): the centre path on the element of smallest offset. */
    static final int BOTTOM = 2;
}
