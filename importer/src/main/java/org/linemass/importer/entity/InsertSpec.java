package org.linemass.importer.entity;

import org.linemass.geometry.Affine;
import org.linemass.geometry.Provenance;
import org.linemass.geometry.Vec3;
import org.linemass.importer.read.Record;

/**
 * One INSERT as written: block name 2, insertion point 10/20/30 (OCS), scales 41/42/43, rotation 50
 * (degrees), columns 70 and rows 71 with spacings 44 and 45, extrusion 210/220/230. Its placement
 * (FACTS.md §7.2, corpus README) is p -> OCS(translate(insertion) rotateZ(rotation)
 * scale(sx, sy, sz) translate(-base point) p); array copy (i, j) is shifted by i column spacings
 * and j row spacings along the rotated OCS x and y axes, not scaled.
 */
public record InsertSpec(String blockName, Vec3 insertion, double sx, double sy, double sz, double rotationDeg,
        int columns, int rows, double columnSpacing, double rowSpacing, Vec3 extrusion, Provenance source) {

    private static final double QUARTER_TURN_DEGREES = 90.0;

    /**
     * Reads and validates an INSERT record; {@link EntitySkip} for bad numbers. A zero scale factor
     * is kept: whether it collapses anything depends on the block, so the resolver decides (see
     * {@link #flattened}).
     */
    public static InsertSpec read(Record r, Provenance p) throws EntitySkip {
        String name = r.str(2, "");
        if (name.isEmpty()) {
            throw new EntitySkip("has no block name (group code 2)");
        }
        Vec3 ins = Values.point(r, 10);
        double sx = Values.real(r, 41, 1, "x scale");
        double sy = Values.real(r, 42, 1, "y scale");
        double sz = Values.real(r, 43, 1, "z scale");
        double rot = Values.real(r, 50, 0, "rotation");
        int cols = Values.integer(r, 70, 1, "column count");
        int rows = Values.integer(r, 71, 1, "row count");
        if (cols < 0) {
            throw new EntitySkip("negative column count (group code 70): " + cols);
        }
        if (rows < 0) {
            throw new EntitySkip("negative row count (group code 71): " + rows);
        }
        double cs = Values.real(r, 44, 0, "column spacing");
        double rs = Values.real(r, 45, 0, "row spacing");
        Vec3 n = Values.extrusion(r);
        Ocs.of(n);
        return new InsertSpec(name, ins, sx, sy, sz, rot, Math.max(cols, 1), Math.max(rows, 1), cs, rs, n, p);
    }

    /** The scale factor of block axis {@code axis} (0 x, 1 y, 2 z). */
    public double scale(int axis) {
        return axis == 0 ? sx : axis == 1 ? sy : sz;
    }

    /** True when some scale factor is zero. */
    public boolean hasZeroScale() {
        return sx == 0 || sy == 0 || sz == 0;
    }

    /**
     * This insert with each zero scale factor replaced by 1, for a block whose content lies in the
     * plane {@code coordinate[axis]} of each such axis: a zero scale maps that plane onto the base
     * plane, which is what scale 1 does with the base point moved into the plane, so the caller
     * places the block with {@link #flatBase} instead of its base point. Exact: every point of the
     * block keeps its other coordinates, and its coordinate on the axis becomes 0 either way.
     */
    public InsertSpec flattened() {
        return new InsertSpec(blockName, insertion, sx == 0 ? 1 : sx, sy == 0 ? 1 : sy, sz == 0 ? 1 : sz,
                rotationDeg, columns, rows, columnSpacing, rowSpacing, extrusion, source);
    }

    /** The base point to place a block with after {@link #flattened}: on each zero axis, the content's plane. */
    public Vec3 flatBase(Vec3 basePoint, Vec3 plane) {
        return new Vec3(sx == 0 ? plane.x() : basePoint.x(), sy == 0 ? plane.y() : basePoint.y(),
                sz == 0 ? plane.z() : basePoint.z());
    }

    /** Block definition coordinates to owner coordinates, for a block with {@code basePoint}. */
    public Affine placement(Vec3 basePoint) {
        return Affine.translation(basePoint.negate())
                .andThen(Affine.scale(sx, sy, sz))
                .andThen(rotation())
                .andThen(Affine.translation(insertion))
                .andThen(ocs());
    }

    public Vec3 columnStep() {
        return ocs().applyLinear(rotation().applyLinear(new Vec3(columnSpacing, 0, 0)));
    }

    public Vec3 rowStep() {
        return ocs().applyLinear(rotation().applyLinear(new Vec3(0, rowSpacing, 0)));
    }

    private Affine ocs() {
        try {
            return Ocs.of(extrusion);
        } catch (EntitySkip e) {
            throw new IllegalStateException("extrusion was validated when read: " + extrusion, e);
        }
    }

    /** Rotation about OCS z; exact for whole quarter turns so that 90-degree copies stay exact. */
    private Affine rotation() {
        double q = rotationDeg / QUARTER_TURN_DEGREES;
        if (q == Math.rint(q) && Math.abs(q) < 1e9) {
            int k = (int) (((long) q % 4 + 4) % 4);
            double c = k == 0 ? 1 : k == 2 ? -1 : 0;
            double s = k == 1 ? 1 : k == 3 ? -1 : 0;
            return Affine.of(new double[] {c, -s, 0, s, c, 0, 0, 0, 1}, Vec3.ZERO);
        }
        return Affine.rotationZ(Math.toRadians(rotationDeg));
    }
}
