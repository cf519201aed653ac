/**
 * Joining segment ends into pieces: ends are clustered into nodes on a hash grid of the join
 * tolerance, ends at each node are paired (the straightest pair continues where three or more
 * meet) and the pairs are walked into maximal runs and closed loops.
 */
package org.linemass.engine.pieces.join;
