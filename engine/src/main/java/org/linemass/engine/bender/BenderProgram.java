package org.linemass.engine.bender;

import java.util.List;
import org.linemass.geometry.Vec3;

/**
 * Bender data for one piece, from its start: where the bar starts ({@code startM}, world metres), the
 * unit direction it is fed in, the unit normal of the first bending plane (the reference for the
 * rotations; right-handed about it the first bend turns the bar), the steps, the straight left after
 * the last step, and the corner points of the straights (start, each intersection of the straight
 * lines before and after a bend, end). Geometry of the drawn centre-line only: springback, the bender's
 * die allowances and the order of loading are the machine's business.
 */
public record BenderProgram(Vec3 startM, Vec3 startDirection, Vec3 firstPlaneNormal, List<BenderStep> steps,
        double lastFeedM, List<Vec3> cornersM) {

    /** No bender data (a piece with no segments). */
    public static final BenderProgram NONE = new BenderProgram(Vec3.ZERO, Vec3.X, Vec3.Z, List.of(), 0, List.of());

    public BenderProgram {
        steps = List.copyOf(steps);
        cornersM = List.copyOf(cornersM);
    }

    /** Whether every step reproduces the drawing exactly (see {@link BenderStep#exact}). */
    public boolean exact() {
        return steps.stream().allMatch(BenderStep::exact);
    }

    /** The number of bends (coils not counted). */
    public long bends() {
        return steps.stream().filter(s -> s.kind() == BenderStep.Kind.BEND).count();
    }
}
