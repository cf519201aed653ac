package org.linemass.importer.entity;

import java.util.List;
import org.linemass.geometry.Provenance;
import org.linemass.geometry.Segment;
import org.linemass.importer.read.Record;

/**
 * LWPOLYLINE: vertices 10/20 in the OCS of 210/220/230 at elevation 38, each followed by its
 * optional bulge 42 for the piece to the next vertex; flag 70 bit 1 closes the polyline with the
 * last vertex's bulge (FACTS.md §7.2). Widths are ignored. The vertex count 90, when given, must
 * match the vertices present; some writers leave it out, and then the vertices present are read
 * (a missing count is not a count of zero).
 */
final class LwPolylineConverter {

    private LwPolylineConverter() {
    }

    static void convert(Record r, Provenance p, int maxVertices, List<Segment> out) throws EntitySkip {
        boolean counted = r.indexOf(90) >= 0;
        int declared = Values.count(r, 90, "vertex count");
        if (declared > maxVertices) {
            throw new EntitySkip("declares " + declared + " vertices, more than the limit " + maxVertices);
        }
        int flags = Values.integer(r, 70, 0, "flags");
        double elevation = Values.coordinate(r.num(38, 0), 38);
        Ocs.Frame frame = Ocs.frame(Values.extrusion(r));
        int given = 0;
        for (int i = 0; i < r.size(); i++) {
            if (r.code(i) == 10) {
                given++;
            }
        }
        if (!counted) {
            if (given > maxVertices) {
                throw new EntitySkip("has " + given + " vertices, more than the limit " + maxVertices);
            }
            declared = given;
        } else if (given != declared) {
            throw new EntitySkip("declares " + declared + " vertices but has " + given);
        }
        // validate every value before the first piece, then emit pieces straight from the record
        boolean seen = false;
        for (int i = 0; i < r.size(); i++) {
            int code = r.code(i);
            if (code == 10) {
                seen = true;
                Values.coordinate(r.num(i), 10);
            } else if (seen && code == 20) {
                Values.coordinate(r.num(i), 20);
            } else if (seen && code == 42) {
                Values.real(r.num(i), 42, "bulge");
            }
        }
        if (declared < 2) {
            return;
        }
        double x0 = 0;
        double y0 = 0;
        double px = 0;
        double py = 0;
        double pb = 0;
        double x = 0;
        double y = 0;
        double b = 0;
        int k = -1;
        for (int i = 0; i <= r.size(); i++) {
            int code = i < r.size() ? r.code(i) : 10;
            if (code == 10) {
                // the vertex read so far is complete: keep the first, emit the piece that ends in it
                if (k == 0) {
                    x0 = x;
                    y0 = y;
                } else if (k > 0) {
                    Bulge.append(px, py, x, y, elevation, pb, frame, p, out);
                }
                px = x;
                py = y;
                pb = b;
                k++;
                if (i < r.size()) {
                    x = r.num(i);
                    y = 0;
                    b = 0;
                }
            } else if (k >= 0 && code == 20) {
                y = r.num(i);
            } else if (k >= 0 && code == 42) {
                b = r.num(i);
            }
        }
        if ((flags & 1) != 0) {
            Bulge.append(px, py, x0, y0, elevation, pb, frame, p, out);
        }
    }
}
