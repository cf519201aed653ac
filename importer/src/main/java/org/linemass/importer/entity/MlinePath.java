package org.linemass.importer.entity;

import java.util.ArrayList;
import java.util.List;
import org.linemass.geometry.Provenance;
import org.linemass.geometry.Segment;
import org.linemass.geometry.Vec3;
import org.linemass.importer.read.Record;

/**
 * MLINE: one wire per element line of its style (DXF Reference, MLINE), read in two steps because
 * the styles (OBJECTS section) follow the entities: {@link #read} keeps the centre path, and
 * {@link #convert} draws the element lines once the style is known.
 *
 * <p>The centre path is the vertices 11/21/31 (world coordinates), each followed by its segment
 * direction 12/22/32, its miter direction 13/23/33 and, per style element, a parameter count 74
 * and parameters 41 (then fill parameters 75/42, not used). An element's point at a vertex is the
 * vertex moved along the miter direction by the element's first parameter: the distance the writer
 * derived from the style's element offset (49) times the MLINE's scale (40), already along the
 * miter, so corners keep the element parallel to the path. An element written without parameters
 * (74 = 0) takes that distance from the style: (offset + justification shift) times scale divided
 * by the sine of the angle between segment and miter directions. Further parameters (breaks made
 * by editing) and the style's caps are not read. Flag 71 bit 2 closes each element back to its
 * first point. The style's element count is the authority: the MLINE's count 73 and every
 * vertex's parameter lists must match it (without the style, the first vertex's count). Immutable.
 */
public final class MlinePath {

    private static final int CLOSED = 2;

    private final Provenance source;
    private final List<Vec3> vertices;
    private final List<Vec3> directions;
    private final List<Vec3> miters;
    /** Per vertex, the first parameter of each element; NaN where the element has no parameters. */
    private final List<double[]> params;
    private final String styleName;
    private final String styleHandle;
    private final double scale;
    private final int justification;
    private final boolean closed;
    /** The element count 73, -1 when not given. */
    private final int declaredElements;

    private MlinePath(Provenance source, List<Vec3> vertices, List<Vec3> directions, List<Vec3> miters,
            List<double[]> params, String styleName, String styleHandle, double scale, int justification,
            boolean closed, int declaredElements) {
        this.source = source;
        this.vertices = List.copyOf(vertices);
        this.directions = new ArrayList<>(directions);
        this.miters = List.copyOf(miters);
        this.params = List.copyOf(params);
        this.styleName = styleName;
        this.styleHandle = styleHandle;
        this.scale = scale;
        this.justification = justification;
        this.closed = closed;
        this.declaredElements = declaredElements;
    }

    /** Reads the centre path of MLINE record {@code r}; {@link EntitySkip} when it is unusable. */
    public static MlinePath read(Record r, Provenance p, int maxVertices) throws EntitySkip {
        List<Vec3> vertices = new ArrayList<>();
        List<Vec3> directions = new ArrayList<>();
        List<Vec3> miters = new ArrayList<>();
        List<List<Double>> firsts = new ArrayList<>();
        List<Double> current = null;
        int paramsLeft = 0;
        boolean firstTaken = true;
        for (int i = 0; i < r.size(); i++) {
            int code = r.code(i);
            if (code == 11) {
                if (vertices.size() == maxVertices) {
                    throw new EntitySkip("has more than " + maxVertices + " vertices");
                }
                vertices.add(SplineConverter.pointAt(r, i, r.size()));
                directions.add(null);
                miters.add(null);
                current = new ArrayList<>();
                firsts.add(current);
                paramsLeft = 0;
            } else if (code == 12 && current != null) {
                directions.set(directions.size() - 1, SplineConverter.pointAt(r, i, r.size()));
            } else if (code == 13 && current != null) {
                miters.set(miters.size() - 1, SplineConverter.pointAt(r, i, r.size()));
            } else if (code == 74 && current != null) {
                paramsLeft = Values.count(r.num(i), 74, "element parameter count");
                firstTaken = paramsLeft == 0;
                current.add(Double.NaN);
            } else if (code == 41 && current != null && paramsLeft > 0) {
                // the first parameter of an element is its offset along the miter; the others (breaks) are ignored
                double v = Values.real(r.num(i), 41, "element parameter");
                if (!firstTaken) {
                    current.set(current.size() - 1, v);
                    firstTaken = true;
                }
                paramsLeft--;
            }
        }
        if (r.indexOf(72) >= 0 && Values.count(r, 72, "vertex count") != vertices.size()) {
            throw new EntitySkip("declares " + (int) r.num(72, 0) + " vertices but has " + vertices.size());
        }
        for (int k = 0; k < vertices.size(); k++) {
            if (miters.get(k) == null) {
                throw new EntitySkip("vertex " + k + " has no miter direction (group code 13)");
            }
        }
        List<double[]> params = new ArrayList<>();
        for (List<Double> f : firsts) {
            params.add(f.stream().mapToDouble(Double::doubleValue).toArray());
        }
        int declared = r.indexOf(73) >= 0 ? Values.count(r, 73, "element count") : -1;
        return new MlinePath(p, vertices, directions, miters, params, r.str(2, ""), r.str(340, ""),
                Values.real(r, 40, 1, "scale"), Values.integer(r, 70, 0, "justification"),
                (Values.integer(r, 71, 0, "flags") & CLOSED) != 0, declared);
    }

