package org.linemass.engine.pieces.join;

import java.util.List;
import org.linemass.engine.pieces.geom.PointGrid;
import org.linemass.engine.pieces.geom.UnionFind;
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
        for (int e = 0; e < m; e++) {
            xyz[3 * e] = point[e].x();
            xyz[3 * e + 1] = point[e].y();
            xyz[3 * e + 2] = point[e].z();
        }
        PointGrid grid = new PointGrid(xyz, group, joinM);
        UnionFind uf = new UnionFind(m);
        double tol2 = joinM * joinM;
        for (int e = 0; e < m; e++) {
            final int ee = e;
            Vec3 p = point[e];
            grid.near(p.x(), p.y(), p.z(), group[e], f -> {
                if (f > ee && grid.distanceSq(f, p.x(), p.y(), p.z()) <= tol2) {
                    uf.union(ee, f);
                }
            });
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
