package org.linemass.engine.result;

import java.util.List;
import org.linemass.engine.bender.BenderProgram;
import org.linemass.engine.bender.BenderStep;
import org.linemass.engine.bender.Coil;
import org.linemass.engine.shape.BendLimit;
import org.linemass.engine.shape.ShapeResult;

/**
 * How one piece is bent: its bender data, its coils, its BS 8666 schedule shape (null when not
 * worked out) and the minimum inside bend radius of its section with its basis ({@link BendLimit};
 * says so when none is known). {@link #NONE} for a piece made without any (a result built by hand, a
 * piece with no segments).
 */
public record PieceForm(BenderProgram program, List<Coil> coils, ShapeResult shape, BendLimit limit) {

    /** No bending data. */
    public static final PieceForm NONE = new PieceForm(BenderProgram.NONE, List.of(), null,
            BendLimit.none("no bending data"));

    public PieceForm {
        coils = List.copyOf(coils);
        if (limit == null) {
            throw new IllegalArgumentException("a piece form needs its bend limit (BendLimit.none when unknown)");
        }
    }

    /**
     * The number of bends whose inside radius (centre-line radius less half the limit's diameter; 0 for
     * a sharp corner) is below the limit; 0 when no limit is known.
     */
    public long bendsBelowLimit() {
        double diameterM = limit.diameterM();
        if (!limit.known()) {
            return 0;
        }
        return program.steps().stream().filter(s -> s.kind() == BenderStep.Kind.BEND)
                .filter(s -> Math.max(0, s.radiusM() - diameterM / 2) < limit.insideRadiusM()).count();
    }
}
