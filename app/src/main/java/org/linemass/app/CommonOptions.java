package org.linemass.app;

import org.linemass.reports.UnitSystem;
import picocli.CommandLine.Option;

/** Options every command shares: output detail and units. */
public final class CommonOptions {

    @Option(names = "--debug", description = "Print the full stack trace when something fails.")
    boolean debug;

    @Option(names = {"-q", "--quiet"}, description = "Print one line per drawing instead of the full summary.")
    boolean quiet;

    @Option(names = "--list-notes", description = "List every note (T-junctions, crossings, ...) in the console "
            + "findings table instead of counting them, and every T-junction and crossing in the file reports "
            + "(by default they list the first 1000 and count the rest).")
    boolean listNotes;

    @Option(names = "--all-findings", description = "List every finding in the console findings table, also "
            + "alike ones (by default findings that say the same thing at different places share one row).")
    boolean allFindings;

    @Option(names = "--imperial", description = "Show lengths in ft and in and masses in lb, in every table and "
            + "message (JSON stays in SI).")
    boolean imperial;

    @Option(names = "--feet-inches", description = "As --imperial, with the cut lengths of the bill of materials in "
            + "feet, inches and sixteenths (4' 11-1/4\").")
    boolean feetInches;

    UnitSystem units() {
        return feetInches ? UnitSystem.IMPERIAL_FEET_INCHES : imperial ? UnitSystem.IMPERIAL : UnitSystem.METRIC;
    }
}
