package org.linemass.engine.section;

import java.util.Locale;

/**
 * Cross-section shapes built from dimensions in millimetres, with their mass per metre for a
 * density: round bar or wire {@code rho pi d^2 / 4}; round tube {@code rho pi (D - t) t} (outside
 * diameter D, wall t: the same as {@code rho pi (D^2 - d_i^2) / 4}); square bar {@code rho a^2};
 * rectangular and flat bar {@code rho w h}.
 */
public enum Shape {
    ROUND(1), TUBE(2), SQUARE(1), RECT(2), FLAT(2);

    private static final double MM2_TO_M2 = 1e-6;

    private final int dimensions;

    Shape(int dimensions) {
        this.dimensions = dimensions;
    }

    public String id() {
        return name().toLowerCase(Locale.ROOT);
    }

    /** The shape with this id ({@code round}, {@code tube}, {@code square}, {@code rect}, {@code flat}). */
    public static Shape parse(String id) {
        for (Shape s : values()) {
            if (s.id().equals(id.trim().toLowerCase(Locale.ROOT))) {
                return s;
            }
        }
        throw new IllegalArgumentException("unknown shape '" + id + "' (known: round, tube, square, rect, flat)");
    }

    /** Cross-section area in square metres; IllegalArgumentException for impossible dimensions. */
    public double areaM2(double[] mm) {
        if (mm.length != dimensions) {
            throw new IllegalArgumentException(id() + " takes " + dimensions + " dimension(s), got " + mm.length);
        }
        for (double d : mm) {
            if (!(d > 0) || !Double.isFinite(d)) {
                throw new IllegalArgumentException(id() + " dimensions must be positive, got " + d + " mm");
            }
        }
        return switch (this) {
            case ROUND -> Math.PI * mm[0] * mm[0] / 4 * MM2_TO_M2;
            case TUBE -> {
                if (mm[1] > mm[0] / 2) {
                    throw new IllegalArgumentException("tube wall " + mm[1] + " mm is more than half the outside diameter "
                            + mm[0] + " mm");
                }
                yield Math.PI * (mm[0] - mm[1]) * mm[1] * MM2_TO_M2;
            }
            case SQUARE -> mm[0] * mm[0] * MM2_TO_M2;
            case RECT, FLAT -> mm[0] * mm[1] * MM2_TO_M2;
        };
    }

    /** Outside diameter in metres for round shapes, null otherwise. */
    public Double diameterM(double[] mm) {
        return this == ROUND || this == TUBE ? mm[0] / 1000 : null;
    }

    /** A short description such as {@code tube 42.4 x 2.6 mm}. */
    public String describe(double[] mm) {
        StringBuilder sb = new StringBuilder(switch (this) {
            case ROUND -> "round bar";
            case TUBE -> "round tube";
            case SQUARE -> "square bar";
            case RECT -> "rectangular bar";
            case FLAT -> "flat bar";
        });
        sb.append(' ');
        for (int i = 0; i < mm.length; i++) {
            sb.append(i > 0 ? " x " : "").append(format(mm[i]));
        }
        return sb.append(" mm").toString();
    }

    static String format(double v) {
        return v == Math.rint(v) && Math.abs(v) < 1e15 ? Long.toString((long) v) : Double.toString(v);
    }
}
