package org.linemass.reports.html;

/**
 * Colours for marks. Chosen for this project so that neighbours differ in lightness as well as in
 * hue (blue/orange/sky/plum/teal/ochre/violet/slate), which keeps them apart for the common
 * red-green colour-vision deficiencies and on a greyscale print; no pure red and green pair is
 * used. After the eight colours the cycle repeats with a dash pattern as the second cue.
 */
final class Palette {

    private static final String[] COLOURS = {
        "#1b5e9e", "#e07b00", "#58b4e6", "#9c3d78", "#25907a", "#c9a000", "#6a4fc1", "#4a4f57",
    };

    private static final String[] DASHES = {"", "6 3", "2 3", "8 3 2 3"};

    private Palette() {
    }

    static String colour(int index) {
        return COLOURS[Math.floorMod(index, COLOURS.length)];
    }

    /** SVG stroke-dasharray for the index, empty for a solid line. */
    static String dash(int index) {
        return DASHES[Math.floorMod(index / COLOURS.length, DASHES.length)];
    }
}
