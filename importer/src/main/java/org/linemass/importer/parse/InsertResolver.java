package org.linemass.importer.parse;

import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.linemass.drawing.Drawing;
import org.linemass.drawing.ImportNote;
import org.linemass.drawing.Insert;
import org.linemass.geometry.Affine;
import org.linemass.geometry.Box3;
import org.linemass.geometry.Provenance;
import org.linemass.geometry.Vec3;
import org.linemass.importer.entity.InsertSpec;

/**
 * Turns the INSERTs read in every block into {@link Insert}s once all block definitions are
 * known. Skipped with an error note: inserts of undefined blocks (names compared exactly, then
 * ignoring case), inserts that close a cycle of block references (both ends in one strongly
 * connected component, found with an iterative Tarjan search, so 100000-deep chains cannot
 * overflow the stack), inserts whose placement is not finite, and inserts that would nest deeper
 * than the limit below model space (longest path, iterative topological order).
 *
 * <p>An insert with a zero scale factor (several writers put 43 = 0 on 2D block references) is
 * read when the block's content, nested inserts included, lies in one plane across that axis:
 * the zero scale then only moves that plane onto the base plane, and the insert is placed with
 * scale 1 and the base point moved into the content's plane ({@link InsertSpec#flattened}),
 * which gives the same points. A zero scale across content that extends along the axis would
 * flatten it and change its lengths: that insert is skipped with an error naming the axis.
 */
final class InsertResolver {

    private final String file;
    private final int maxDepth;
    private final List<ImportNote> notes;

    InsertResolver(String file, int maxDepth, List<ImportNote> notes) {
        this.file = file;
        this.maxDepth = maxDepth;
        this.notes = notes;
    }

    /** A reference from block {@code from} to {@code to}; {@code base} overrides the target's base point. */
    private record Edge(int from, int to, InsertSpec spec, Vec3 base) {

        Edge(int from, int to, InsertSpec spec) {
            this(from, to, spec, null);
        }
    }

    private static final String[] AXES = {"x", "y", "z"};

    /**
     * The edge placed with scale 1 and a base point in the content's plane on each zero axis, or a
     * null-spec edge (removed by the caller, with an error note here) when the content extends
     * along a zero axis.
     */
    private Edge flatten(Edge e, List<BlockBuilder> blocks, List<List<Edge>> kept, Box3[] boxes) {
        BlockBuilder target = blocks.get(e.to);
        Box3 box = box(e.to, blocks, kept, boxes, 0);
        if (box.isEmpty()) {
            return new Edge(e.from, e.to, e.spec.flattened(), e.spec.flatBase(target.basePoint, target.basePoint));
        }
        double size = box.diagonal();
        double[] lo = box.min().toArray();
        double[] hi = box.max().toArray();
        double[] plane = new double[3];
        for (int a = 0; a < 3; a++) {
            plane[a] = 0.5 * (lo[a] + hi[a]);
            if (e.spec.scale(a) == 0 && !(hi[a] - lo[a] <= FLAT_REL * size)) {
                skip(e.spec.source(), AXES[a] + " scale (group code " + (41 + a) + ") is 0 but block '" + target.name
                        + "' extends along its " + AXES[a] + " axis (" + lo[a] + " to " + hi[a]
                        + "): the insert would flatten it and change its lengths");
                return new Edge(e.from, e.to, null, null);
            }
        }
        return new Edge(e.from, e.to, e.spec.flattened(),
                e.spec.flatBase(target.basePoint, new Vec3(plane[0], plane[1], plane[2])));
    }

    /**
     * Content extent across which a block counts as flat, relative to the content's diagonal: the
     * rounding of bounds of arcs in a plane (about 1e-16 relative), with room; a block this thin
     * loses nothing measurable when flattened.
     */
    private static final double FLAT_REL = 1e-12;

    /**
     * Bounds of block {@code b}'s content in its own coordinates, nested inserts included (their
     * boxes' corners placed; empty when unknown beyond the depth limit), memoised. Only blocks
     * reached from a zero-scale insert are measured.
     */
    private Box3 box(int b, List<BlockBuilder> blocks, List<List<Edge>> kept, Box3[] boxes, int depth) {
        if (boxes[b] != null) {
            return boxes[b];
        }
        BlockBuilder blk = blocks.get(b);
        Box3 box = Box3.EMPTY;
        for (int i = 0; i < blk.segments.size(); i++) {
            box = box.union(blk.segments.get(i).bounds());
        }
        if (depth <= maxDepth) {
            for (Edge e : kept.get(b)) {
                if (e.spec == null) {
                    continue;
                }
                Box3 inner = box(e.to, blocks, kept, boxes, depth + 1);
                if (inner.isEmpty()) {
                    continue;
                }
                InsertSpec spec = e.spec.hasZeroScale() ? e.spec.flattened() : e.spec;
                Affine m = spec.placement(e.spec.hasZeroScale()
                        ? e.spec.flatBase(blocks.get(e.to).basePoint, inner.centre()) : blocks.get(e.to).basePoint);
                Vec3 lastCol = e.spec.columnStep().times(e.spec.columns() - 1);
                Vec3 lastRow = e.spec.rowStep().times(e.spec.rows() - 1);
                for (int c = 0; c < 8; c++) {
                    Vec3 p = new Vec3((c & 1) == 0 ? inner.min().x() : inner.max().x(),
                            (c & 2) == 0 ? inner.min().y() : inner.max().y(),
                            (c & 4) == 0 ? inner.min().z() : inner.max().z());
                    Vec3 q = m.apply(p);
                    box = box.including(q).including(q.plus(lastCol)).including(q.plus(lastRow))
                            .including(q.plus(lastCol).plus(lastRow));
                }
            }
        }
        boxes[b] = box;
        return box;
    }

