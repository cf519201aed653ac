package org.linemass.importer.entity;

import java.util.List;
import org.linemass.geometry.Nurbs;
import org.linemass.geometry.Provenance;
import org.linemass.geometry.Segment;
import org.linemass.geometry.Vec3;
import org.linemass.importer.read.Record;

/**
 * SPLINE and HELIX (the helix's own spline data, before its AcDbHelix subclass marker), in world
 * coordinates (FACTS.md §7.2): degree 71, declared knot / control / fit counts 72 / 73 / 74,
 * knots 40, weights 41, control points 10/20/30, fit points 11/21/31, end tangents 12/22/32 and
 * 13/23/33. Declared counts must match what the record holds and knots = control points +
 * degree + 1; the curve is the exact (rational) B-spline on [knot[degree], knot[n]], which covers
 * closed and periodic splines. A spline with fit points only becomes the interpolating cubic of
 * {@link FitSplineInterpolator}.
 *
 * <p>Some writers leave the knots out. A spline with control points, no 40 groups and a knot count
 * 72 of 0 (or no 72 at all) gets the clamped uniform knot vector of its degree and control-point
 * count (see {@link #clampedUniformKnots}) and a warning in {@code warnings}: the curve then starts
 * at the first and ends at the last control point. The closed / periodic bits of group 70 do not
 * change this, just as they do not change a spline whose knots are given (the knots alone define
 * the curve); the warning says when such a bit is set. A declared knot count that the 40 groups do
 * not match, or knots that do not fit the control points, remain errors.
 */
final class SplineConverter {

    /** Highest degree accepted; the basis evaluation costs (degree + 1)^2 per point. */
    static final int MAX_DEGREE = 32;

    /**
     * Knot tolerance when the entity gives none (group code 42): the format's default of 1e-10,
     * here relative to the knot size. Knots that decrease by no more than this are taken as equal.
     */
    static final double DEFAULT_KNOT_TOLERANCE = 1e-10;

    private SplineConverter() {
    }

    /** Group 70 bits: 1 closed, 2 periodic. */
    private static final int CLOSED_OR_PERIODIC = 1 | 2;

    /**
     * Converts {@code r}; appends one segment to {@code out} and, when the knots had to be assumed,
     * one message to {@code warnings} (a one-line text without the entity's location).
     */
    static void convert(Record r, Provenance p, int maxPoints, List<Segment> out, List<String> warnings)
            throws EntitySkip {
        int end = r.size();
        for (int i = 0; i < r.size(); i++) {
            if (r.code(i) == 100 && "AcDbHelix".equals(r.str(i))) {
                end = i;
                break;
            }
        }
        int degree = Values.integer(r, 71, 3, "degree");
        int nKnots = Values.count(r, 72, "knot count");
        int nCtrl = Values.count(r, 73, "control point count");
        int nFit = Values.count(r, 74, "fit point count");
        if (degree < 1 || degree > MAX_DEGREE) {
            throw new EntitySkip("degree " + degree + " is not supported (1 to " + MAX_DEGREE + ")");
        }
        for (int[] c : new int[][] {{nKnots, 72}, {nCtrl, 73}, {nFit, 74}}) {
            if (c[0] > maxPoints) {
                throw new EntitySkip("declares " + c[0] + " " + what(c[1]) + ", more than the limit " + maxPoints);
            }
        }
        // arrays are sized by what the record holds, never by the declared counts alone
        int hasKnots = 0;
        int hasCtrl = 0;
        int hasFit = 0;
        int hasWeights = 0;
        for (int i = 0; i < end; i++) {
            switch (r.code(i)) {
                case 40 -> hasKnots++;
                case 41 -> hasWeights++;
                case 10 -> hasCtrl++;
                case 11 -> hasFit++;
                default -> {
                }
            }
        }
        // a count group left out is not a count of zero: read what the record holds
        if (r.indexOf(72) < 0) {
            nKnots = hasKnots;
        }
        if (r.indexOf(73) < 0) {
            nCtrl = hasCtrl;
        }
        if (r.indexOf(74) < 0) {
            nFit = hasFit;
        }
        for (int[] c : new int[][] {{nKnots, 72}, {nCtrl, 73}, {nFit, 74}}) {
            if (c[0] > maxPoints) {
                throw new EntitySkip("has " + c[0] + " " + what(c[1]) + ", more than the limit " + maxPoints);
            }
        }
        if (hasKnots != nKnots) {
            throw new EntitySkip("declares " + nKnots + " knots but has " + hasKnots);
        }
        if (hasCtrl != nCtrl) {
            throw new EntitySkip("declares " + nCtrl + " control points but has " + hasCtrl);
        }
        if (hasFit != nFit) {
            throw new EntitySkip("declares " + nFit + " fit points but has " + hasFit);
        }
        if (hasWeights != 0 && hasWeights != nCtrl) {
            throw new EntitySkip("has " + hasWeights + " weights for " + nCtrl + " control points");
        }
        double[] knots = new double[nKnots];
        double[] weights = new double[nCtrl];
        Vec3[] ctrl = new Vec3[nCtrl];
        Vec3[] fit = new Vec3[nFit];
        int nk = 0;
        int nw = 0;
        int nc = 0;
        int nf = 0;
        Vec3 startTangent = null;
        Vec3 endTangent = null;
        for (int i = 0; i < end; i++) {
            int code = r.code(i);
            switch (code) {
                case 40 -> {
                    if (nk == nKnots) {
                        throw new EntitySkip("declares " + nKnots + " knots but has more");
                    }
                    knots[nk++] = Values.real(r.num(i), 40, "knot");
                }
                case 41 -> {
                    if (nw == nCtrl) {
                        throw new EntitySkip("has more weights than its " + nCtrl + " control points");
                    }
                    weights[nw++] = Values.real(r.num(i), 41, "weight");
                }
                case 10 -> {
                    if (nc == nCtrl) {
                        throw new EntitySkip("declares " + nCtrl + " control points but has more");
                    }
                    ctrl[nc++] = pointAt(r, i, end);
                }
                case 11 -> {
                    if (nf == nFit) {
                        throw new EntitySkip("declares " + nFit + " fit points but has more");
                    }
                    fit[nf++] = pointAt(r, i, end);
                }
                case 12 -> startTangent = pointAt(r, i, end);
                case 13 -> endTangent = pointAt(r, i, end);
                default -> {
                }
            }
        }
        if (nk != nKnots) {
            throw new EntitySkip("declares " + nKnots + " knots but has " + nk);
        }
        if (nc != nCtrl) {
            throw new EntitySkip("declares " + nCtrl + " control points but has " + nc);
        }
        if (nf != nFit) {
            throw new EntitySkip("declares " + nFit + " fit points but has " + nf);
        }
        if (nCtrl == 0) {
            if (nFit < 2) {
                throw new EntitySkip("has no control points and " + nFit + " fit points (need at least 2)");
            }
            out.add(FitSplineInterpolator.interpolate(fit, startTangent, endTangent, p));
            return;
        }
        if (nw != 0 && nw != nCtrl) {
            throw new EntitySkip("has " + nw + " weights for " + nCtrl + " control points");
        }
        if (nCtrl < degree + 1) {
            throw new EntitySkip("has " + nCtrl + " control points; degree " + degree + " needs at least "
                    + (degree + 1));
        }
        if (nKnots == 0) {
            knots = clampedUniformKnots(degree, nCtrl);
            nKnots = knots.length;
            warnings.add(missingKnotsMessage(degree, nCtrl, (int) r.num(70, 0)));
        }
        if (nKnots != nCtrl + degree + 1) {
            throw new EntitySkip("has " + nKnots + " knots; " + nCtrl + " control points of degree " + degree
                    + " need " + (nCtrl + degree + 1));
        }
        double knotTolerance = Math.abs(r.num(42, DEFAULT_KNOT_TOLERANCE));
        for (int i = 1; i < nKnots; i++) {
            if (knots[i] < knots[i - 1]
                    && knots[i - 1] - knots[i] <= knotTolerance * Math.max(1, Math.abs(knots[i - 1]))) {
                // decimal rounding in the file: equal within the spline's own knot tolerance
                knots[i] = knots[i - 1];
            }
            if (knots[i] < knots[i - 1]) {
                throw new EntitySkip("knots decrease at index " + i + " (" + knots[i - 1] + " then " + knots[i] + ")");
            }
        }
        if (!(knots[nCtrl] > knots[degree])) {
            throw new EntitySkip("parameter range is empty (knot[" + degree + "] = knot[" + nCtrl + "] = "
                    + knots[degree] + ")");
        }
        for (int i = 0; i < nw; i++) {
            if (!(weights[i] > 0)) {
                throw new EntitySkip("weight " + i + " must be positive, got " + weights[i]);
            }
        }
        out.add(Nurbs.of(degree, knots, ctrl, nw == 0 ? null : weights, p));
    }

