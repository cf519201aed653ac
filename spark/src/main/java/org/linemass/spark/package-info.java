/**
 * The archive job: {@code check} on every drawing of an archive, run by Apache Spark. Each drawing
 * is one binary record analysed in an executor by the same importer, engine and number formatting
 * as the command line; the results are written as tables (per drawing, per layer, per mark, per
 * finding, and the bill combined over the archive) through Spark's DataFrame writer.
 */
package org.linemass.spark;
