package org.linemass.engine.bender;

import java.util.ArrayList;
import java.util.List;
import org.linemass.geometry.Segment;

/** Entry point: the {@link PieceForm} of a piece's segments. */
public final class PieceForms {

    private PieceForms() {
    }

    /**
     * @param segments the piece's segments in order (world metres)
     * @param closed whether the piece closes on itself
     * @param angleRad turning below this is straight on (radians)
     * @param joinM positional tolerance (metres)
     */
    public static PieceForm of(List<Segment> segments, boolean closed, double angleRad, double joinM) {
        if (segments.isEmpty()) {
            return PieceForm.NONE;
        }
        List<FormRun> runs = RunSplitter.split(segments, closed, angleRad, joinM);
        List<Coil> coils = new ArrayList<>();
        for (FormRun r : runs) {
            if (r instanceof FormRun.Wind w) {
                coils.add(new Coil(w.turns(), w.pitchM(), w.meanDiameterM(), w.lengthM(), w.closed()));
            }
        }
        return new PieceForm(BenderPrograms.of(runs), coils);
    }
}
