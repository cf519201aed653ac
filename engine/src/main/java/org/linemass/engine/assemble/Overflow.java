package org.linemass.engine.assemble;

import java.util.Locale;
import org.linemass.engine.moments.Moments;
import org.linemass.engine.section.Section;

/**
 * Whether a layer's moments fit in double numbers, and the message when they do not. Coordinates
 * are at most 1e99 drawing units, but in large units (parsecs) their squares, which second moments
 * need, pass 1e308; a section of 1e308 kg/m overflows the mass itself. Such totals are an input
 * problem (implausible units, coordinates or section data), not something to compute around.
 * Stateless.
 */
final class Overflow {

    private Overflow() {
    }

    /** Whether mass, centroid, covariance and the inertia derived from it are all finite. */
    static boolean finite(Moments m) {
        return Double.isFinite(m.mass()) && m.centroid().isFinite() && m.covariance().isFinite()
                && m.inertia().isFinite() && Double.isFinite(m.errorBound());
    }

    /**
     * The overflow message for a layer, or null when its length moments and mass moments (null when
     * the layer has no mass) are finite.
     */
    static String describe(String layer, Moments drawn, Moments length, Moments mass, Section section) {
        if (finite(drawn) && finite(length) && (mass == null || finite(mass))) {
            return null;
        }
        boolean lengthBad = !finite(drawn) || !finite(length);
        // at most this far from the origin: the centroid's distance plus half the wire's length
        double reach = drawn.centroid().norm() + 0.5 * drawn.mass();
        if (lengthBad || section == null) {
            return String.format(Locale.ROOT, "layer %s: its length moments exceed the range of numbers (its wire"
                    + " reaches up to %.3g m from the origin, %.3g m long); check the drawing's units and"
                    + " coordinates. The layer is left out of the totals.", layer, reach, drawn.mass());
        }
        return String.format(Locale.ROOT, "layer %s: its mass moments exceed the range of numbers with section %s"
                + " (%.3g kg/m on %.3g m of wire); check the section data. The layer is left out of the totals.",
                layer, section.id(), section.kgPerM(), length.mass());
    }
}
