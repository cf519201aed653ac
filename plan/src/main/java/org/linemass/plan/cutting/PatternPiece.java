package org.linemass.plan.cutting;

/** {@code count} pieces of mark {@code mark} ({@code lengthM} each) cut from one bar of a pattern. */
public record PatternPiece(String mark, double lengthM, int count) {
}
