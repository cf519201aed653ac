/**
 * Joining segment ends into pieces: ends are clustered into nodes on a hash grid of the join
 * tolerance, ends at each node are paired (where three or more meet, the straightest pairs turning by
 * less than 90 degrees continue) and the pairs are walked into maximal runs and closed loops.
 */
package org.linemass.engine.pieces.join;
