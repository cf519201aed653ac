/**
 * Report writers: everything a person or another program reads about an analysed drawing. The
 * input of every writer is one or more {@link org.linemass.reports.Report} values (an engine
 * {@link org.linemass.engine.result.DrawingResult} plus the piece shapes sampled from the exact
 * segments it carries); writers never compute engineering values themselves: the totals of
 * several drawings come from the engine ({@link org.linemass.engine.result.CombinedTotals}).
 * Sub-packages hold one output format each.
 */
package org.linemass.reports;
