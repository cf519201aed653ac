package org.linemass.reports.html;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.Comparator;
import java.util.List;

/**
 * Places the numbered balloons of finding markers so that none hides another or the defect it
 * points at. Each finding keeps a small ring exactly at its place (the anchor); its balloon sits
 * a short leader line away. Anchors closer than {@value #CLUSTER_PX} px in the first view of the
 * picture are grouped (single linkage); the balloons of a group are spread evenly on a circle
 * around the group's centre, in the order of their anchors' bearings so the leader lines do not
 * cross, starting at the top. A lone marker gets its balloon up and to the right.
 *
 * <p>Offsets are in screen pixels and are kept at that size while the picture is zoomed (the
 * page's script scales each marker group by the inverse of the zoom), so at any zoom each balloon
 * stays within a few tens of pixels of its defect.
 */
final class MarkerLayout {

    /** Anchors nearer than this (picture px) share a fan of balloons: a balloon's diameter plus a gap. */
    static final double CLUSTER_PX = 24;
    /** Distance of a lone balloon from its anchor, px. */
    static final double LONE_OFFSET_PX = 20;
    /** Space each balloon takes on a fan's circle, px (diameter 20 plus 4 gap). */
    private static final double BALLOON_PITCH_PX = 24;
    private static final double MIN_FAN_RADIUS_PX = 24;
    /** Anchors nearer than this to a fan's centre count as at the centre, px (far below one pixel). */
    private static final double AT_CENTRE_PX = 1e-6;

    /** A balloon's offset (dx, dy) from its anchor, screen px, y down. */
    record Offset(double dx, double dy) {
    }

    private MarkerLayout() {
    }

    /** Offsets for anchors {@code xs[i], ys[i]} (picture px), one per anchor, in the same order. */
    static List<Offset> place(double[] xs, double[] ys) {
        int n = xs.length;
        if (ys.length != n) {
            throw new IllegalArgumentException("xs and ys differ in length: " + n + " and " + ys.length);
        }
        int[] parent = new int[n];
        for (int i = 0; i < n; i++) {
            parent[i] = i;
        }
        for (int i = 0; i < n; i++) {
            for (int j = i + 1; j < n; j++) {
                if (Math.hypot(xs[i] - xs[j], ys[i] - ys[j]) < CLUSTER_PX) {
                    parent[find(parent, i)] = find(parent, j);
                }
            }
        }
        List<List<Integer>> groups = new ArrayList<>();
        int[] groupOf = new int[n];
        Arrays.fill(groupOf, -1);
        for (int i = 0; i < n; i++) {
            int root = find(parent, i);
            if (groupOf[root] < 0) {
                groupOf[root] = groups.size();
                groups.add(new ArrayList<>());
            }
            groups.get(groupOf[root]).add(i);
        }
        Offset[] out = new Offset[n];
        double lone = LONE_OFFSET_PX / Math.sqrt(2);
        for (List<Integer> g : groups) {
            if (g.size() == 1) {
                out[g.get(0)] = new Offset(lone, -lone);
                continue;
            }
            double cx = 0;
            double cy = 0;
            for (int i : g) {
                cx += xs[i] / g.size();
                cy += ys[i] / g.size();
            }
            final double fx = cx;
            final double fy = cy;
            // clockwise bearing from the top; anchors at the centre keep their (number) order
            g.sort(Comparator.comparingDouble((Integer i) -> bearing(xs[i] - fx, ys[i] - fy)));
            double radius = Math.max(MIN_FAN_RADIUS_PX, g.size() * BALLOON_PITCH_PX / (2 * Math.PI));
            for (int k = 0; k < g.size(); k++) {
                double a = 2 * Math.PI * k / g.size();
                int i = g.get(k);
                out[i] = new Offset(fx - xs[i] + radius * Math.sin(a), fy - ys[i] - radius * Math.cos(a));
            }
        }
        return List.of(out);
    }

    /** Clockwise angle from straight up, in [0, 2 pi); 0 for a zero vector. */
    private static double bearing(double dx, double dy) {
        if (Math.hypot(dx, dy) < AT_CENTRE_PX) {
            return 0;
        }
        double a = Math.atan2(dx, -dy);
        return a < 0 ? a + 2 * Math.PI : a;
    }

    private static int find(int[] parent, int i) {
        while (parent[i] != i) {
            parent[i] = parent[parent[i]];
            i = parent[i];
        }
        return i;
    }
}
