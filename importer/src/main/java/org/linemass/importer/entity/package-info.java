/**
 * Converters from one DXF entity record to exact {@link org.linemass.geometry.Segment}s in block
 * coordinates (drawing units), with the object coordinate system, bulge and spline rules of the
 * format. Private to the importer.
 */
package org.linemass.importer.entity;
