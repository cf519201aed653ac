package org.linemass.engine.assemble;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import org.linemass.drawing.Drawing;
import org.linemass.drawing.ImportNote;
import org.linemass.drawing.LengthUnit;
import org.linemass.drawing.UnitSource;
import org.linemass.engine.result.Finding;
import org.linemass.engine.result.FindingKind;
import org.linemass.engine.result.Severity;
import org.linemass.engine.result.SourceRef;

/**
 * Findings from the import: each {@link ImportNote} becomes a finding (its kind kept when it is
 * {@code skipped_entity}, {@code units_assumed}, {@code ignored_entity}, {@code knots_assumed} or {@code paper_space_read}; otherwise
 * {@code skipped_entity} for notes that dropped geometry and {@code ignored_entity} for the rest),
 * plus one {@code units_assumed} warning when the units were guessed or are missing and no note said
 * so already. Stateless.
 */
public final class ImportFindings {

    private static final Set<String> KEPT = Set.of(FindingKind.SKIPPED_ENTITY, FindingKind.UNITS_ASSUMED,
            FindingKind.IGNORED_ENTITY, FindingKind.KNOTS_ASSUMED, FindingKind.PAPER_SPACE_READ);

    private ImportFindings() {
    }

    /**
     * "LINE at line 5, handle 30: " for a note tied to an entity (byte offset for binary files), so
     * the message alone tells the drafter where to look; empty otherwise.
     */
    private static String where(ImportNote n) {
        if (n.entityType().isEmpty() && n.line() <= 0) {
            return "";
        }
        StringBuilder b = new StringBuilder(n.entityType().isEmpty() ? "entity" : n.entityType());
        if (n.line() > 0) {
            b.append(" at line ").append(n.line());
        }
        if (!n.handle().isEmpty()) {
            b.append(", handle ").append(n.handle());
        }
        return b.append(": ").toString();
    }

    public static List<Finding> of(Drawing drawing) {
        List<Finding> out = new ArrayList<>();
        boolean unitsNoted = false;
        for (ImportNote n : drawing.notes()) {
            String kind = KEPT.contains(n.kind()) ? n.kind()
                    : n.skippedGeometry() ? FindingKind.SKIPPED_ENTITY : FindingKind.IGNORED_ENTITY;
            unitsNoted |= FindingKind.UNITS_ASSUMED.equals(kind);
            List<SourceRef> refs = n.line() > 0 || !n.handle().isEmpty()
                    ? List.of(new SourceRef(n.line(), n.handle(), n.entityType(), List.of())) : List.of();
            out.add(new Finding(kind, severity(n), null, null, n.layer(), refs, null, where(n) + n.message()));
        }
        boolean guessed = drawing.unitSource() == UnitSource.ASSUMED || drawing.unit() == LengthUnit.UNITLESS;
        if (guessed && !unitsNoted) {
            String message = drawing.unit() == LengthUnit.UNITLESS
                    ? "the drawing does not state its units; drawing units were taken as metres"
                    : String.format(Locale.ROOT, "the drawing does not state its units; they were assumed to be %s",
                            drawing.unit().symbol());
            out.add(new Finding(FindingKind.UNITS_ASSUMED, Severity.WARNING, null, null, null, List.of(), null, message));
        }
        return out;
    }

    private static Severity severity(ImportNote n) {
        try {
            return Severity.parse(n.severity());
        } catch (IllegalArgumentException | NullPointerException e) {
            return Severity.WARNING;
        }
    }
}
