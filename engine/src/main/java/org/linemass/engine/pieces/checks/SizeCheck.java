package org.linemass.engine.pieces.checks;

import java.util.List;
import org.linemass.tolerance.Tolerances;
import org.linemass.engine.result.Finding;
import org.linemass.engine.result.FindingKind;
import org.linemass.engine.result.Severity;
import org.linemass.geometry.Segment;

/**
 * Classifies a segment by length: {@code zero_length} (warning) at or below the rounding noise
 * where it lies ({@link #isNoise}), {@code tiny_segment} (warning) below {@link Tolerances#joinM()},
 * otherwise nothing.
 */
public final class SizeCheck {

    private SizeCheck() {
    }

    /**
     * Whether a segment of length {@code lengthM} is no longer than the rounding noise at its place:
     * {@link Tolerances#noiseAt} of the larger magnitude of its two ends.
     */
    public static boolean isNoise(Segment s, double lengthM, Tolerances tol) {
        return lengthM <= tol.noiseAt(Math.max(s.start().maxAbs(), s.end().maxAbs()));
    }

    /** The finding for a segment of the given length, or null when it is long enough. */
    public static Finding check(Segment s, double lengthM, Tolerances tol) {
        if (isNoise(s, lengthM, tol)) {
            return Findings.of(FindingKind.ZERO_LENGTH, Severity.WARNING, s.start(), lengthM, s.source().layer(),
                    List.of(s.source()), null, s.source().describe() + " has no length (its ends coincide); it"
                            + " carries no material and is left out of the pieces.");
        }
        if (lengthM < tol.joinM()) {
            return Findings.of(FindingKind.TINY_SEGMENT, Severity.WARNING, s.point(0.5 * (s.tStart() + s.tEnd())),
                    lengthM, s.source().layer(), List.of(s.source()), null, s.source().describe() + " is only "
                            + Findings.mm(lengthM) + " long, shorter than the join tolerance "
                            + Findings.mm(tol.joinM()) + "; it is kept as a piece of its own.");
        }
        return null;
    }
}
