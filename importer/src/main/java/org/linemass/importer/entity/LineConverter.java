package org.linemass.importer.entity;

import java.util.List;
import org.linemass.geometry.Provenance;
import org.linemass.geometry.Segment;
import org.linemass.importer.read.Record;

/** LINE: start 10/20/30 to end 11/21/31 in world coordinates. A zero-length line is kept. */
final class LineConverter {

    private LineConverter() {
    }

    static void convert(Record r, Provenance p, List<Segment> out) throws EntitySkip {
        Straights.add(out, Values.coordinate(r.num(10, 0), 10), Values.coordinate(r.num(20, 0), 20),
                Values.coordinate(r.num(30, 0), 30), Values.coordinate(r.num(11, 0), 11),
                Values.coordinate(r.num(21, 0), 21), Values.coordinate(r.num(31, 0), 31), p);
    }
}
