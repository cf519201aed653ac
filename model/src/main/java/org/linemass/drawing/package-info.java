/**
 * The immutable drawing model the importer hands to the engine: layers, block definitions with
 * their segments in block coordinates, and inserts as transforms (never expanded here), plus
 * units and everything the importer had to skip or could not use; and {@link
 * org.linemass.drawing.InsertWalk}, the one walk of the insert tree (with the layer-0 rule) that
 * the importer and the engine share.
 */
package org.linemass.drawing;
