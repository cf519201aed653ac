package org.linemass.importer.entity;

import java.util.ArrayList;
import java.util.List;
import org.linemass.geometry.Provenance;
import org.linemass.geometry.Segment;
import org.linemass.geometry.Vec3;
import org.linemass.importer.read.Record;

/**
 * MLINE: one wire per element line of its style (DXF Reference, MLINE). The centre path is the
 * vertices 11/21/31 (world coordinates), each followed by its segment direction 12/22/32, its
 * miter direction 13/23/33 and, per style element, a parameter count 74 and parameters 41 (then
 * fill parameters 75/42, not used). An element's point at a vertex is the vertex moved along the
 * miter direction by the element's first parameter: the distance the writer derived from the
 * MLINESTYLE element offset (49) times the MLINE's scale (40), already along the miter, so corners
 * keep the element parallel to the path. Flag 71 bit 2 closes each element back to its first point.
 * Vertex and element counts 72 and 73 must match when given.
 */
final class MlineConverter {

    private static final int CLOSED = 2;

    private MlineConverter() {
    }

    static void convert(Record r, Provenance p, int maxVertices, List<Segment> out) throws EntitySkip {
        List<Vec3> vertices = new ArrayList<>();
        List<Vec3> miters = new ArrayList<>();
        List<List<Double>> offsets = new ArrayList<>();
        List<Double> current = null;
        int paramsLeft = 0;
        for (int i = 0; i < r.size(); i++) {
            int code = r.code(i);
            if (code == 11) {
                if (vertices.size() == maxVertices) {
                    throw new EntitySkip("has more than " + maxVertices + " vertices");
                }
                vertices.add(SplineConverter.pointAt(r, i, r.size()));
                miters.add(null);
                current = new ArrayList<>();
                offsets.add(current);
                paramsLeft = 0;
            } else if (code == 13 && current != null) {
                miters.set(miters.size() - 1, SplineConverter.pointAt(r, i, r.size()));
            } else if (code == 74 && current != null) {
                paramsLeft = Values.count(r.num(i), 74, "element parameter count");
                if (paramsLeft == 0) {
                    current.add(0.0);
                }
            } else if (code == 41 && current != null && paramsLeft > 0) {
                // the first parameter of an element is its offset along the miter; the others (breaks) are ignored
                double v = Values.real(r.num(i), 41, "element parameter");
                int given = countParams(r, i);
                if (given == 0) {
                    current.add(v);
                }
                paramsLeft--;
            }
        }
        if (vertices.isEmpty()) {
            return;
        }
        int elements = offsets.get(0).size();
        if (r.indexOf(73) >= 0 && Values.count(r, 73, "element count") != elements) {
            throw new EntitySkip("declares " + (int) r.num(73, 0) + " style elements but its first vertex has "
                    + elements);
        }
        if (r.indexOf(72) >= 0 && Values.count(r, 72, "vertex count") != vertices.size()) {
            throw new EntitySkip("declares " + (int) r.num(72, 0) + " vertices but has " + vertices.size());
        }
        for (int k = 0; k < vertices.size(); k++) {
            if (offsets.get(k).size() != elements) {
                throw new EntitySkip("vertex " + k + " has " + offsets.get(k).size() + " element parameters, the first"
                        + " has " + elements);
            }
            if (miters.get(k) == null) {
                throw new EntitySkip("vertex " + k + " has no miter direction (group code 13)");
            }
        }
        boolean closed = (Values.integer(r, 71, 0, "flags") & CLOSED) != 0;
        int n = vertices.size();
        for (int e = 0; e < elements; e++) {
            Vec3 first = null;
            Vec3 prev = null;
            for (int k = 0; k < n; k++) {
                Vec3 q = vertices.get(k).plus(miters.get(k).times(offsets.get(k).get(e)));
                if (prev != null) {
                    Straights.add(out, prev.x(), prev.y(), prev.z(), q.x(), q.y(), q.z(), p);
                } else {
                    first = q;
                }
                prev = q;
            }
            if (closed && n > 2) {
                Straights.add(out, prev.x(), prev.y(), prev.z(), first.x(), first.y(), first.z(), p);
            }
        }
    }

    /** How many 41 groups of the current element precede group {@code i} (0 for its first parameter). */
    private static int countParams(Record r, int i) {
        int c = 0;
        for (int j = i - 1; j >= 0 && r.code(j) == 41; j--) {
            c++;
        }
        return c;
    }
}
