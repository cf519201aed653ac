package org.linemass.engine.assemble;

import java.util.ArrayList;
import java.util.List;
import org.linemass.engine.bender.BenderPrograms;
import org.linemass.engine.bender.Coil;
import org.linemass.engine.bender.FormRun;
import org.linemass.engine.bender.RunSplitter;
import org.linemass.engine.result.PieceForm;
import org.linemass.engine.section.Section;
import org.linemass.engine.shape.BendLimit;
import org.linemass.engine.shape.BendLimits;
import org.linemass.engine.shape.BendStandard;
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
        return of(segments, closed, diameterM, BendLimit.none("no section: no minimum bend radius known, bends not"
                + " checked"), lengthM, angleRad, joinM, BendStandard.AUTO);
    }

    /**
     * As {@link #of(List, boolean, Double, double, double, double)} for a piece on {@code section} (null
     * when it has none), whose diameter is the bar size and whose {@link BendLimits bend limit} the form
     * carries.
     */
    public static PieceForm ofSection(List<Segment> segments, boolean closed, Section section, double lengthM,
            double angleRad, double joinM) {
        return ofSection(segments, closed, section, lengthM, angleRad, joinM, BendStandard.AUTO);
    }

    /** As {@link #ofSection(List, boolean, Section, double, double, double)}, radii checked by {@code standard}. */
    public static PieceForm ofSection(List<Segment> segments, boolean closed, Section section, double lengthM,
            double angleRad, double joinM, BendStandard standard) {
        return of(segments, closed, section == null ? null : section.diameterM(), BendLimits.of(section), lengthM,
                angleRad, joinM, standard);
    }

    /**
     * As {@link #ofSection(List, boolean, Section, double, double, double, BendStandard)} from the
     * piece's runs as {@link RunSplitter#split} gave them for these segments and tolerances.
     */
    public static PieceForm ofSection(List<Segment> segments, boolean closed, List<FormRun> runs, Section section,
            double lengthM, double angleRad, double joinM, BendStandard standard) {
        if (segments.isEmpty()) {
            return new PieceForm(PieceForm.NONE.program(), List.of(), null, BendLimits.of(section));
        }
        return of(closed, runs, section == null ? null : section.diameterM(), BendLimits.of(section), lengthM,
                standard);
    }

    private static PieceForm of(List<Segment> segments, boolean closed, Double diameterM, BendLimit limit,
            double lengthM, double angleRad, double joinM, BendStandard standard) {
        if (segments.isEmpty()) {
            return new PieceForm(PieceForm.NONE.program(), List.of(), null, limit);
        }
        return of(closed, RunSplitter.split(segments, closed, angleRad, joinM), diameterM, limit, lengthM, standard);
    }

    private static PieceForm of(boolean closed, List<FormRun> runs, Double diameterM, BendLimit limit,
            double lengthM, BendStandard standard) {
        List<Coil> coils = new ArrayList<>();
        for (FormRun r : runs) {
            if (r instanceof FormRun.Wind w) {
                coils.add(new Coil(w.turns(), w.pitchM(), w.meanDiameterM(), w.lengthM(), w.closed()));
            }
        }
        var program = BenderPrograms.of(runs);
        return new PieceForm(program, coils, ShapeClassifier.classify(program, closed, diameterM, lengthM, standard),
                limit);
    }
}
