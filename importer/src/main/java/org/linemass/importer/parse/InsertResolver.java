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
import org.linemass.geometry.Provenance;
import org.linemass.importer.entity.InsertSpec;

/**
 * Turns the INSERTs read in every block into {@link Insert}s once all block definitions are
 * known. Skipped with an error note: inserts of undefined blocks (names compared exactly, then
 * ignoring case), inserts that close a cycle of block references (both ends in one strongly
 * connected component, found with an iterative Tarjan search, so 100000-deep chains cannot
 * overflow the stack), inserts whose placement is not finite, and inserts that would nest deeper
 * than the limit below model space (longest path, iterative topological order).
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

    private record Edge(int from, int to, InsertSpec spec) {
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
                Affine placement = e.spec.placement(target.basePoint);
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
