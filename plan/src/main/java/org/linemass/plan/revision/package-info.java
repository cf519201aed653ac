/**
 * What changed between two revisions of a drawing: {@link org.linemass.plan.revision.RevisionMatcher}
 * pairs the pieces of revision A with those of revision B by shape and place, within a
 * {@link org.linemass.plan.revision.MatchTolerance}, and lists each piece as unchanged, moved,
 * changed, added or removed ({@link org.linemass.plan.revision.RevisionDiff}).
 */
package org.linemass.plan.revision;
