/**
 * The one tolerance object, {@link org.linemass.tolerance.Tolerances}: the tolerances of an
 * analysis (join, gap, noise, grouping, angle, integration target; units in the names) and the
 * fixed numerical tolerances of the algorithms. Shared by the geometry values, the importer and
 * the engine, so it sits in the model module below all of them.
 */
package org.linemass.tolerance;
