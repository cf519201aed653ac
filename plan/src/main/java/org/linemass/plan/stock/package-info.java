/**
 * What a fabricator can buy for each section: stock lengths (optionally limited in number), the
 * saw kerf or cut allowance, the shortest offcut worth keeping, or coils of a given mass for wire.
 */
package org.linemass.plan.stock;
