package org.linemass.reports.html;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class MarkerLayoutTest {

    /** The offset is one square root and two products: far below a pixel. */
    private static final double TOL = 1e-12;

    @Test
    void lone_upAndRight_atTheLeadersLength() {
        MarkerLayout.Offset o = MarkerLayout.lone();
        assertTrue(o.dx() > 0 && o.dy() < 0, "screen y grows down: up is negative");
        assertEquals(MarkerLayout.LONE_OFFSET_PX, Math.hypot(o.dx(), o.dy()), TOL);
        assertEquals(o.dx(), -o.dy(), TOL, "at 45 degrees");
    }

    @Test
    void script_usesTheSameFanAndClusterNumbers() {
        // the page's script repeats these rules: its constants must be these
        String js = HtmlReportWriter.script();
        assertTrue(js.contains("RADIUS = " + (int) MarkerClusters.RADIUS_PX + ","), "cluster reach");
        assertTrue(js.contains("PITCH = " + (int) MarkerLayout.BALLOON_PITCH_PX + ","), "fan pitch");
        assertTrue(js.contains("MIN_FAN = " + (int) MarkerLayout.MIN_FAN_RADIUS_PX + ";"), "fan radius");
        assertTrue(js.contains("LONE = " + (int) MarkerLayout.LONE_OFFSET_PX + " / Math.SQRT2"), "lone offset");
    }
}
