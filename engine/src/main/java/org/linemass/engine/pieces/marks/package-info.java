/**
 * Identical pieces: pieces on the same section that are congruent (rigid motion, optionally
 * mirror, either direction of travel) within the group tolerance share a mark; without mirror
 * grouping handedness is kept in every plane ({@link org.linemass.engine.pieces.marks.Grouper}).
 * A signature that does not change under rigid motion, reversal or splitting of a straight buckets
 * candidates; a best-fit rigid transform of arc-length samples (Kabsch, SVD from Commons Math)
 * confirms them.
 */
package org.linemass.engine.pieces.marks;
