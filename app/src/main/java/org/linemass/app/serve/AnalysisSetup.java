package org.linemass.app.serve;

import java.util.List;
import org.linemass.engine.error.AnalysisException;
import org.linemass.engine.settings.AnalysisSettings;
import org.linemass.engine.section.LayerAssignment;
import org.linemass.engine.section.SectionTable;
import org.linemass.importer.ImportOptions;

/**
 * How the server reads and analyses: the options it was started with (units, tolerances, a
 * section table and rules given on its command line), with what a page adds on top.
 */
public interface AnalysisSetup {

    ImportOptions importOptions();

    /**
     * The settings with {@code extraTable} (may be null) over all sections and {@code extraRules}
     * after all rules; AnalysisException with a one-line message when they cannot be built.
     */
    AnalysisSettings settings(SectionTable extraTable, List<LayerAssignment> extraRules) throws AnalysisException;

    /** A section table from CSV text; AnalysisException names {@code name} and the line. */
    SectionTable readTable(String name, String csv) throws AnalysisException;

    /** Layer-to-section rules from CSV text; AnalysisException names {@code name} and the line. */
    List<LayerAssignment> readAssignments(String name, String csv) throws AnalysisException;
}
