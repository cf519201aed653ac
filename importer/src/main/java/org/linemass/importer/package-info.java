/**
 * Reads ASCII and binary DXF into the immutable {@link org.linemass.drawing.Drawing} model.
 * The entry point is {@link org.linemass.importer.DxfImporter}; everything else in this package
 * and below is private to the importer.
 */
package org.linemass.importer;
