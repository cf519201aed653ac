/**
 * The spatial indexes and grouping structures of the piece stage: a hash grid for points
 * ({@link org.linemass.engine.pieces.index.PointGrid}), a JTS STR-tree over segment boxes
 * ({@link org.linemass.engine.pieces.index.SegmentIndex}, and the same index seen through a subset
 * of the segments, {@link org.linemass.engine.pieces.index.DerivedIndex}), the candidate pairs of
 * segments whose boxes touch, and a union-find. JTS types stay inside this package and
 * {@code pieces.geom}; nothing here measures a curve.
 */
package org.linemass.engine.pieces.index;
