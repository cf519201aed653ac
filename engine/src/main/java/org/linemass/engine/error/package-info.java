/**
 * The engine's input-error type, {@link org.linemass.engine.error.AnalysisException}: settings or
 * data that make an analysis impossible, one line naming the layer, file or row. In a package of
 * its own so that the stages can throw it without importing the engine's front door.
 */
package org.linemass.engine.error;