    public Provenance source() {
        return source;
    }

    /** The style name the MLINE gives (group 2), empty when none. */
    public String styleName() {
        return styleName;
    }

    /** The style handle the MLINE points at (group 340), empty when none. */
    public String styleHandle() {
        return styleHandle;
    }

    /**
     * Appends the element lines to {@code out}, with the MLINE's style or null when the file does not
     * hold it; on {@link EntitySkip} nothing has been appended.
     */
    public void convert(MlineStyle style, List<Segment> out) throws EntitySkip {
        if (vertices.isEmpty()) {
            return;
        }
        int elements = style != null ? style.offsets().size() : params.get(0).length;
        String authority = style != null ? "its style '" + style.name() + "' has " : "its first vertex has ";
        if (declaredElements >= 0 && declaredElements != elements) {
            throw new EntitySkip("declares " + declaredElements + " style elements but " + authority + elements);
        }
        int n = vertices.size();
        double[][] offsets = new double[n][];
        for (int k = 0; k < n; k++) {
            offsets[k] = offsetsAt(k, elements, authority, style);
        }
        List<Segment> lines = new ArrayList<>();
        for (int e = 0; e < elements; e++) {
            Vec3 first = null;
            Vec3 prev = null;
            for (int k = 0; k < n; k++) {
                Vec3 q = vertices.get(k).plus(miters.get(k).times(offsets[k][e]));
                if (prev != null) {
                    Straights.add(lines, prev.x(), prev.y(), prev.z(), q.x(), q.y(), q.z(), source);
                } else {
                    first = q;
                }
                prev = q;
            }
            if (closed && n > 2) {
                Straights.add(lines, prev.x(), prev.y(), prev.z(), first.x(), first.y(), first.z(), source);
            }
        }
        out.addAll(lines);
    }

    /** The distance along the miter of each element at vertex {@code k}. */
    private double[] offsetsAt(int k, int elements, String authority, MlineStyle style) throws EntitySkip {
        double[] given = params.get(k);
        if (given.length != elements) {
            throw new EntitySkip("vertex " + k + " has " + given.length + " element parameter lists, " + authority
                    + elements);
        }
        double[] out = given.clone();
        for (int e = 0; e < elements; e++) {
            if (!Double.isNaN(out[e])) {
                continue;
            }
            if (style == null) {
                throw new EntitySkip("element " + e + " at vertex " + k + " has no parameters (74 = 0) and the"
                        + " MLINESTYLE " + (styleName.isEmpty() ? "it names" : "'" + styleName + "'")
                        + " is not in the file");
            }
            out[e] = (style.offsets().get(e) + style.justificationShift(justification)) * scale / sine(k);
        }
        return out;
    }

    /** Sine of the angle between the segment direction and the miter at vertex {@code k}. */
    private double sine(int k) throws EntitySkip {
        Vec3 d = directions.get(k);
        Vec3 m = miters.get(k);
        if (d == null) {
            throw new EntitySkip("vertex " + k + " has no segment direction (group code 12) to place the style's"
                    + " offsets with");
        }
        double s = d.cross(m).norm() / (d.norm() * m.norm());
        if (!(s > 0) || !Double.isFinite(s)) {
            throw new EntitySkip("vertex " + k + ": the miter direction runs along the segment, so the style's"
                    + " offsets cannot be placed");
        }
        return s;
    }
}
