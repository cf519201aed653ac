/**
 * The bar bending schedule as lines and size totals, computed once from the engine's shapes and
 * written by the CSV, spreadsheet, JSON and HTML writers, so that every form shows the same rounding.
 */
package org.linemass.reports.schedule;
