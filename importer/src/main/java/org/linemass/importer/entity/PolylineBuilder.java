package org.linemass.importer.entity;

import java.util.Arrays;
import java.util.List;
import org.linemass.geometry.Provenance;
import org.linemass.geometry.Segment;
import org.linemass.geometry.Vec3;
import org.linemass.importer.read.Record;

/**
 * Collects a POLYLINE header and its VERTEX records and turns them into segments (FACTS.md §7.2).
 * Header flag 8 makes a 3D polyline (world vertices 10/20/30, straight pieces); otherwise it is
 * 2D: vertices 10/20 in the OCS of the header's 210/220/230 at the header's elevation 30, with
 * bulges 42. Flag 1 closes it. Spline-fit polylines (flag 4) use the vertices flagged 8 and never
 * the frame vertices flagged 16; curve-fit polylines (flag 2) use all their vertices. Polygon and
 * polyface meshes (flags 16, 64) carry no wire and are reported as ignored. A bad vertex makes the
 * whole polyline unusable (first problem kept). One builder per polyline; not thread-safe.
 */
public final class PolylineBuilder {

    /** Header flag bits and vertex flag bits (DXF Reference, POLYLINE and VERTEX). */
    private static final int CLOSED = 1;
    private static final int SPLINE_FIT = 4;
    private static final int POLYLINE_3D = 8;
    private static final int MESH = 16;
    private static final int POLYFACE = 64;
    private static final int VERTEX_SPLINE_FIT = 8;
    private static final int VERTEX_FRAME = 16;

    private final int flags;
    private final int maxVertices;
    private final double elevation;
    private final Vec3 extrusion;
    private EntitySkip problem;
    private double[] x = new double[8];
    private double[] y = new double[8];
    private double[] z = new double[8];
    private double[] bulge = new double[8];
    private int[] vflags = new int[8];
    private int n;

    private PolylineBuilder(int flags, double elevation, Vec3 extrusion, EntitySkip problem, int maxVertices) {
        this.flags = flags;
        this.elevation = elevation;
        this.extrusion = extrusion;
        this.problem = problem;
        this.maxVertices = maxVertices;
    }

    /** Starts a polyline from its header record; header problems are kept and reported at the end. */
    public static PolylineBuilder start(Record header, int maxVertices) {
        try {
            int flags = Values.integer(header, 70, 0, "flags");
            double elevation = Values.coordinate(header.num(30, 0), 30);
            return new PolylineBuilder(flags, elevation, Values.extrusion(header), null, maxVertices);
        } catch (EntitySkip e) {
            return new PolylineBuilder(0, 0, Vec3.Z, e, maxVertices);
        }
    }

    /** The DXF type this polyline counts as: POLYLINE2D, POLYLINE3D, or null for a mesh. */
    public String countedType() {
        if ((flags & (MESH | POLYFACE)) != 0) {
            return null;
        }
        return (flags & POLYLINE_3D) != 0 ? "POLYLINE3D" : "POLYLINE2D";
    }

    /** Description of the mesh kind for an ignored polyline. */
    public String meshKind() {
        return (flags & POLYFACE) != 0 ? "polyface mesh" : "polygon mesh";
    }

    public void vertex(Record v) {
        if (problem != null) {
            return;
        }
        try {
            if (n == maxVertices) {
                throw new EntitySkip("has more than " + maxVertices + " vertices");
            }
            if (n == x.length) {
                int cap = n * 2;
                x = Arrays.copyOf(x, cap);
                y = Arrays.copyOf(y, cap);
                z = Arrays.copyOf(z, cap);
                bulge = Arrays.copyOf(bulge, cap);
                vflags = Arrays.copyOf(vflags, cap);
            }
            if (v.hasBadValue()) {
                throw new EntitySkip("VERTEX value for group code " + v.badCode() + " is not a number: '"
                        + v.badText() + "'");
            }
            x[n] = Values.coordinate(v.num(10, 0), 10);
            y[n] = Values.coordinate(v.num(20, 0), 20);
            z[n] = Values.coordinate(v.num(30, 0), 30);
            bulge[n] = Values.real(v.num(42, 0), 42, "bulge");
            vflags[n] = Values.integer(v, 70, 0, "vertex flags");
            n++;
        } catch (EntitySkip e) {
            problem = e;
        }
    }

    /** Appends the polyline's pieces; {@link EntitySkip} with the first problem met. */
    public void finish(Provenance p, List<Segment> out) throws EntitySkip {
        if (problem != null) {
            throw problem;
        }
        int[] use = selectVertices();
        int m = use.length;
        boolean closed = (flags & CLOSED) != 0 && m > 1;
        if ((flags & POLYLINE_3D) != 0) {
            for (int i = 0; i + 1 < m; i++) {
                int a = use[i];
                int b = use[i + 1];
                Straights.add(out, x[a], y[a], z[a], x[b], y[b], z[b], p);
            }
            if (closed) {
                int a = use[m - 1];
                int b = use[0];
                Straights.add(out, x[a], y[a], z[a], x[b], y[b], z[b], p);
            }
            return;
        }
        Ocs.Frame ocs = Ocs.frame(extrusion);
        boolean splineFit = (flags & SPLINE_FIT) != 0;
        for (int i = 0; i + 1 < m; i++) {
            int a = use[i];
            int b = use[i + 1];
            Bulge.append(x[a], y[a], x[b], y[b], elevation, splineFit ? 0 : bulge[a], ocs, p, out);
        }
        if (closed) {
            int a = use[m - 1];
            int b = use[0];
            Bulge.append(x[a], y[a], x[b], y[b], elevation, splineFit ? 0 : bulge[a], ocs, p, out);
        }
    }

    private int[] selectVertices() {
        boolean splineFit = (flags & SPLINE_FIT) != 0;
        boolean anyFitted = false;
        for (int i = 0; i < n; i++) {
            anyFitted |= (vflags[i] & VERTEX_SPLINE_FIT) != 0;
        }
        int[] use = new int[n];
        int m = 0;
        for (int i = 0; i < n; i++) {
            boolean frame = (vflags[i] & VERTEX_FRAME) != 0;
            boolean fitted = (vflags[i] & VERTEX_SPLINE_FIT) != 0;
            if (splineFit && anyFitted ? fitted : !frame) {
                use[m++] = i;
            }
        }
        return Arrays.copyOf(use, m);
    }
}
