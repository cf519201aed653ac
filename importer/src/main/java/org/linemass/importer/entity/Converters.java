package org.linemass.importer.entity;

import java.util.List;
import org.linemass.geometry.Provenance;
import org.linemass.geometry.Segment;
import org.linemass.importer.read.Record;

/**
 * Entry point of the package: converts one single-record curve entity (LINE, ARC, CIRCLE,
 * ELLIPSE, LWPOLYLINE, SPLINE, HELIX) to segments. POLYLINE uses {@link PolylineBuilder} and
 * INSERT {@link InsertSpec}. On failure nothing is appended and {@link EntitySkip} says why.
 */
public final class Converters {

    private Converters() {
    }

    /** True for the single-record entity types this class converts. */
    public static boolean isCurveType(String type) {
        return switch (type) {
            case "LINE", "ARC", "CIRCLE", "ELLIPSE", "LWPOLYLINE", "SPLINE", "HELIX" -> true;
            default -> false;
        };
    }

    public static void convert(Record r, Provenance p, int maxVertices, int maxControlPoints, List<Segment> out)
            throws EntitySkip {
        int before = out.size();
        try {
            switch (r.type()) {
                case "LINE" -> LineConverter.convert(r, p, out);
                case "ARC" -> CircleConverter.convert(r, p, true, out);
                case "CIRCLE" -> CircleConverter.convert(r, p, false, out);
                case "ELLIPSE" -> EllipseConverter.convert(r, p, out);
                case "LWPOLYLINE" -> LwPolylineConverter.convert(r, p, maxVertices, out);
                case "SPLINE", "HELIX" -> SplineConverter.convert(r, p, maxControlPoints, out);
                default -> throw new IllegalArgumentException("not a curve entity type: " + r.type());
            }
        } catch (EntitySkip e) {
            out.subList(before, out.size()).clear();
            throw e;
        } catch (IllegalArgumentException e) {
            out.subList(before, out.size()).clear();
            throw new EntitySkip(e.getMessage());
        }
    }

    /** Finishes a polyline, turning geometry-factory rejections into {@link EntitySkip}. */
    public static void finish(PolylineBuilder b, Provenance p, List<Segment> out) throws EntitySkip {
        int before = out.size();
        try {
            b.finish(p, out);
        } catch (EntitySkip e) {
            out.subList(before, out.size()).clear();
            throw e;
        } catch (IllegalArgumentException e) {
            out.subList(before, out.size()).clear();
            throw new EntitySkip(e.getMessage());
        }
    }
}
