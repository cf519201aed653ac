/**
 * Drawing checks on joined pieces: gaps between free ends and from a free end to the middle of
 * another wire (an almost T-junction), T-junctions and crossings, tiny and zero-length segments,
 * bends (sharp corners, arcs, inside radii) and bend findings; plus the small helpers that build
 * {@link org.linemass.engine.result.Finding}s with plain messages.
 */
package org.linemass.engine.pieces.checks;
