/**
 * Polyline pictures of exact curves, for drawings in reports only; no quantity is ever computed
 * from them.
 */
package org.linemass.engine.shape;
