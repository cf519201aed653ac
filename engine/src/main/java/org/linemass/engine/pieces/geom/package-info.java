/**
 * Small curve helpers the piece stage needs for its decisions: lengths (closed forms for straights
 * and circular arcs, Gauss-Legendre for the rest), unit tangents at the ends, closest points by
 * Newton refinement from a sampled polyline, contacts and planar crossings. Precise moments are
 * not computed here. JTS types stay inside this package and {@code pieces.index}.
 */
package org.linemass.engine.pieces.geom;
