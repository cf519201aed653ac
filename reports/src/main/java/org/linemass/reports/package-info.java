/**
 * Report writers: everything a person or another program reads about an analysed drawing. The
 * input of every writer is one or more {@link org.linemass.reports.Report} values (an engine
 * {@link org.linemass.engine.result.DrawingResult} plus optional sampled piece shapes); writers
 * never compute engineering values themselves except combining totals of several drawings
 * ({@link org.linemass.reports.CombinedTotals}). Sub-packages hold one output format each.
 */
package org.linemass.reports;
