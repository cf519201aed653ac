/**
 * The immutable result of analysing one drawing, in SI units (metres, kilograms): what every
 * report writer reads. Nullable numbers are boxed ({@code Double}) and null means "not known",
 * never zero.
 */
package org.linemass.engine.result;
