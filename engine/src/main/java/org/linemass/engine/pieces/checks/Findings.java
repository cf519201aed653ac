package org.linemass.engine.pieces.checks;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import org.linemass.engine.result.Finding;
import org.linemass.engine.result.Severity;
import org.linemass.engine.result.SourceRef;
import org.linemass.geometry.Provenance;
import org.linemass.geometry.Vec3;

/** Builds findings and formats their numbers (Locale.ROOT, millimetres in messages). */
public final class Findings {

    private Findings() {
    }

    /** A finding whose entities are given as provenances (duplicates dropped, order kept). */
    public static Finding of(String kind, Severity severity, Vec3 atM, Double sizeM, String layer,
            List<Provenance> entities, Double massKg, String message) {
        List<SourceRef> refs = new ArrayList<>(entities.size());
        for (Provenance p : entities) {
            SourceRef r = SourceRef.of(p);
            if (!refs.contains(r)) {
                refs.add(r);
            }
        }
        return new Finding(kind, severity, atM, sizeM, layer, refs, massKg, message);
    }

    /** A length in metres written in millimetres with three decimals, e.g. {@code 2.000 mm}. */
    public static String mm(double metres) {
        return String.format(Locale.ROOT, "%.3f mm", metres * 1000);
    }

    /** A mass in kilograms with four decimals. */
    public static String kg(double kg) {
        return String.format(Locale.ROOT, "%.4f kg", kg);
    }

    /** Degrees with one decimal. */
    public static String deg(double degrees) {
        return String.format(Locale.ROOT, "%.1f deg", degrees);
    }

    /** A point in millimetres, e.g. {@code (445.048, -88.840, 0.000) mm}. */
    public static String at(Vec3 p) {
        return String.format(Locale.ROOT, "(%.3f, %.3f, %.3f) mm", p.x() * 1000, p.y() * 1000, p.z() * 1000);
    }

    /** Stable order for reports: by kind, then layer, then place, then size. */
    public static final Comparator<Finding> ORDER = Comparator.comparing(Finding::kind)
            .thenComparing(f -> f.layer() == null ? "" : f.layer())
            .thenComparing(f -> f.atM() == null ? Double.NEGATIVE_INFINITY : f.atM().x())
            .thenComparing(f -> f.atM() == null ? Double.NEGATIVE_INFINITY : f.atM().y())
            .thenComparing(f -> f.atM() == null ? Double.NEGATIVE_INFINITY : f.atM().z())
            .thenComparing(f -> f.sizeM() == null ? Double.NEGATIVE_INFINITY : f.sizeM())
            .thenComparing(Finding::message);
}
