package org.linemass.reports.html;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;

class MarkerClustersTest {

    @Test
    void of_denseMesh_everyAnchorOnce_seedsApart_fewBadges() {
        // a welded mesh of 300 x 300 crossings at 3.2 px pitch, as mesh-300 (50 mm pitch, 15 m in 960 px) is drawn
        int side = 300;
        double pitch = 3.2;
        double[] xs = new double[side * side];
        double[] ys = new double[side * side];
        for (int i = 0; i < side; i++) {
            for (int j = 0; j < side; j++) {
                xs[i * side + j] = 40 + i * pitch;
                ys[i * side + j] = 40 + j * pitch;
            }
        }
        List<int[]> cells = MarkerClusters.of(xs, ys).cells();
        boolean[] seen = new boolean[xs.length];
        int[] seeds = new int[cells.size()];
        for (int c = 0; c < cells.size(); c++) {
            int seed = cells.get(c)[0];
            seeds[c] = seed;
            for (int i : cells.get(c)) {
                assertTrue(!seen[i], "anchor " + i + " in two clusters");
                seen[i] = true;
                // every member lies within the reach of its cluster's first anchor (its seed, the smallest index)
                assertTrue(Math.hypot(xs[i] - xs[seed], ys[i] - ys[seed]) <= MarkerClusters.RADIUS_PX + 1e-9);
            }
        }
        for (boolean s : seen) {
            assertTrue(s, "an anchor in no cluster");
        }
        // seeds are pairwise farther apart than the reach, so lone markers never overlap:
        // checked on the seeds of the first rows (all pairs of 90,000 would be slow and prove no more)
        for (int a = 0; a < Math.min(seeds.length, 400); a++) {
            for (int b = a + 1; b < Math.min(seeds.length, 400); b++) {
                assertTrue(Math.hypot(xs[seeds[a]] - xs[seeds[b]], ys[seeds[a]] - ys[seeds[b]])
                        > MarkerClusters.RADIUS_PX, "seeds " + seeds[a] + " and " + seeds[b]);
            }
        }
        // 960 x 960 px covered by 40 px reaches: some hundreds of badges, not 90,000 balloons
        assertTrue(cells.size() < 2000, cells.size() + " clusters");
    }

    @Test
    void of_spreadOut_eachAlone_andOneSpot_oneCluster() {
        assertEquals(3, MarkerClusters.of(new double[] {0, 100, 200}, new double[] {0, 0, 0}).cells().size());
        List<int[]> one = MarkerClusters.of(new double[] {5, 5, 5, 5}, new double[] {7, 7, 7, 7}).cells();
        assertEquals(1, one.size());
        assertEquals(4, one.get(0).length);
    }
}
