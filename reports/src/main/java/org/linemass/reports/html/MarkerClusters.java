package org.linemass.reports.html;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * Finding markers clustered for one zoom of a picture, the rule the report's script applies at
 * every zoom (report.js, {@code cluster}): taking the anchors in order, each one not yet taken
 * gathers every untaken anchor within {@value #RADIUS_PX} screen pixels of it (a greedy
 * clustering over a grid of that cell size). A cluster of one anchor is shown as its marker, a
 * bigger one as one count badge at its first anchor, placed as a lone marker's balloon would be.
 * Zooming in spreads the anchors on screen, so a badge splits into smaller ones and finally into
 * markers; clicking a badge zooms to its anchors or, when they lie on one spot, fans them all
 * ({@link MarkerLayout}'s rule). First anchors are pairwise more than {@value #RADIUS_PX} px apart,
 * so balloons (20 to 26 px) and badges (at most 37 px wide for three digits) never overlap. Linear in the
 * number of anchors for spread-out drawings, so a welded mesh with 90,000 notes is clustered at once.
 */
final class MarkerClusters {

    /** Reach of a cluster, screen px: two balloons (20 px, 26 px with three digits) side by side with a gap. */
    static final double RADIUS_PX = 40;
    private final List<int[]> cells;

    private record Cell(long x, long y) {
    }

    private MarkerClusters(List<int[]> cells) {
        this.cells = cells;
    }

    /** Clusters of anchors {@code xs[i], ys[i]} (picture px at the first zoom). */
    static MarkerClusters of(double[] xs, double[] ys) {
        if (xs.length != ys.length) {
            throw new IllegalArgumentException("xs and ys differ in length: " + xs.length + " and " + ys.length);
        }
        Map<Cell, List<Integer>> grid = new HashMap<>();
        for (int i = 0; i < xs.length; i++) {
            grid.computeIfAbsent(cell(xs[i], ys[i]), k -> new ArrayList<>()).add(i);
        }
        boolean[] taken = new boolean[xs.length];
        List<int[]> out = new ArrayList<>();
        for (int i = 0; i < xs.length; i++) {
            if (taken[i]) {
                continue;
            }
            Cell c = cell(xs[i], ys[i]);
            List<Integer> members = new ArrayList<>();
            for (long gx = c.x() - 1; gx <= c.x() + 1; gx++) {
                for (long gy = c.y() - 1; gy <= c.y() + 1; gy++) {
                    for (int j : grid.getOrDefault(new Cell(gx, gy), List.of())) {
                        if (!taken[j] && Math.hypot(xs[j] - xs[i], ys[j] - ys[i]) <= RADIUS_PX) {
                            taken[j] = true;
                            members.add(j);
                        }
                    }
                }
            }
            members.sort(null);
            out.add(members.stream().mapToInt(Integer::intValue).toArray());
        }
        return new MarkerClusters(out);
    }

    private static Cell cell(double x, double y) {
        return new Cell((long) Math.floor(x / RADIUS_PX), (long) Math.floor(y / RADIUS_PX));
    }

    /** The clusters, each the indices of its anchors ascending; clusters in the order of their first anchor. */
    List<int[]> cells() {
        return cells;
    }

    /** Width of a count badge, px: room for the digits of the count (7 px each) and the sign before them. */
    static double badgeWidth(int count) {
        return 16 + 7 * Integer.toString(count).length();
    }
}
