package org.linemass.engine.bender;

import java.util.List;

/**
 * How one piece is bent: its bender data and its coils. {@link #NONE} for a piece made without any
 * (a result built by hand, a piece with no segments).
 */
public record PieceForm(BenderProgram program, List<Coil> coils) {

    /** No bending data. */
    public static final PieceForm NONE = new PieceForm(BenderProgram.NONE, List.of());

    public PieceForm {
        coils = List.copyOf(coils);
    }
}
