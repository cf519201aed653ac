package org.linemass.engine.assemble;

import java.util.ArrayList;
import java.util.List;
import org.linemass.engine.bender.BenderPrograms;
import org.linemass.engine.bender.Coil;
import org.linemass.engine.bender.FormRun;
import org.linemass.engine.bender.RunSplitter;
import org.linemass.engine.result.PieceForm;
import org.linemass.engine.shape.ShapeClassifier;
import org.linemass.geometry.Segment;

/**
 * The {@link PieceForm} of a piece's segments: its runs ({@link RunSplitter}), bender data
 * ({@link BenderPrograms}), coils and schedule shape ({@link ShapeClassifier}, with the section's
 * diameter as the bar size when it is round).
 */
public final class PieceForms {

    private PieceForms() {
    }

    /**
     * @param segments the piece's segments in order (world metres)
     * @param closed whether the piece closes on itself
     * @param diameterM the section's diameter (metres), null when not round or unknown
     * @param lengthM the exact centre-line length (metres)
     * @param angleRad turning below this is straight on (radians)
     * @param joinM positional tolerance (metres)
     */
    public static PieceForm of(List<Segment> segments, boolean closed, Double diameterM, double lengthM,
            double angleRad, double joinM) {
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
        var program = BenderPrograms.of(runs);
        return new PieceForm(program, coils, ShapeClassifier.classify(program, closed, diameterM, lengthM));
    }
}
