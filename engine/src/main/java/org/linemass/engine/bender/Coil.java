package org.linemass.engine.bender;

/**
 * A coil or ring of a piece: turns, pitch (axial advance per turn, metres; 0 for a ring or flat
 * spiral), mean centre-line diameter (metres), centre-line length (metres) and whether it is a ring
 * closed on itself.
 */
public record Coil(double turns, double pitchM, double meanDiameterM, double lengthM, boolean closed) {
}
