/**
 * The DXF section reader: groups pairs into records, reads HEADER, TABLES/LAYER, BLOCKS and
 * ENTITIES, resolves inserts (undefined blocks, cycles, nesting depth) and builds the
 * {@link org.linemass.drawing.Drawing}. Private to the importer.
 */
package org.linemass.importer.parse;
