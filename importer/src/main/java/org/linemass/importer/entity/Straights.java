package org.linemass.importer.entity;

import java.util.List;
import org.linemass.geometry.PackedSegments;
import org.linemass.geometry.Provenance;
import org.linemass.geometry.Segment;
import org.linemass.geometry.Straight;

/**
 * Appends a straight to a converter's output. When the output is the importer's packing builder the
 * straight goes in as its six coordinates, never built as an object: most of a large drawing's
 * segments are straights, and this is the importer's hottest path.
 */
final class Straights {

    private Straights() {
    }

    static void add(List<Segment> out, double ax, double ay, double az, double bx, double by, double bz,
            Provenance p) {
        if (out instanceof PackedSegments.Builder packed) {
            packed.addStraight(ax, ay, az, bx, by, bz, p);
        } else {
            out.add(new Straight(ax, ay, az, bx, by, bz, p));
        }
    }
}
