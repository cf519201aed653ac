/**
 * Deterministic parallel work for the piece stage and assembly: numbered jobs run on a given
 * number of threads, results kept by job number, so what the stages build from them does not
 * depend on the thread count or on scheduling.
 */
package org.linemass.engine.parallel;
