package org.linemass.engine;

import org.linemass.drawing.Drawing;
import org.linemass.engine.result.DrawingResult;

/** Runs the whole engine on one imported drawing. */
public final class Analyzer {

    private Analyzer() {
    }

    public static DrawingResult analyze(Drawing drawing, AnalysisSettings settings) throws AnalysisException {
        throw new UnsupportedOperationException("engine not written yet");
    }
}
