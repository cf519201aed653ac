/**
 * Small curve helpers the piece stage needs for its decisions: lengths (closed forms for straights
 * and circular arcs, Gauss-Legendre for the rest), unit tangents at the ends, closest points by
 * Newton refinement from a sampled polyline, arc-length sampling, and two spatial indexes (a hash
 * grid for points, a JTS STR-tree for segment boxes). Precise moments are not computed here.
 * JTS types stay inside this package.
 */
package org.linemass.engine.pieces.geom;
