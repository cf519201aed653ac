/**
 * Bar bending schedule shapes of BS 8666:2005: a piece's bender data classified into the standard's
 * shape codes, with the standard's dimensions, its length formula beside the exact centre-line length,
 * and the minimum scheduling radius check of its Table 2.
 */
package org.linemass.engine.shape;
