package org.linemass.importer.entity;

import java.util.List;
import org.linemass.geometry.Provenance;
import org.linemass.geometry.Segment;
import org.linemass.geometry.Straight;
import org.linemass.importer.read.Record;

/** LINE: start 10/20/30 to end 11/21/31 in world coordinates. A zero-length line is kept. */
final class LineConverter {

    private LineConverter() {
    }

    static void convert(Record r, Provenance p, List<Segment> out) throws EntitySkip {
        out.add(new Straight(Values.point(r, 10), Values.point(r, 11), p));
    }
}
