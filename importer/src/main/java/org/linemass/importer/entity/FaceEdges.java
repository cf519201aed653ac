package org.linemass.importer.entity;

import java.util.List;
import org.linemass.geometry.Provenance;
import org.linemass.geometry.Segment;
import org.linemass.geometry.Vec3;
import org.linemass.importer.read.Record;

/**
 * The visible edges of a 3DFACE as straights, read only on request (wireframe models written as
 * faces): corners 10, 11, 12, 13 in world coordinates (DXF Reference, 3DFACE; a triangle repeats
 * its third corner as the fourth), edges corner 1-2, 2-3, 3-4, 4-1, edge k left out when bit k of
 * flag 70 (1, 2, 4, 8) marks it invisible. Zero-length edges (the triangle's repeated corner) are
 * not added. An edge two faces share is added once for each face.
 */
public final class FaceEdges {

    private FaceEdges() {
    }

    /** True for the entity types whose edges this class reads. */
    public static boolean isFace(String type) {
        return type.equals("3DFACE");
    }

    public static void convert(Record r, Provenance p, List<Segment> out) throws EntitySkip {
        Vec3[] c = {Values.point(r, 10), Values.point(r, 11), Values.point(r, 12), Values.point(r, 13)};
        if (r.indexOf(13) < 0) {
            c[3] = c[2];
        }
        int flags = Values.integer(r, 70, 0, "invisible edge flags");
        for (int k = 0; k < 4; k++) {
            Vec3 a = c[k];
            Vec3 b = c[(k + 1) % 4];
            if ((flags & (1 << k)) != 0 || a.equals(b)) {
                continue;
            }
            Straights.add(out, a.x(), a.y(), a.z(), b.x(), b.y(), b.z(), p);
        }
    }
}
