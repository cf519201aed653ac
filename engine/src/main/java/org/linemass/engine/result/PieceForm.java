package org.linemass.engine.result;

import java.util.List;
import org.linemass.engine.bender.BenderProgram;
import org.linemass.engine.bender.Coil;
import org.linemass.engine.shape.ShapeResult;

/**
 * How one piece is bent: its bender data, its coils and its BS 8666 schedule shape (null when not
 * worked out). {@link #NONE} for a piece made without any (a result built by hand, a piece with no
 * segments).
 */
public record PieceForm(BenderProgram program, List<Coil> coils, ShapeResult shape) {

    /** No bending data. */
    public static final PieceForm NONE = new PieceForm(BenderProgram.NONE, List.of(), null);

    public PieceForm {
        coils = List.copyOf(coils);
    }
}
