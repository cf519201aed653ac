/**
 * User expressions along the wire: linear-density fields (kg/m as a function of x, y, z in metres
 * and s, metres along the piece from its start) for tapered, graded or coated members, and the
 * line integral of any expression over each piece and layer with its error bound (the
 * {@code integrate} command). Expressions are parsed with exp4j. The entry point for integrals is
 * {@code Analyzer.integrateField}.
 */
package org.linemass.engine.field;
