/**
 * The revision comparison in every format: {@link org.linemass.reports.revision.RevisionTables}
 * builds its tables (pieces, sections, marks) as typed cells for CSV and HTML,
 * {@link org.linemass.reports.revision.RevisionSvg} draws both revisions with the changes
 * coloured, {@link org.linemass.reports.revision.RevisionHtml} writes the page and
 * {@link org.linemass.reports.revision.RevisionConsole} the terminal summary.
 */
package org.linemass.reports.revision;
