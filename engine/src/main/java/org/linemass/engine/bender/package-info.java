/**
 * How a piece is bent: its centre-line split into straight feeds, bends (a change of direction
 * through a sharp corner or a curved run: circular, elliptical or spline) and coils, and the bender
 * data that makes it from one end (feed, rotation of the bending plane, bend angle, radius). Every
 * value is geometry of the drawn centre-line; springback and the machine's own allowances are the
 * machine's business and are not applied.
 */
package org.linemass.engine.bender;
