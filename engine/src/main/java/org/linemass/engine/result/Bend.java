package org.linemass.engine.result;

import org.linemass.geometry.Vec3;

/**
 * One bend of a piece: where it is, its angle in degrees (0 = straight on), and its inside
 * radius in metres (centre-line radius minus half the bar diameter for round sections; null for a
 * sharp corner with no radius).
 */
public record Bend(Vec3 atM, double angleDeg, Double insideRadiusM, Double centreRadiusM) {
}
