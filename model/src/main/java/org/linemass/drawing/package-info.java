/**
 * The immutable drawing model the importer hands to the engine: layers, block definitions with
 * their segments in block coordinates, and inserts as transforms (never expanded here), plus
 * units and everything the importer had to skip or could not use.
 */
package org.linemass.drawing;
