/**
 * Costs from a user price table: {@link org.linemass.plan.cost.PriceTableReader} reads the unit
 * prices (per kg, per stock bar, per coil, per cut, per bend, per weld, each for a section or
 * material glob), {@link org.linemass.plan.cost.Costing} prices every mark, the welds of every
 * drawing and, with a cutting plan, the stock bought. Every cost line keeps its formula
 * (quantity x unit price); a price that is not in the table is reported as missing, never as zero.
 */
package org.linemass.plan.cost;
