package org.linemass.importer.entity;

import java.util.ArrayList;
import java.util.List;
import org.linemass.geometry.Provenance;
import org.linemass.geometry.Segment;
import org.linemass.importer.read.Record;

/**
 * Entry point of the package: converts one single-record curve entity (LINE and its old spelling
 * 3DLINE, ARC, CIRCLE, ELLIPSE, LWPOLYLINE, SPLINE, HELIX; on request the drafting entity LEADER)
 * to segments. POLYLINE uses {@link PolylineBuilder}, INSERT {@link InsertSpec} and MLINE
 * {@link MlinePath} (it waits for its style). On failure nothing is appended and {@link EntitySkip} says why. A
 * conversion that succeeds after guessing something (a SPLINE without knots) also appends a
 * one-line message to the caller's warning list.
 */
public final class Converters {

    private Converters() {
    }

    /** True for the single-record entity types this class converts. */
    public static boolean isCurveType(String type) {
        return switch (type) {
            case "LINE", "3DLINE", "ARC", "CIRCLE", "ELLIPSE", "LWPOLYLINE", "SPLINE", "HELIX" -> true;
            default -> false;
        };
    }

    /** True for drafting entities read as wire only on request (MLINE element lines, LEADER paths). */
    public static boolean isDraftingPath(String type) {
        return type.equals("MLINE") || type.equals("LEADER");
    }

    /**
     * As {@link #convert(Record, Provenance, int, int, List, List)}, dropping any warning; for callers
     * that have nowhere to report one.
     */
    public static void convert(Record r, Provenance p, int maxVertices, int maxControlPoints, List<Segment> out)
            throws EntitySkip {
        convert(r, p, maxVertices, maxControlPoints, out, new ArrayList<>());
    }

    /**
     * Converts {@code r}, appending its segments to {@code out} and one message per guess to
     * {@code warnings} (messages without the entity's location, which the caller adds). On
     * {@link EntitySkip} neither list is changed.
     */
    public static void convert(Record r, Provenance p, int maxVertices, int maxControlPoints, List<Segment> out,
            List<String> warnings) throws EntitySkip {
        int before = out.size();
        int warningsBefore = warnings.size();
        try {
            switch (r.type()) {
                case "LINE", "3DLINE" -> LineConverter.convert(r, p, out);
                case "LEADER" -> LeaderConverter.convert(r, p, maxVertices, out);
                case "ARC" -> CircleConverter.convert(r, p, true, out);
                case "CIRCLE" -> CircleConverter.convert(r, p, false, out);
                case "ELLIPSE" -> EllipseConverter.convert(r, p, out);
                case "LWPOLYLINE" -> LwPolylineConverter.convert(r, p, maxVertices, out);
                case "SPLINE", "HELIX" -> SplineConverter.convert(r, p, maxControlPoints, out, warnings);
                default -> throw new IllegalArgumentException("not a curve entity type: " + r.type());
            }
        } catch (EntitySkip e) {
            out.subList(before, out.size()).clear();
            warnings.subList(warningsBefore, warnings.size()).clear();
            throw e;
        } catch (IllegalArgumentException e) {
            out.subList(before, out.size()).clear();
            warnings.subList(warningsBefore, warnings.size()).clear();
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
