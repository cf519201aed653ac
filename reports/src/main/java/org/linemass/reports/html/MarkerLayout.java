package org.linemass.reports.html;

/**
 * Where a finding's balloon sits beside the small ring drawn exactly at its place (the anchor): a
 * short leader line up and to the right, {@value #LONE_OFFSET_PX} px away, so the balloon never
 * hides the defect it points at. Markers too close to each other for their balloons are gathered
 * into count badges first ({@link MarkerClusters}); when a badge whose markers lie on one spot is
 * clicked, the page's script (report.js, {@code fan}) spreads their balloons evenly on a circle
 * around the spot, {@value #BALLOON_PITCH_PX} px of circumference each and at least
 * {@value #MIN_FAN_RADIUS_PX} px out, in the order of their anchors' bearings so the leader lines do
 * not cross, starting at the top.
 *
 * <p>Offsets are in screen pixels and are kept at that size while the picture is zoomed (the
 * page's script scales each marker group by the inverse of the zoom), so at any zoom each balloon
 * stays within a few tens of pixels of its defect.
 */
final class MarkerLayout {

    /** Distance of a lone balloon from its anchor, px. */
    static final double LONE_OFFSET_PX = 20;
    /** Space each balloon takes on a fan's circle, px (diameter 20 plus 4 gap); the script's PITCH. */
    static final double BALLOON_PITCH_PX = 24;
    /** Smallest radius of a fan, px; the script's MIN_FAN. */
    static final double MIN_FAN_RADIUS_PX = 24;

    /** A balloon's offset (dx, dy) from its anchor, screen px, y down. */
    record Offset(double dx, double dy) {
    }

    private MarkerLayout() {
    }

    /** The offset of a balloon placed alone: up and to the right. */
    static Offset lone() {
        double lone = LONE_OFFSET_PX / Math.sqrt(2);
        return new Offset(lone, -lone);
    }
}
