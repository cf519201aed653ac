package org.linemass.reports.html;

import java.util.ArrayList;
import java.util.List;
import org.linemass.geometry.Vec3;

/**
 * A parallel projection of world points onto a picture plane: plan (x right, y up), front
 * elevation (x right, z up) or side elevation (y right, z up). {@link #choose} picks the views
 * for a drawing from its extent: always the plan; an elevation too when the drawing's height (z
 * extent) is more than {@value #THIRD_DIMENSION_SHARE} of its largest horizontal extent, looking
 * along the shorter horizontal axis so the elevation shows the longer one.
 */
enum View {
    PLAN("Plan view (looking down, x to the right, y up)", 0, 1),
    FRONT("Front elevation (x to the right, z up)", 0, 2),
    SIDE("Side elevation (y to the right, z up)", 1, 2);

    /** Share of the horizontal extent above which a drawing counts as three-dimensional (common practice, no source). */
    static final double THIRD_DIMENSION_SHARE = 0.01;

    final String title;
    final int right;
    final int up;

    View(String title, int right, int up) {
        this.title = title;
        this.right = right;
        this.up = up;
    }

    double u(Vec3 p) {
        return p.get(right);
    }

    double v(Vec3 p) {
        return p.get(up);
    }

    /** The views to draw for points with the given extent (max - min per axis, metres). */
    static List<View> choose(Vec3 extent) {
        List<View> views = new ArrayList<>();
        views.add(PLAN);
        double horizontal = Math.max(extent.x(), extent.y());
        if (extent.z() > THIRD_DIMENSION_SHARE * horizontal && extent.z() > 0) {
            views.add(extent.x() >= extent.y() ? FRONT : SIDE);
        }
        return views;
    }
}
