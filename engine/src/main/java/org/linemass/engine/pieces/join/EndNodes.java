package org.linemass.engine.pieces.join;

import java.util.List;
import org.linemass.engine.pieces.index.PointGrid;
import org.linemass.engine.pieces.index.UnionFind;
import org.linemass.geometry.Segment;
import org.linemass.geometry.Vec3;

/**
 * Clusters segment ends into nodes: end {@code 2i} is the start of segment i, {@code 2i+1} its
 * end. Two ends of the same layer closer than the join tolerance are in the same node, and so
 * (transitively) are chains of such ends. Uses a {@link PointGrid} with cells of the tolerance,
 * so the cost is O(n) expected. The nodes are given in compressed form: {@link #first} and
 * {@link #ends} list the ends of node k as {@code ends[first[k] .. first[k+1])}, in end order.
 */
final class EndNodes {

    final int[] nodeOf;
    final int[] first;
    final int[] ends;
    final Vec3[] point;

    private EndNodes(int[] nodeOf, int[] first, int[] ends, Vec3[] point) {
        this.nodeOf = nodeOf;
        this.first = first;
        this.ends = ends;
        this.point = point;
    }

    int nodeCount() {
        return first.length - 1;
    }

    int size(int node) {
        return first[node + 1] - first[node];
    }

    static EndNodes of(List<Segment> segments, int[] layerOf, double joinM) {
        int m = 2 * segments.size();
        double[] xyz = new double[3 * m];
        int[] group = new int[m];
        Vec3[] point = new Vec3[m];
        for (int i = 0; i < segments.size(); i++) {
            Segment s = segments.get(i);
            point[2 * i] = s.start();
            point[2 * i + 1] = s.end();
            group[2 * i] = layerOf[i];
            group[2 * i + 1] = layerOf[i];
        }
        // Ends at exactly the same place (copies drawn on top of each other, an array with no spacing)
        // share one grid entry, so a million coincident ends cost a hash lookup each, not a million
        // neighbours each.
        int[] uniqueOf = new int[m];
        int u = 0;
        java.util.Map<Vec3, int[]> seenAt = new java.util.HashMap<>();
        for (int e = 0; e < m; e++) {
            int[] prev = seenAt.get(point[e]);
            int found = -1;
            if (prev != null) {
                for (int k : prev) {
                    if (group[k] == group[e]) {
                        found = uniqueOf[k];
                        break;
                    }
                }
            }
            if (found >= 0) {
                uniqueOf[e] = found;
                continue;
            }
            uniqueOf[e] = u;
            xyz[3 * u] = point[e].x();
            xyz[3 * u + 1] = point[e].y();
            xyz[3 * u + 2] = point[e].z();
            int[] grown = prev == null ? new int[] {e} : java.util.Arrays.copyOf(prev, prev.length + 1);
            grown[grown.length - 1] = e;
            seenAt.put(point[e], grown);
            u++;
        }
        int[] uniqueGroup = new int[u];
        for (int e = 0; e < m; e++) {
            uniqueGroup[uniqueOf[e]] = group[e];
        }
        PointGrid grid = new PointGrid(java.util.Arrays.copyOf(xyz, 3 * u), uniqueGroup, joinM);
        UnionFind unique = new UnionFind(u);
        double tol2 = joinM * joinM;
        for (int a = 0; a < u; a++) {
            final int aa = a;
            double x = xyz[3 * a];
            double y = xyz[3 * a + 1];
            double z = xyz[3 * a + 2];
            grid.near(x, y, z, uniqueGroup[a], f -> {
                if (f > aa && grid.distanceSq(f, x, y, z) <= tol2) {
                    unique.union(aa, f);
                }
            });
        }
        UnionFind uf = new UnionFind(m);
        int[] firstEnd = new int[u];
        java.util.Arrays.fill(firstEnd, -1);
        for (int e = 0; e < m; e++) {
            int r = unique.find(uniqueOf[e]);
            if (firstEnd[r] < 0) {
                firstEnd[r] = e;
            } else {
                uf.union(firstEnd[r], e);
            }
        }
        int[] rootToNode = new int[m];
        java.util.Arrays.fill(rootToNode, -1);
        int[] nodeOf = new int[m];
        int nodes = 0;
        for (int e = 0; e < m; e++) {
            int r = uf.find(e);
            if (rootToNode[r] < 0) {
                rootToNode[r] = nodes++;
            }
            nodeOf[e] = rootToNode[r];
        }
        int[] first = new int[nodes + 1];
        for (int e = 0; e < m; e++) {
            first[nodeOf[e] + 1]++;
        }
        for (int k = 0; k < nodes; k++) {
            first[k + 1] += first[k];
        }
        int[] fill = java.util.Arrays.copyOf(first, nodes);
        int[] ends = new int[m];
        for (int e = 0; e < m; e++) {
            ends[fill[nodeOf[e]]++] = e;
        }
        return new EndNodes(nodeOf, first, ends, point);
    }
}
