package org.linemass.reports;

/** The caution printed with every report (and in the README), in plain words. */
public final class Caution {

    /** One paragraph, no line breaks. */
    public static final String TEXT = "These lengths, masses and centres of gravity are estimates worked out from the "
            + "drawn centre-lines and the section data supplied; real parts differ (rolling tolerances, coatings, "
            + "welds, fittings, anything not drawn). Do not base lifting, rigging or structural decisions on them "
            + "alone: have the figures and the lifting or design plan checked by a qualified person under the codes "
            + "and licensed practice that apply where the work is done. This tool checks neither strength nor "
            + "code compliance.";

    private Caution() {
    }
}
