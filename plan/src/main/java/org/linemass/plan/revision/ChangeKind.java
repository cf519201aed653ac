package org.linemass.plan.revision;

/** What happened to a piece between revision A and revision B. */
public enum ChangeKind {
    /** Same shape in the same place. */
    UNCHANGED,
    /** Same shape, in another place. */
    MOVED,
    /** In the same place (an end or the centroid kept), with another length, section, bends or shape. */
    CHANGED,
    /** Only in revision A. */
    REMOVED,
    /** Only in revision B. */
    ADDED;

    /** The lower-case name used in the reports. */
    public String label() {
        return name().toLowerCase(java.util.Locale.ROOT);
    }
}
