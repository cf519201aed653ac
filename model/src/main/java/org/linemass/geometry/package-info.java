/**
 * Immutable geometry values shared by every stage: vectors, affine maps, bounding boxes and the
 * sealed family of exact parametric {@link org.linemass.geometry.Segment}s that a drawing's
 * wire entities become. Nothing here knows about DXF group codes.
 */
package org.linemass.geometry;
