/**
 * Material drawn more than once: identical segments (also reversed), collinear overlaps of
 * straights, overlaps of arcs on the same circle, and ellipses or splines lying wholly on another
 * curve (drawn again from another start, split, or as another kind of curve). One copy is kept,
 * the double-counted sub-curves are set aside with the removed copy's provenance, and each case
 * becomes a {@code duplicate} or {@code overlap} finding with the length and mass counted twice.
 */
package org.linemass.engine.pieces.dedup;
