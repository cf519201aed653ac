/**
 * Safe output files: every report file is written to a temporary file beside its target, flushed
 * to disk and moved into place atomically ({@link org.linemass.reports.io.AtomicWrite}), and no
 * output may land on an input drawing ({@link org.linemass.reports.io.OutputGuard}).
 */
package org.linemass.reports.io;
