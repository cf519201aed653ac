/**
 * The report printed on the terminal: a summary first, then aligned tables with units in the
 * headers. Colour (ANSI) only when the caller says the output is a terminal.
 */
package org.linemass.reports.console;
