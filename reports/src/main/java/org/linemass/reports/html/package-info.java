/**
 * The HTML report: one self-contained page (inline CSS, SVG and a few lines of script; nothing
 * fetched from the network) with a picture of the drawing first and the tables after it. Every
 * string from a drawing or a user file passes through {@link org.linemass.reports.html.Html#escape}.
 */
package org.linemass.reports.html;
