package org.linemass.importer.entity;

import java.util.List;
import org.linemass.geometry.Affine;
import org.linemass.geometry.Provenance;
import org.linemass.geometry.Segment;
import org.linemass.geometry.Vec3;
import org.linemass.importer.read.Record;

/**
 * LWPOLYLINE: vertices 10/20 in the OCS of 210/220/230 at elevation 38, each followed by its
 * optional bulge 42 for the piece to the next vertex; flag 70 bit 1 closes the polyline with the
 * last vertex's bulge (FACTS.md §7.2). Widths are ignored. The vertex count 90 must match.
 */
final class LwPolylineConverter {

    private LwPolylineConverter() {
    }

    static void convert(Record r, Provenance p, int maxVertices, List<Segment> out) throws EntitySkip {
        int declared = Values.count(r, 90, "vertex count");
        if (declared > maxVertices) {
            throw new EntitySkip("declares " + declared + " vertices, more than the limit " + maxVertices);
        }
        int flags = Values.integer(r, 70, 0, "flags");
        double elevation = Values.coordinate(r.num(38, 0), 38);
        Ocs.Frame frame = Ocs.frame(Values.extrusion(r));
        Affine ocs = frame.map();
        int given = 0;
        for (int i = 0; i < r.size(); i++) {
            if (r.code(i) == 10) {
                given++;
            }
        }
        if (given != declared) {
            throw new EntitySkip("declares " + declared + " vertices but has " + given);
        }
        double[] xs = new double[Math.max(declared, 1)];
        double[] ys = new double[xs.length];
        double[] bs = new double[xs.length];
        int k = -1;
        for (int i = 0; i < r.size(); i++) {
            int code = r.code(i);
            if (code == 10) {
                k++;
                if (k >= declared) {
                    throw new EntitySkip("declares " + declared + " vertices but has more");
                }
                xs[k] = Values.coordinate(r.num(i), 10);
            } else if (k >= 0 && code == 20) {
                ys[k] = Values.coordinate(r.num(i), 20);
            } else if (k >= 0 && code == 42) {
                bs[k] = Values.real(r.num(i), 42, "bulge");
            }
        }
        int count = k + 1;
        if (count != declared) {
            throw new EntitySkip("declares " + declared + " vertices but has " + count);
        }
        // neighbouring pieces share their joint point objects (less memory, exact same coordinates)
        Vec3 first = count > 0 ? ocs.apply(new Vec3(xs[0], ys[0], elevation)) : null;
        Vec3 a = first;
        for (int i = 0; i + 1 < count; i++) {
            Vec3 e = ocs.apply(new Vec3(xs[i + 1], ys[i + 1], elevation));
            out.add(Bulge.piece(xs[i], ys[i], xs[i + 1], ys[i + 1], elevation, bs[i], frame, p, a, e));
            a = e;
        }
        if ((flags & 1) != 0 && count > 1) {
            int l = count - 1;
            out.add(Bulge.piece(xs[l], ys[l], xs[0], ys[0], elevation, bs[l], frame, p, a, first));
        }
    }
}
