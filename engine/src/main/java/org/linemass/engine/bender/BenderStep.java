package org.linemass.engine.bender;

/**
 * One step of bender data, from the piece's start: feed {@code feedM} of straight, turn the bending
 * plane by {@code rotationDeg} about the direction of feed (right-handed, in (-180, 180]; 0 for the
 * first step), then either bend by {@code angleDeg} (positive) round a centre-line radius
 * {@code radiusM} (0 for a sharp corner), consuming {@code arcLengthM} of bar, or, for a coil, wind
 * {@code turns} turns of {@code pitchM} pitch and {@code radiusM} mean radius. {@code exact} when the
 * step reproduces the drawing exactly (a circular arc or a sharp corner in one plane); an elliptical
 * or spline bend is given as the circular bend with the same angle and arc length.
 */
public record BenderStep(Kind kind, double feedM, double rotationDeg, double angleDeg, double radiusM,
        double arcLengthM, double turns, double pitchM, boolean exact) {

    /** What the step does after its feed and rotation. */
    public enum Kind {
        /** A bend in one plane. */
        BEND,
        /** A coil or ring. */
        COIL
    }
}
