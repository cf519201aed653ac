/**
 * The marked-up drawing: a byte-for-byte copy of an ASCII DXF input with one added layer that
 * holds a circle and a numbered label at each finding and a marker at the centre of gravity.
 */
package org.linemass.reports.dxf;
