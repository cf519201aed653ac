/**
 * Cross-sections and materials: the built-in section table (reinforcing bar, AWG wire, plain wire,
 * parametric round bar, tube, square, rectangular and flat bar), user section tables in CSV,
 * and layer-to-section assignments.
 */
package org.linemass.engine.section;