    /**
     * The clamped (open) uniform knot vector of a B-spline with {@code n} control points: degree + 1
     * zeros, n - degree - 1 interior knots i / (n - degree), degree + 1 ones (n + degree + 1 knots).
     * The curve starts at the first and ends at the last control point; with n = degree + 1 it is the
     * Bezier curve of the control points.
     */
    static double[] clampedUniformKnots(int degree, int n) {
        if (degree < 1 || n < degree + 1) {
            throw new IllegalArgumentException("clamped knots need degree >= 1 and at least degree + 1 control points,"
                    + " got degree " + degree + " and " + n);
        }
        double[] k = new double[n + degree + 1];
        int spans = n - degree;
        for (int i = 0; i < k.length; i++) {
            k[i] = i <= degree ? 0 : i >= n ? 1 : (double) (i - degree) / spans;
        }
        return k;
    }

    private static String missingKnotsMessage(int degree, int nCtrl, int flags) {
        String m = "has " + nCtrl + " control points but no knots (group codes 72 and 40); assumed the clamped"
                + " uniform knot vector of degree " + degree + " (" + (degree + 1) + " zeros, " + (nCtrl - degree - 1)
                + " evenly spaced interior knots, " + (degree + 1) + " ones): the curve runs from the first to"
                + " the last control point";
        return (flags & CLOSED_OR_PERIODIC) != 0
                ? m + "; the closed/periodic flag (group code 70 = " + flags + ") is not applied" : m;
    }

    private static String what(int code) {
        return switch (code) {
            case 72 -> "knots";
            case 73 -> "control points";
            default -> "fit points";
        };
    }

    /** The point whose x is group i; its y and z are the next two groups with code + 10 and code + 20. */
    static Vec3 pointAt(Record r, int i, int end) throws EntitySkip {
        int code = r.code(i);
        double x = Values.coordinate(r.num(i), code);
        double y = 0;
        double z = 0;
        for (int j = i + 1; j < end && j <= i + 2; j++) {
            if (r.code(j) == code + 10) {
                y = Values.coordinate(r.num(j), code + 10);
            } else if (r.code(j) == code + 20) {
                z = Values.coordinate(r.num(j), code + 20);
            }
        }
        return new Vec3(x, y, z);
    }
}