    void resolve(List<BlockBuilder> blocks) {
        Map<String, Integer> exact = new HashMap<>();
        Map<String, Integer> folded = new HashMap<>();
        for (int i = 0; i < blocks.size(); i++) {
            exact.put(blocks.get(i).name, i);
            folded.putIfAbsent(blocks.get(i).name.toUpperCase(Locale.ROOT), i);
        }
        int n = blocks.size();
        List<List<Edge>> out = new ArrayList<>(n);
        for (int i = 0; i < n; i++) {
            out.add(new ArrayList<>());
        }
        for (int i = 0; i < n; i++) {
            for (InsertSpec s : blocks.get(i).insertSpecs) {
                Integer t = exact.get(s.blockName());
                if (t == null) {
                    t = folded.get(s.blockName().toUpperCase(Locale.ROOT));
                }
                if (t == null) {
                    skip(s.source(), "block '" + s.blockName() + "' is not defined");
                    continue;
                }
                out.get(i).add(new Edge(i, t, s));
            }
        }
        int[] comp = components(out);
        int[] indeg = new int[n];
        List<List<Edge>> kept = new ArrayList<>(n);
        for (int i = 0; i < n; i++) {
            List<Edge> k = new ArrayList<>();
            for (Edge e : out.get(i)) {
                if (comp[e.from] == comp[e.to]) {
                    skip(e.spec.source(), e.from == e.to
                            ? "block '" + blocks.get(e.from).name + "' inserts itself"
                            : "insert of block '" + blocks.get(e.to).name + "' in block '" + blocks.get(e.from).name
                                    + "' closes a cycle of block references");
                } else {
                    k.add(e);
                    indeg[e.to]++;
                }
            }
            kept.add(k);
        }
        Box3[] boxes = new Box3[n];
        for (int i = 0; i < n; i++) {
            List<Edge> k = kept.get(i);
            for (int j = 0; j < k.size(); j++) {
                Edge e = k.get(j);
                if (e.spec.hasZeroScale()) {
                    Edge flat = flatten(e, blocks, kept, boxes);
                    k.set(j, flat);
                }
            }
        }
        for (List<Edge> k : kept) {
            k.removeIf(e -> {
                if (e.spec == null) {
                    indeg[e.to]--;
                }
                return e.spec == null;
            });
        }
        int[] depth = new int[n];
        Arrays.fill(depth, -1);
        Integer model = exact.get(Drawing.MODEL_SPACE);
        if (model != null) {
            depth[model] = 0;
        }
        ArrayDeque<Integer> ready = new ArrayDeque<>();
        for (int i = 0; i < n; i++) {
            if (indeg[i] == 0) {
                ready.add(i);
            }
        }
        while (!ready.isEmpty()) {
            int u = ready.poll();
            BlockBuilder owner = blocks.get(u);
            for (Edge e : kept.get(u)) {
                if (--indeg[e.to] == 0) {
                    ready.add(e.to);
                }
                BlockBuilder target = blocks.get(e.to);
                if (depth[u] >= 0 && depth[u] + 1 > maxDepth) {
                    skip(e.spec.source(), "block '" + target.name + "' would be nested deeper than the limit of "
                            + maxDepth + " levels");
                    continue;
                }
                Affine placement = e.spec.placement(e.base != null ? e.base : target.basePoint);
                if (!placement.isFinite() || !e.spec.columnStep().isFinite() || !e.spec.rowStep().isFinite()) {
                    skip(e.spec.source(), "placement of block '" + target.name + "' is not finite");
                    continue;
                }
                if (depth[u] >= 0) {
                    depth[e.to] = Math.max(depth[e.to], depth[u] + 1);
                }
                owner.inserts.add(new Insert(target.name, placement, e.spec.columns(), e.spec.rows(),
                        e.spec.columnStep(), e.spec.rowStep(), e.spec.source()));
            }
        }
    }

    private void skip(Provenance p, String message) {
        notes.add(Notes.of("error", "skipped_entity", file, p.line(), p.entityType(), p.handle(), p.layer(),
                message));
    }

    /** Iterative Tarjan: strongly connected component id of each node. */
    private static int[] components(List<List<Edge>> out) {
        int n = out.size();
        int[] index = new int[n];
        int[] low = new int[n];
        int[] comp = new int[n];
        boolean[] onStack = new boolean[n];
        Arrays.fill(index, -1);
        int[] stack = new int[n];
        int sp = 0;
        int[] callNode = new int[n];
        int[] callEdge = new int[n];
        int counter = 0;
        int compCount = 0;
        for (int root = 0; root < n; root++) {
            if (index[root] >= 0) {
                continue;
            }
            int depth = 0;
            callNode[0] = root;
            callEdge[0] = 0;
            index[root] = low[root] = counter++;
            stack[sp++] = root;
            onStack[root] = true;
            while (depth >= 0) {
                int v = callNode[depth];
                List<Edge> edges = out.get(v);
                if (callEdge[depth] < edges.size()) {
                    int w = edges.get(callEdge[depth]++).to;
                    if (index[w] < 0) {
                        index[w] = low[w] = counter++;
                        stack[sp++] = w;
                        onStack[w] = true;
                        depth++;
                        callNode[depth] = w;
                        callEdge[depth] = 0;
                    } else if (onStack[w]) {
                        low[v] = Math.min(low[v], index[w]);
                    }
                    continue;
                }
                if (low[v] == index[v]) {
                    int w;
                    do {
                        w = stack[--sp];
                        onStack[w] = false;
                        comp[w] = compCount;
                    } while (w != v);
                    compCount++;
                }
                depth--;
                if (depth >= 0) {
                    int parent = callNode[depth];
                    low[parent] = Math.min(low[parent], low[v]);
                }
            }
        }
        return comp;
    }
}
