package org.linemass.importer.entity;

import java.util.ArrayList;
import java.util.List;
import org.linemass.geometry.Provenance;
import org.linemass.geometry.Segment;
import org.linemass.geometry.Vec3;
import org.linemass.importer.read.Record;

/**
 * LEADER: its vertex path, vertices 10/20/30 in world coordinates (DXF Reference, LEADER), vertex
 * count 76 (when given it must match; when left out the vertices present are read). Path type 72:
 * 0 straight pieces between the vertices, 1 a spline through them, read as the interpolating
 * cubic of {@link FitSplineInterpolator} (the convention SPLINE fit points use here; two vertices
 * give the straight between them).
 */
final class LeaderConverter {

    private LeaderConverter() {
    }

    static void convert(Record r, Provenance p, int maxVertices, List<Segment> out) throws EntitySkip {
        List<Vec3> v = new ArrayList<>();
        for (int i = 0; i < r.size(); i++) {
            if (r.code(i) == 10) {
                if (v.size() == maxVertices) {
                    throw new EntitySkip("has more than " + maxVertices + " vertices");
                }
                v.add(SplineConverter.pointAt(r, i, r.size()));
            }
        }
        if (r.indexOf(76) >= 0) {
            int declared = Values.count(r, 76, "vertex count");
            if (declared != v.size()) {
                throw new EntitySkip("declares " + declared + " vertices but has " + v.size());
            }
        }
        int path = Values.integer(r, 72, 0, "path type");
        if (v.size() < 2) {
            return;
        }
        if (path == 1 && v.size() > 2) {
            out.add(FitSplineInterpolator.interpolate(v.toArray(new Vec3[0]), null, null, p));
            return;
        }
        for (int i = 0; i + 1 < v.size(); i++) {
            Vec3 a = v.get(i);
            Vec3 b = v.get(i + 1);
            Straights.add(out, a.x(), a.y(), a.z(), b.x(), b.y(), b.z(), p);
        }
    }
}
