package org.linemass.engine.pieces.dedup;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import org.linemass.engine.result.Finding;
import org.linemass.engine.result.FindingKind;
import org.linemass.engine.result.Severity;

/**
 * A finding list that keeps the first {@code cap} findings and only counts the rest per kind and
 * layer (with their summed size and mass), so a drawing with millions of copies drawn on top of each
 * other cannot fill memory with messages. {@link #overflow()} gives one summary finding per kind and
 * layer for what was counted but not kept. Not thread-safe.
 */
final class CappedFindings extends ArrayList<Finding> {

    private static final long serialVersionUID = 1L;

    /** Most material-drawn-twice findings listed one by one (each is an error the drafter must fix). */
    static final int CAP = 100_000;

    private final int cap;
    private final transient Map<String, double[]> counted = new TreeMap<>();

    CappedFindings(int cap) {
        this.cap = cap;
    }

    @Override
    public boolean add(Finding f) {
        if (size() < cap) {
            return super.add(f);
        }
        double[] c = counted.computeIfAbsent(f.kind() + "\u0000" + (f.layer() == null ? "" : f.layer()),
                k -> new double[3]);
        c[0]++;
        c[1] += f.sizeM() == null ? 0 : f.sizeM();
        c[2] += f.massKg() == null ? 0 : f.massKg();
        return true;
    }

    /** One finding per kind and layer summing what was counted beyond the cap; empty when nothing was. */
    List<Finding> overflow() {
        List<Finding> out = new ArrayList<>();
        counted.forEach((key, c) -> {
            String kind = key.substring(0, key.indexOf('\u0000'));
            String layer = key.substring(key.indexOf('\u0000') + 1);
            out.add(new Finding(kind, Severity.ERROR, null, c[1], layer.isEmpty() ? null : layer, List.of(),
                    c[2] > 0 ? c[2] : null,
                    String.format(java.util.Locale.ROOT, "%d more %s findings on layer %s are not listed one by one"
                            + " (more than %d in the drawing); together %.3f m %s counted once", (long) c[0],
                            kind, layer, cap, c[1], FindingKind.DUPLICATE.equals(kind) ? "drawn again,"
                                    : "overlapping,")));
        });
        return out;
    }
}
